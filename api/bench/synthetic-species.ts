import { hillFormula, hillOrder, molarMass, parseFormula } from '../src/thermo';
import type { PhaseCode } from '../src/species/phase-code';
import { benchId, SeededRandom } from './seeded-random';
import {
  ANIONS,
  CATIONS,
  CHAIN_STEMS,
  CORE_MOLECULES,
  ELEMENTS,
  HALIDE_LIGANDS,
  HYDRATE_NAMES,
  HYDRIDE_PARENTS,
  MULTIPLIERS,
  type ElementData,
  type Ion,
} from './synthetic-chemistry';

/**
 * The species catalogue of the benchmark data set: plausible formulas (organic CxHyOzNw…,
 * salts and their hydrates, molecular inorganics, ions with charges), unique names, 2–3 phases
 * each, and identifiers. Composition, Hill formula and molar mass come from the engine's parser,
 * exactly as for species entered by hand.
 */

export type SpeciesCategory = 'element' | 'atom' | 'electron' | 'core' | 'molecular' | 'salt' | 'organic' | 'organic-ion' | 'ion';

export interface PhasePlan {
  id: string;
  phase: PhaseCode;
  polymorph: string | null;
  isReferenceState: boolean;
}

/** What the thermochemistry model needs to know beyond the formula. */
export interface ChemistryHints {
  element?: ElementData;
  /** degrees of unsaturation (rings + π bonds) of an organic species */
  dbe?: number;
  /** Σ of the ions' invented ΔfH°(aq) / (kJ/mol) and S°(aq) / (J/(mol·K)) for salts and inorganic ions */
  ionicEnthalpy?: number;
  ionicEntropy?: number;
  /** waters of crystallisation */
  hydrateWaters?: number;
  /** the neutral species an organic ion derives from, and how */
  parentIndex?: number;
  ionKind?: 'deprotonated' | 'protonated';
}

export interface SpeciesPlan {
  index: number;
  id: string;
  category: SpeciesCategory;
  /** as people write it (CuSO4·5H2O, C5H11COOH, SO4^2-) */
  formula: string;
  hill: string;
  charge: number;
  composition: Record<string, number>;
  molarMass: number;
  name: string;
  synonyms: string[];
  casRn: string | null;
  inchi: string | null;
  inchikey: string | null;
  phases: PhasePlan[];
  hints: ChemistryHints;
  /** index of the first release that holds the species (0, 1 or 2) */
  introRelease: number;
}

/** How the catalogue is split between kinds of species (fractions of the total). */
const SHARE = { salt: 0.25, organicIon: 0.12, molecular: 0.025 };

/**
 * The whole catalogue, deterministic for a seed and a size.
 *
 * @param total number of species (100 000 for the benchmark; less while developing)
 */
export function generateCatalogue(total: number, seed: string): SpeciesPlan[] {
  const builder = new CatalogueBuilder(seed);
  builder.addElements();
  builder.addCoreMolecules();
  builder.addMolecularInorganics(Math.round(total * SHARE.molecular));
  builder.addSalts(Math.round(total * SHARE.salt));
  const inorganicIons = CATIONS.length + ANIONS.filter((a) => !a.solidOnly).length;
  const organicIons = Math.round(total * SHARE.organicIon);
  const organics = total - builder.size - organicIons - inorganicIons;
  if (organics < 100) throw new Error(`A catalogue of ${total} species is too small (at least ~2 000)`);
  builder.addOrganics(organics);
  builder.addOrganicIons(organicIons);
  builder.addInorganicIons();
  if (builder.size !== total) throw new Error(`catalogue has ${builder.size} species, expected ${total}`);
  return builder.species;
}

class CatalogueBuilder {
  readonly species: SpeciesPlan[] = [];
  private readonly identities = new Set<string>();
  private readonly names = new Set<string>();
  private readonly reservedHill = new Set<string>();
  private readonly rng: SeededRandom;

  constructor(private readonly seed: string) {
    this.rng = new SeededRandom(`${seed}/catalogue`);
  }

  get size(): number {
    return this.species.length;
  }

  /** Adds a species unless its name (or Hill formula + name) is taken; returns it, or undefined. */
  private add(
    category: SpeciesCategory,
    formula: string,
    name: string,
    phases: { phase: PhaseCode; polymorph?: string | null; reference?: boolean }[],
    extra: { synonyms?: string[]; hints?: ChemistryHints; introRelease?: number; identifiers?: 'always' | 'often' | 'sometimes' | 'never' } = {},
  ): SpeciesPlan | undefined {
    const parsed = parseFormula(formula);
    const hill = hillFormula(parsed);
    const nameKey = name.toLowerCase();
    if (this.names.has(nameKey) || this.identities.has(`${hill}|${nameKey}`)) return undefined;
    if (category !== 'core' && this.reservedHill.has(hill)) return undefined;
    this.names.add(nameKey);
    this.identities.add(`${hill}|${nameKey}`);
    const index = this.species.length;
    const id = benchId('bench-species', `${this.seed}/${index}`);
    const identifierChance = { always: 1, often: 0.6, sometimes: 0.35, never: 0 }[extra.identifiers ?? 'sometimes'];
    const cas = this.rng.chance(identifierChance) ? casNumber(index, this.rng.int(10, 99)) : null;
    const hasInchi = category !== 'salt' && category !== 'ion' && this.rng.chance(identifierChance);
    const inchikey = hasInchi ? inchiKeyFor(`${hill}/${name}`) : null;
    const plan: SpeciesPlan = {
      index,
      id,
      category,
      formula,
      hill,
      charge: parsed.charge,
      composition: { ...parsed.elements },
      molarMass: molarMass(parsed),
      name,
      synonyms: extra.synonyms ?? [],
      casRn: cas,
      inchi: hasInchi ? `InChI=1S/${hill.replace(/[+-]\d*$/, '')}` : null,
      inchikey,
      phases: phases.map((p) => ({
        id: benchId('bench-phase', `${id}/${p.phase}/${p.polymorph ?? ''}`),
        phase: p.phase,
        polymorph: p.polymorph ?? null,
        isReferenceState: p.reference ?? false,
      })),
      hints: extra.hints ?? {},
      introRelease: extra.introRelease ?? this.rng.weighted([[0, 85], [1, 10], [2, 5]]),
    };
    this.species.push(plan);
    return plan;
  }

  addElements(): void {
    for (const element of ELEMENTS) {
      const ref = element.reference;
      const phases: { phase: PhaseCode; polymorph?: string | null; reference?: boolean }[] = [{ phase: ref.phase, polymorph: ref.polymorph ?? null, reference: true }];
      for (const polymorph of element.otherPolymorphs ?? []) phases.push({ phase: 'cr', polymorph });
      if (ref.phase !== 'g') phases.push({ phase: 'g' });
      this.add('element', ref.formula, element.name, phases, { hints: { element }, introRelease: 0, identifiers: 'always' });
      if (ref.atoms === 2) {
        this.add('atom', element.symbol, `atomic ${element.name}`, [{ phase: 'g' }], { hints: { element }, introRelease: 0, identifiers: 'never' });
      }
    }
    this.add('electron', 'e-', 'electron', [{ phase: 'g' }], { introRelease: 0, identifiers: 'never' });
  }

  addCoreMolecules(): void {
    for (const core of CORE_MOLECULES) this.reservedHill.add(hillFormula(parseFormula(core.formula)));
    for (const core of CORE_MOLECULES) {
      const parsed = parseFormula(core.formula);
      const dbe = organicDbe(parsed.elements);
      this.add('core', core.formula, core.name, core.phases.map((phase) => ({ phase })), {
        synonyms: core.synonyms, hints: { dbe }, introRelease: 0, identifiers: 'always',
      });
    }
  }

  /** Hydride parents with halogen substituents: SiH2Cl2 (dichlorosilane), PF5, SF6 … */
  addMolecularInorganics(limit: number): void {
    const candidates: { formula: string; name: string }[] = [];
    for (const parent of HYDRIDE_PARENTS) {
      const ligands = HALIDE_LIGANDS.filter((l) => l.symbol !== parent.central);
      for (const counts of multisets(ligands.length + 1, parent.valence)) {
        const hydrogens = counts[0];
        const parts = ligands.map((l, i) => ({ ...l, count: counts[i + 1] })).filter((l) => l.count > 0);
        const prefixes = parts.map((l) => `${MULTIPLIERS[l.count]}${l.prefix}`).join('');
        const name = prefixes && parent.parent.startsWith('λ') ? `${prefixes}-${parent.parent}` : prefixes + parent.parent;
        const formula = parent.central + (hydrogens ? `H${hydrogens > 1 ? hydrogens : ''}` : '') + parts.map((l) => l.symbol + (l.count > 1 ? l.count : '')).join('');
        candidates.push({ formula, name });
      }
    }
    let added = 0;
    for (const c of this.rng.shuffle(candidates)) {
      if (added >= limit) break;
      const phases: { phase: PhaseCode }[] = [{ phase: 'g' }, { phase: 'l' }];
      if (this.rng.chance(0.4)) phases.push({ phase: 'cr' });
      if (this.add('molecular', c.formula, c.name, phases, { identifiers: 'often' })) added++;
    }
  }

  /** Simple and double salts with their hydrates: NaCl, Ca(NO3)2·4H2O, KAl(SO4)2·12H2O … */
  addSalts(limit: number): void {
    const candidates: { formula: string; name: string; oldName: string | null; ions: [Ion, number][]; waters: number; solidOnly: boolean }[] = [];
    const hydrates = (anion: Ion, options: number[]) => (anion.solidOnly ? [0] : options);
    for (const cat of CATIONS) {
      for (const an of ANIONS) {
        const g = gcd(cat.charge, -an.charge);
        const nCat = -an.charge / g;
        const nAn = cat.charge / g;
        for (const waters of hydrates(an, [0, 1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 12])) {
          candidates.push({
            formula: ionFormula(cat, nCat) + ionFormula(an, nAn) + hydrateFormula(waters),
            name: `${cat.name} ${an.name}${waters ? ` ${HYDRATE_NAMES[waters]}` : ''}`,
            oldName: cat.oldName || an.oldName ? `${cat.oldName ?? cat.name} ${an.oldName ?? an.name}${waters ? ` ${HYDRATE_NAMES[waters]}` : ''}` : null,
            ions: [[cat, nCat], [an, nAn]],
            waters,
            solidOnly: an.solidOnly ?? false,
          });
        }
      }
    }
    const monovalent = CATIONS.filter((c) => c.charge === 1);
    for (const c1 of monovalent) {
      for (const c2 of CATIONS.filter((c) => c.charge === 2 || c.charge === 3)) {
        if (c2.formula === c1.formula) continue;
        for (const an of ANIONS.filter((a) => !a.solidOnly && (a.charge === -1 || a.charge === -2))) {
          // alums M(I)M(III)(X²⁻)2, Tutton salts M(I)2M(II)(X²⁻)2, and M(I)M(II)X⁻3
          let n1: number, nAn: number, waterOptions: number[];
          if (c2.charge === 3 && an.charge === -2) [n1, nAn, waterOptions] = [1, 2, [0, 6, 12]];
          else if (c2.charge === 2 && an.charge === -2) [n1, nAn, waterOptions] = [2, 2, [0, 4, 6]];
          else if (c2.charge === 2 && an.charge === -1) [n1, nAn, waterOptions] = [1, 3, [0, 2, 6]];
          else continue;
          for (const waters of waterOptions) {
            candidates.push({
              formula: ionFormula(c1, n1) + ionFormula(c2, 1) + ionFormula(an, nAn) + hydrateFormula(waters),
              name: `${c1.name} ${c2.name} ${an.name}${waters ? ` ${HYDRATE_NAMES[waters]}` : ''}`,
              oldName: c2.oldName || an.oldName ? `${c1.name} ${c2.oldName ?? c2.name} ${an.oldName ?? an.name}${waters ? ` ${HYDRATE_NAMES[waters]}` : ''}` : null,
              ions: [[c1, n1], [c2, 1], [an, nAn]],
              waters,
              solidOnly: false,
            });
          }
        }
      }
    }
    let added = 0;
    for (const c of this.rng.shuffle(candidates)) {
      if (added >= limit) break;
      const phases: { phase: PhaseCode; polymorph?: string }[] = this.rng.chance(0.04)
        ? [{ phase: 'cr', polymorph: 'alpha' }, { phase: 'cr', polymorph: 'beta' }]
        : [{ phase: 'cr' }];
      if (!c.solidOnly && this.rng.chance(0.75)) phases.push({ phase: 'aq' });
      if (phases.length < 3 && (phases.length < 2 || this.rng.chance(0.2))) phases.push({ phase: 'l' });
      const ionicEnthalpy = c.ions.reduce((sum, [ion, n]) => sum + n * ion.hAq, 0);
      const ionicEntropy = c.ions.reduce((sum, [ion, n]) => sum + n * ion.sAq, 0);
      const plan = this.add('salt', c.formula, c.name, phases, {
        synonyms: c.oldName ? [c.oldName] : [],
        hints: { ionicEnthalpy, ionicEntropy, hydrateWaters: c.waters },
        identifiers: 'often',
      });
      if (plan) added++;
    }
  }

  addOrganics(count: number): void {
    let attempts = 0;
    let added = 0;
    while (added < count) {
      if (++attempts > count * 50) throw new Error('the organic generator cannot find enough unique names');
      const draft = draftOrganic(this.rng);
      if (!draft) continue;
      const phases: { phase: PhaseCode; polymorph?: string }[] = [{ phase: 'g' }];
      const carbons = draft.counts.C ?? 0;
      if (this.rng.chance(0.9)) phases.push({ phase: 'l' });
      if (this.rng.chance(carbons > 14 ? 0.7 : 0.35) || phases.length < 2) {
        if (this.rng.chance(0.03)) phases.push({ phase: 'cr', polymorph: 'I' }, { phase: 'cr', polymorph: 'II' });
        else phases.push({ phase: 'cr' });
      }
      const synonyms = this.rng.chance(0.25) ? [`BX-${String(this.rng.int(0, 99999)).padStart(5, '0')}`] : [];
      const plan = this.add('organic', draft.formula, draft.name, phases, { synonyms, hints: { dbe: draft.dbe }, identifiers: 'sometimes' });
      if (plan) {
        added++;
        this.organicKinds.set(plan.index, draft.kind);
      }
    }
  }

  private readonly organicKinds = new Map<number, OrganicKind>();

  /** Carboxylates, alkoxides, aminium ions and protonated molecules of generated organics. */
  addOrganicIons(count: number): void {
    const parents = [...this.organicKinds.keys()];
    let added = 0;
    let attempts = 0;
    while (added < count) {
      if (++attempts > count * 50) throw new Error('the organic-ion generator cannot find enough unique names');
      const parent = this.species[this.rng.pick(parents)];
      const kind = this.organicKinds.get(parent.index)!;
      const ion = organicIon(parent, kind);
      if (!ion) continue;
      const phases: { phase: PhaseCode }[] = [{ phase: 'aq' }, { phase: 'g' }];
      if (this.rng.chance(0.25)) phases.push({ phase: 'aq,inf' });
      const plan = this.add('organic-ion', ion.formula, ion.name, phases, {
        hints: { dbe: parent.hints.dbe, parentIndex: parent.index, ionKind: ion.kind },
        introRelease: Math.max(parent.introRelease, this.rng.weighted([[0, 85], [1, 10], [2, 5]])),
        identifiers: 'never',
      });
      if (plan) added++;
    }
  }

  addInorganicIons(): void {
    for (const ion of [...CATIONS, ...ANIONS.filter((a) => !a.solidOnly)]) {
      const sign = ion.charge > 0 ? '+' : '-';
      const magnitude = Math.abs(ion.charge);
      const formula = ion.formula + (magnitude === 1 ? sign : `^${magnitude}${sign}`);
      const phases: { phase: PhaseCode }[] = [{ phase: 'aq' }, { phase: 'g' }];
      if (this.rng.chance(0.5)) phases.push({ phase: 'aq,inf' });
      const added = this.add('ion', formula, `${ion.name} ion`, phases, {
        synonyms: ion.oldName ? [`${ion.oldName} ion`] : [],
        hints: { ionicEnthalpy: ion.hAq, ionicEntropy: ion.sAq },
        introRelease: 0,
        identifiers: 'never',
      });
      if (!added) throw new Error(`ion ${formula} could not be added`);
    }
  }
}

type OrganicKind = 'acid' | 'amine' | 'alcohol' | 'other';

interface OrganicDraft {
  counts: Record<string, number>;
  dbe: number;
  name: string;
  formula: string;
  kind: OrganicKind;
}

/** Rings + π bonds of a formula with C, H, N, O, S, halogens, P, Si, B (valence rule). */
function organicDbe(elements: Readonly<Record<string, number>>): number {
  const e = (s: string) => elements[s] ?? 0;
  const tetravalent = e('C') + e('Si');
  const trivalent = e('N') + e('P') + e('B');
  const monovalent = e('H') + e('F') + e('Cl') + e('Br') + e('I');
  return Math.max(0, (2 * tetravalent + 2 + trivalent - monovalent) / 2);
}

const COMPOUND_SUBSTITUENTS = new Set(['methylsulfanyl', 'trimethylsilyl', 'propan-2-yl', 'tert-butyl']);
const COMPOUND_MULTIPLIERS = ['', '', 'bis', 'tris', 'tetrakis'];

interface Prefix {
  name: string;
  count: number;
}

/**
 * One organic molecule: a composition from the valence rule and a substitutive name that fits it
 * (chain or benzene parent, principal characteristic group as suffix, the rest as prefixes with
 * locants). Null when the drawn composition cannot be named (the caller draws again).
 */
function draftOrganic(rng: SeededRandom): OrganicDraft | null {
  const c = Math.min(30, Math.max(1, Math.round(rng.normal(8, 5))));
  const o = rng.weighted([[0, 30], [1, 30], [2, 22], [3, 10], [4, 5], [5, 2], [6, 1]]);
  const n = rng.weighted([[0, 65], [1, 25], [2, 8], [3, 2]]);
  const s = rng.weighted([[0, 88], [1, 10], [2, 2]]);
  const halogens: Record<string, number> = {};
  if (rng.chance(0.3)) {
    halogens[rng.weighted([['F', 35], ['Cl', 40], ['Br', 18], ['I', 7]])] = rng.weighted([[1, 60], [2, 25], [3, 12], [4, 3]]);
    if (rng.chance(0.15)) {
      const second = rng.pick(['F', 'Cl', 'Br']);
      halogens[second] = (halogens[second] ?? 0) + 1;
    }
  }
  const p = rng.chance(0.02) ? 1 : 0;
  const si = rng.chance(0.015) ? rng.int(1, 2) : 0;
  const b = rng.chance(0.005) ? 1 : 0;
  const x = Object.values(halogens).reduce((a, v) => a + v, 0);
  let dbe = rng.weighted([[0, 35], [1, 25], [2, 15], [3, 7], [4, c >= 6 ? 10 : 0], [5, c >= 7 ? 3 : 0], [6, c >= 8 ? 3 : 0], [7, c >= 10 ? 2 : 0]]);
  let h = 2 * c + 2 + n + p + b + 2 * si - x - 2 * dbe;
  while (h < 0 && dbe > 0) {
    dbe--;
    h += 2;
  }
  if (h < 0) return null;

  let remC = c, remO = o, remN = n, remS = s, remDbe = dbe;
  const aromatic = remDbe >= 4 && remC >= 6 && rng.chance(0.75);
  if (aromatic) {
    remC -= 6;
    remDbe -= 4;
  }
  type Suffix = 'acid' | 'nitrile' | 'al' | 'one' | 'ol' | 'amine' | 'thiol';
  let suffix: Suffix | null = null;
  let suffixCount = 1;
  let kind: OrganicKind = 'other';
  if (remO >= 2 && remDbe >= 1 && (aromatic || remC >= 1) && rng.chance(0.45)) {
    suffix = 'acid';
    remO -= 2;
    remDbe -= 1;
    kind = 'acid';
    if (aromatic) remC -= 1;
  } else if (remN >= 1 && remDbe >= 2 && (aromatic ? remC >= 1 : remC >= 1) && rng.chance(0.3)) {
    suffix = 'nitrile';
    remN -= 1;
    remDbe -= 2;
    if (aromatic) remC -= 1;
  } else if (remO >= 1 && remDbe >= 1 && rng.chance(0.45) && (aromatic ? remC >= 1 : remC >= 1)) {
    suffix = aromatic || remC === 1 || rng.chance(0.35) ? 'al' : 'one';
    if (suffix === 'one' && remC < 3) suffix = 'al';
    remO -= 1;
    remDbe -= 1;
    if (aromatic) remC -= 1;
  } else if (remO >= 1 && rng.chance(0.7)) {
    suffix = 'ol';
    suffixCount = Math.min(remO, rng.weighted([[1, 75], [2, 18], [3, 7]]));
    remO -= suffixCount;
    kind = suffixCount === 1 ? 'alcohol' : 'other';
  } else if (remN >= 1 && rng.chance(0.8)) {
    suffix = 'amine';
    remN -= 1;
    kind = 'amine';
  } else if (remS >= 1) {
    suffix = 'thiol';
    remS -= 1;
  }

  const prefixes: Prefix[] = [];
  const addPrefix = (name: string, count = 1) => {
    const existing = prefixes.find((q) => q.name === name);
    if (existing) existing.count += count;
    else prefixes.push({ name, count });
  };
  while (remN >= 1 && remO >= 2 && remDbe >= 1 && rng.chance(0.4)) {
    addPrefix('nitro');
    remN--;
    remO -= 2;
    remDbe--;
  }
  while (remO > 0) {
    if (remC >= 2 && rng.chance(0.3)) {
      addPrefix('methoxy');
      remC--;
    } else if (remDbe >= 1 && !aromatic && rng.chance(0.3)) {
      addPrefix('oxo');
      remDbe--;
    } else {
      addPrefix('hydroxy');
    }
    remO--;
  }
  while (remN > 0) {
    if (remC >= 2 && remDbe >= 2 && rng.chance(0.3)) {
      addPrefix('cyano');
      remC--;
      remDbe -= 2;
    } else {
      addPrefix('amino');
    }
    remN--;
  }
  while (remS > 0) {
    if (remC >= 2 && rng.chance(0.4)) {
      addPrefix('methylsulfanyl');
      remC--;
    } else {
      addPrefix('sulfanyl');
    }
    remS--;
  }
  const halogenPrefix: Record<string, string> = { F: 'fluoro', Cl: 'chloro', Br: 'bromo', I: 'iodo' };
  for (const [symbol, count] of Object.entries(halogens)) addPrefix(halogenPrefix[symbol], count);
  if (p) addPrefix('phosphanyl');
  for (let i = 0; i < si; i++) {
    if (remC >= 4 && rng.chance(0.5)) {
      addPrefix('trimethylsilyl');
      remC -= 3;
    } else {
      addPrefix('silyl');
    }
  }
  if (b) addPrefix('boryl');

  // Carbon skeleton: a cycle or chain of L carbons with alkyl branches; benzene takes all carbons as substituents.
  let ring = aromatic;
  let chain = 6;
  const branches: string[] = [];
  const takeBranches = (carbons: number) => {
    let left = carbons;
    while (left > 0) {
      if (left >= 4 && rng.chance(0.15)) {
        branches.push('tert-butyl');
        left -= 4;
      } else if (left >= 3 && rng.chance(0.2)) {
        branches.push(rng.chance(0.5) ? 'propyl' : 'propan-2-yl');
        left -= 3;
      } else if (left >= 2 && rng.chance(0.3)) {
        branches.push('ethyl');
        left -= 2;
      } else {
        branches.push('methyl');
        left -= 1;
      }
    }
  };
  let enCount = 0;
  let ynCount = 0;
  if (aromatic) {
    while (remDbe > 0) {
      if (remC >= 2 && remDbe >= 2 && rng.chance(0.3)) {
        addPrefix('ethynyl');
        remDbe -= 2;
      } else if (remC >= 2) {
        addPrefix('ethenyl');
        remDbe -= 1;
      } else {
        return null;
      }
      remC -= 2;
    }
    takeBranches(remC);
  } else {
    if (remC < 1) return null;
    if (remDbe >= 1 && remC >= 3 && rng.chance(0.35)) {
      ring = true;
      remDbe--;
    }
    const branchCarbons = remC >= 4 ? rng.int(0, Math.min(4, Math.floor((remC - 1) / 2))) : 0;
    chain = remC - branchCarbons;
    takeBranches(branchCarbons);
    while (remDbe > 0) {
      if (remDbe >= 2 && rng.chance(0.3)) {
        ynCount++;
        remDbe -= 2;
      } else {
        enCount++;
        remDbe -= 1;
      }
    }
    if (chain < 2 && enCount + ynCount > 0) return null;
    if (enCount + ynCount > Math.floor(chain / 2)) return null;
    if (chain > 30) return null;
  }
  for (const branch of branches) addPrefix(branch);

  const positions = aromatic ? 6 : chain;
  const locants = (count: number, fixedFirst = false) => {
    const set = new Set<number>(fixedFirst ? [1] : []);
    while (set.size < Math.min(count, positions)) set.add(rng.int(1, positions));
    const list = [...set].sort((a, z) => a - z);
    while (list.length < count) list.push(list[list.length - 1]);
    return list.join(',');
  };
  const prefixText = prefixes
    .sort((a, z) => a.name.replace(/^tert-/, '').localeCompare(z.name.replace(/^tert-/, '')))
    .map((q) => {
      // 2,4-dichloro, but 2,4-bis(methylsulfanyl): compound substituents take bis/tris and parentheses
      const compound = COMPOUND_SUBSTITUENTS.has(q.name);
      const multiplied = q.count === 1 ? q.name : compound ? `${COMPOUND_MULTIPLIERS[Math.min(q.count, 4)]}(${q.name})` : `${MULTIPLIERS[q.count]}${q.name}`;
      return `${locants(q.count)}-${multiplied}`;
    })
    .join('-');

  let parentName: string;
  if (aromatic) {
    parentName = { acid: 'benzoic acid', nitrile: 'benzonitrile', al: 'benzaldehyde', one: 'benzaldehyde', ol: suffixCount === 1 ? 'phenol' : `benzene-${locants(suffixCount, true)}-${MULTIPLIERS[suffixCount]}ol`, amine: 'aniline', thiol: 'benzenethiol' }[suffix ?? 'ol'];
    if (!suffix) parentName = 'benzene';
  } else {
    // hexane, hex-2-ene, hexa-2,4-diene, hex-1-en-4-yne
    const stem = `${ring ? 'cyclo' : ''}${CHAIN_STEMS[chain]}${enCount > 1 || ynCount > 1 ? 'a' : ''}`;
    let unsaturation = 'an';
    if (enCount + ynCount > 0) {
      unsaturation = '';
      if (enCount) unsaturation += `-${locants(enCount)}-${MULTIPLIERS[enCount]}en`;
      if (ynCount) unsaturation += `-${locants(ynCount)}-${MULTIPLIERS[ynCount]}yn`;
    }
    const base = stem + unsaturation;
    switch (suffix) {
      case 'acid': parentName = `${base}oic acid`; break;
      case 'nitrile': parentName = `${base}enitrile`; break;
      case 'al': parentName = `${base}al`; break;
      case 'one': parentName = `${base}-${locants(1)}-one`; break;
      case 'ol': parentName = suffixCount === 1 ? `${base}-${locants(1)}-ol` : `${base}e-${locants(suffixCount)}-${MULTIPLIERS[suffixCount]}ol`; break;
      case 'amine': parentName = `${base}-${locants(1)}-amine`; break;
      case 'thiol': parentName = `${base}e-${locants(1)}-thiol`; break;
      default: parentName = `${base}e`;
    }
  }
  const name = prefixText ? `${prefixText}${/^[0-9]/.test(parentName) ? '-' : ''}${parentName}` : parentName;

  const counts: Record<string, number> = { C: c, H: h };
  if (o) counts.O = o;
  if (n) counts.N = n;
  if (s) counts.S = s;
  if (p) counts.P = p;
  if (si) counts.Si = si;
  if (b) counts.B = b;
  for (const [symbol, count] of Object.entries(halogens)) counts[symbol] = count;
  if (counts.H === 0) delete counts.H;
  return { counts, dbe, name, formula: organicFormulaText(counts, kind, rng), kind };
}

/** Hill text of counts (C, H, then alphabetical), e.g. C5H11 or C2H3Cl. */
function hillText(counts: Record<string, number>): string {
  return hillOrder(Object.keys(counts).filter((k) => counts[k] > 0)).map((s) => s + (counts[s] === 1 ? '' : counts[s])).join('');
}

/** The formula the way a chemist might type it: Hill, or with the functional group written out (C5H11COOH). */
function organicFormulaText(counts: Record<string, number>, kind: OrganicKind, rng: SeededRandom): string {
  const minus = (group: Record<string, number>) => {
    const rest = { ...counts };
    for (const [s, k] of Object.entries(group)) rest[s] = (rest[s] ?? 0) - k;
    return Object.values(rest).every((v) => v >= 0) && (rest.C ?? 0) >= 1 ? rest : null;
  };
  if (kind === 'acid' && rng.chance(0.5)) {
    const rest = minus({ C: 1, O: 2, H: 1 });
    if (rest) return `${hillText(rest)}COOH`;
  }
  if (kind === 'alcohol' && rng.chance(0.5)) {
    const rest = minus({ O: 1, H: 1 });
    if (rest) return `${hillText(rest)}OH`;
  }
  if (kind === 'amine' && rng.chance(0.4)) {
    const rest = minus({ N: 1, H: 2 });
    if (rest) return `${hillText(rest)}NH2`;
  }
  return hillText(counts);
}

/** The ion an organic species forms: carboxylate, alkoxide, aminium, or a protonated molecule. */
function organicIon(parent: SpeciesPlan, kind: OrganicKind): { formula: string; name: string; kind: 'deprotonated' | 'protonated' } | null {
  const counts = { ...parent.composition };
  const name = parent.name;
  if ((kind === 'acid' || kind === 'alcohol') && (counts.H ?? 0) >= 1) {
    counts.H -= 1;
    if (counts.H === 0) delete counts.H;
    const ionName = kind === 'acid'
      ? name.replace(/oic acid$/, 'oate')
      : name === 'phenol' || name.endsWith('phenol') ? name.replace(/phenol$/, 'phenolate') : name.replace(/ol$/, 'olate');
    if (ionName === name) return null;
    return { formula: `${hillText(counts)}-`, name: ionName, kind: 'deprotonated' };
  }
  counts.H = (counts.H ?? 0) + 1;
  if (kind === 'amine') {
    const ionName = name.endsWith('aniline') ? name.replace(/aniline$/, 'anilinium') : name.replace(/amine$/, 'aminium');
    return { formula: `${hillText(counts)}+`, name: ionName, kind: 'protonated' };
  }
  return { formula: `${hillText(counts)}+`, name: `protonated ${name}`, kind: 'protonated' };
}

/** An ion as written in a salt formula: Ca, (NO3)2, (NH4)2, SO4. */
function ionFormula(ion: Ion, count: number): string {
  if (count === 1) return ion.formula;
  return ion.polyatomic ? `(${ion.formula})${count}` : `${ion.formula}${count}`;
}

function hydrateFormula(waters: number): string {
  if (waters === 0) return '';
  return `·${waters === 1 ? '' : waters}H2O`;
}

function gcd(a: number, b: number): number {
  return b === 0 ? a : gcd(b, a % b);
}

/** Count vectors of `kinds` kinds summing to `total` (multisets). */
function multisets(kinds: number, total: number): number[][] {
  if (kinds === 1) return [[total]];
  const out: number[][] = [];
  for (let first = total; first >= 0; first--) {
    for (const rest of multisets(kinds - 1, total - first)) out.push([first, ...rest]);
  }
  return out;
}

/** A CAS Registry Number that is unique per index and carries a valid check digit. */
function casNumber(index: number, middle: number): string {
  const digits = `${1_000_000 + index}${String(middle).padStart(2, '0')}`;
  let total = 0;
  for (let i = 0; i < digits.length; i++) total += (digits.length - i) * Number(digits[i]);
  return `${digits.slice(0, -2)}-${digits.slice(-2)}-${total % 10}`;
}

/** An InChIKey-shaped identifier derived from a text (unique in practice; not a real InChIKey). */
function inchiKeyFor(text: string): string {
  const rng = new SeededRandom(`inchikey/${text}`);
  const letters = (n: number) => Array.from({ length: n }, () => String.fromCharCode(65 + rng.int(0, 25))).join('');
  return `${letters(14)}-${letters(8)}SA-N`;
}
