import { ATOMIC_WEIGHTS, fitNasa7TwoRange, R, T_REF, type Nasa7Function } from '../src/thermo';
import { SeededRandom } from './seeded-random';
import { CORE_MOLECULES, ELEMENTS, type ElementData } from './synthetic-chemistry';
import type { PhasePlan, SpeciesPlan } from './synthetic-species';

/**
 * A physical model behind the invented values, so that they hang together the way real tables
 * do: ideal-gas S° and Cp(T) from translations, rotations and Einstein vibrations; ΔfH° from
 * group increments; liquids and crystals from vaporisation and fusion; salts from their ions;
 * ΔfG° = ΔfH° − T·ΔfS° against the elements' reference states (and the electron for ions).
 * Invented-but-plausible numbers for a benchmark, never check values.
 */

/** The "true" properties of one species phase at 298.15 K, SI. */
export interface PhaseTruth {
  /** J/mol */
  dfH: number;
  /** J/(mol·K), > 0 */
  S: number;
  /** J/(mol·K), > 0 */
  Cp: number;
  /** J/mol */
  dfG: number;
  /** ΔvapH / (J/mol) of a liquid */
  vapH?: number;
  /** Cp(T) / (J/(mol·K)) for the NASA-7 fit, and the fit's upper limit / K */
  heatCapacity?: (t: number) => number;
  fitTMax?: number;
}

const T = T_REF;
const einsteinCp = (x: number) => (x > 60 ? 0 : (x * x * Math.exp(x)) / (Math.exp(x) - 1) ** 2);
const einsteinS = (x: number) => (x > 60 ? 0 : x / (Math.exp(x) - 1) - Math.log(1 - Math.exp(-x)));
/** S° of translation at 298.15 K and 1 bar (Sackur–Tetrode) / (J/(mol·K)), M in g/mol. */
const translationalEntropy = (mass: number) => R * (1.5 * Math.log(mass) + 2.5 * Math.log(T) - 1.1517);

interface GasModel {
  cp(t: number): number;
  s298: number;
}

const CORE_BY_FORMULA = new Map(CORE_MOLECULES.map((m) => [m.formula, m]));
const LINEAR = new Set(['CO2', 'N2O', 'HCN', 'C2H2', 'CHN', 'OCS', 'CS2']);

/** Ideal-gas model of a molecule: translation, rotation and vibration modes in a few Einstein bins. */
function gasModel(composition: Record<string, number>, mass: number, hill: string, rng: SeededRandom): GasModel {
  const atoms = Object.values(composition).reduce((a, n) => a + n, 0);
  const sTrans = translationalEntropy(Math.max(mass, 5.4858e-4));
  if (atoms <= 1) {
    const electronic = R * Math.log(rng.int(1, 5));
    return { cp: () => 2.5 * R, s298: sTrans + electronic };
  }
  const linear = atoms === 2 || LINEAR.has(hill);
  const modes: [number, number][] = [];
  const total = 3 * atoms - (linear ? 5 : 6);
  if (atoms === 2) {
    modes.push([rng.uniform(400, 4300), 1]);
  } else {
    const hydrogens = Math.min(composition.H ?? 0, Math.floor(total / 2));
    if (hydrogens > 0) {
      modes.push([rng.normal(4200, 150), hydrogens], [rng.normal(1900, 200), hydrogens]);
    }
    let skeletal = total - 2 * hydrogens;
    const low = rng.uniform(120, 320);
    const high = rng.uniform(1500, 2300);
    const bins = Math.min(6, skeletal);
    for (let b = 0; b < bins; b++) {
      const count = b === bins - 1 ? skeletal : Math.max(1, Math.round(skeletal / (bins - b) * rng.uniform(0.7, 1.3)));
      skeletal -= count;
      modes.push([low * (high / low) ** (bins === 1 ? 0.5 : b / (bins - 1)), count]);
      if (skeletal <= 0) break;
    }
  }
  const base = linear ? 3.5 : 4;
  const sRot = linear ? R * (Math.log(T / rng.uniform(0.3, 3)) + 1) : 20 + 9.5 * Math.log(mass) + rng.normal(0, 3);
  let sVib = 0;
  for (const [theta, count] of modes) sVib += count * R * einsteinS(theta / T);
  return {
    cp: (t) => {
      let cp = base;
      for (const [theta, count] of modes) cp += count * einsteinCp(theta / t);
      return R * cp;
    },
    s298: sTrans + sRot + sVib,
  };
}

/** The Cp(T) and S° of an element's reference state. */
function referenceModel(element: ElementData, mass: number, rng: SeededRandom): GasModel {
  const atoms = element.reference.atoms;
  const model = element.model;
  switch (model.kind) {
    case 'diatomic': {
      const mu = (mass / 2) / 2;
      const thetaRot = 24.26 / (mu * model.bondLength ** 2);
      const sRot = R * (Math.log(T / (2 * thetaRot)) + 1);
      return {
        cp: (t) => R * (3.5 + einsteinCp(model.thetaVib / t)),
        s298: translationalEntropy(mass) + sRot + R * einsteinS(model.thetaVib / T) + (element.symbol === 'O' ? R * Math.log(3) : 0),
      };
    }
    case 'monatomic':
      return { cp: () => 2.5 * R, s298: translationalEntropy(mass) };
    case 'solid':
      return {
        cp: (t) => atoms * (3 * R * einsteinCp(model.thetaE / t) + model.gamma * t),
        s298: atoms * (3 * R * einsteinS(model.thetaE / T) + model.gamma * T) * rng.uniform(0.98, 1.02),
      };
    case 'liquid':
      return { cp: (t) => model.cp298 * (1 + 2e-4 * (t - T)), s298: model.s298 };
  }
}

/** Per element: S° of its reference state per atom / (J/(mol·K)), for ΔfS°. */
export interface ElementReferenceEntropies {
  perAtom: Map<string, number>;
  electron: number;
}

const ELECTRON_ENTROPY = 20.87;

export function referenceEntropies(seed: string): ElementReferenceEntropies {
  const perAtom = new Map<string, number>();
  for (const element of ELEMENTS) {
    const mass = ATOMIC_WEIGHTS.get(element.symbol)!.weight * element.reference.atoms;
    const model = referenceModel(element, mass, new SeededRandom(`${seed}/element/${element.symbol}`));
    perAtom.set(element.symbol, model.s298 / element.reference.atoms);
  }
  return { perAtom, electron: ELECTRON_ENTROPY };
}

/** ΔfG° = ΔfH° − T·ΔfS°, with ΔfS° = S° − Σ n·S°(element) + z·S°(e⁻). */
function gibbs(species: SpeciesPlan, dfH: number, s: number, refs: ElementReferenceEntropies): number {
  let elements = 0;
  for (const [symbol, n] of Object.entries(species.composition)) elements += n * (refs.perAtom.get(symbol) ?? 30);
  return dfH - T * (s - elements + species.charge * refs.electron);
}

/** Upper limit of a gas fit: small molecules to 6000 K, large ones to 3000 K (as published sets do). */
function gasFitTMax(atoms: number): number {
  return atoms <= 6 ? 6000 : atoms <= 14 ? 5000 : 3000;
}

const heavyAtoms = (c: Record<string, number>) => Object.entries(c).reduce((a, [s, n]) => a + (s === 'H' ? 0 : n), 0);
const atomCount = (c: Record<string, number>) => Object.values(c).reduce((a, n) => a + n, 0);
const count = (c: Record<string, number>, s: string) => c[s] ?? 0;

/** ΔfH°(g) / (kJ/mol) of an organic molecule from group increments. */
function organicGasEnthalpy(c: Record<string, number>, dbe: number, rng: SeededRandom): number {
  const carbons = count(c, 'C');
  return -41.9 - 20.6 * carbons + 70 * dbe - 165 * count(c, 'O') + 51 * count(c, 'N') + 52 * count(c, 'S') - 160 * count(c, 'F')
    - 12 * count(c, 'Cl') + 37 * count(c, 'Br') + 89 * count(c, 'I') - 100 * count(c, 'P') - 65 * count(c, 'Si') - 90 * count(c, 'B')
    + rng.normal(0, 6 + 0.8 * carbons);
}

const LIGAND_ENTHALPY: Record<string, number> = { H: -10, F: -250, Cl: -80, Br: -30, I: 10 };
const CENTRAL_ENTHALPY: Record<string, number> = { B: -50, Si: -100, Ge: -30, Sn: 0, N: 40, P: -20, As: 0, Sb: 20, S: -10, Se: 20, Te: 40 };

/** Einstein-solid Cp and Latimer-like S° of a salt's atoms (waters of crystallisation apart). */
function saltSolid(c: Record<string, number>, waters: number, rng: SeededRandom): { S: number; Cp: number } {
  let s = 0;
  let cp = 0;
  for (const [symbol, n] of Object.entries(c)) {
    let atoms = n;
    if (symbol === 'H') atoms -= 2 * waters;
    if (symbol === 'O') atoms -= waters;
    if (atoms <= 0) continue;
    const m = ATOMIC_WEIGHTS.get(symbol)!.weight;
    s += atoms * (9 + 6 * Math.log(m));
    cp += atoms * 3 * R * einsteinCp((60 + 1800 / Math.sqrt(m)) / T);
  }
  return { S: (s + 40 * waters) * rng.uniform(0.9, 1.1), Cp: (cp + 38 * waters) * rng.uniform(0.93, 1.07) };
}

/**
 * The true properties of every phase of a species, keyed by phase id. Deterministic per species.
 * `parentTruth` gives an organic ion the gas and liquid properties of its neutral parent.
 */
export function phaseTruths(
  species: SpeciesPlan,
  seed: string,
  refs: ElementReferenceEntropies,
  parent?: SpeciesPlan,
): Map<string, PhaseTruth> {
  const rng = new SeededRandom(`${seed}/thermo/${species.index}`);
  const c = species.composition;
  const truths = new Map<string, PhaseTruth>();
  const kJ = 1000;
  const finish = (phase: PhasePlan, t: Omit<PhaseTruth, 'dfG'> & { dfG?: number }) => {
    const S = Math.max(t.S, 1);
    truths.set(phase.id, { ...t, S, Cp: Math.max(t.Cp, 1), dfG: t.dfG ?? gibbs(species, t.dfH, S, refs) });
  };
  const gas = gasModel(c, species.molarMass, species.hill, rng);
  const gasTruth = (dfHkJ: number, s298 = gas.s298): Omit<PhaseTruth, 'dfG'> => ({
    dfH: dfHkJ * kJ,
    S: s298,
    Cp: gas.cp(T),
    heatCapacity: gas.cp,
    fitTMax: gasFitTMax(atomCount(c)),
  });

  if (species.category === 'element' || species.category === 'atom' || species.category === 'electron') {
    const element = species.hints.element;
    for (const phase of species.phases) {
      if (species.category === 'electron') {
        finish(phase, { dfH: 0, S: ELECTRON_ENTROPY, Cp: 2.5 * R, heatCapacity: () => 2.5 * R, fitTMax: 6000, dfG: 0 });
      } else if (species.category === 'atom') {
        finish(phase, gasTruth(element!.atomization));
      } else if (phase.isReferenceState) {
        const model = referenceModel(element!, species.molarMass, new SeededRandom(`${seed}/element/${element!.symbol}`));
        finish(phase, { dfH: 0, S: model.s298, Cp: model.cp(T), dfG: 0, heatCapacity: model.cp, fitTMax: phase.phase === 'g' ? 6000 : 3000 });
      } else if (phase.phase === 'g') {
        // the gas of a condensed element: atoms (Na(g)), or molecules for Br2 and I2
        const diatomic = element!.reference.atoms === 2;
        const model = diatomic
          ? referenceModel({ ...element!, model: { kind: 'diatomic', thetaVib: element!.symbol === 'Br' ? 470 : 308, bondLength: element!.symbol === 'Br' ? 2.281 : 2.666 } }, species.molarMass, rng)
          : { cp: () => 2.5 * R, s298: translationalEntropy(species.molarMass) + R * Math.log(rng.int(1, 5)) };
        const dfH = diatomic ? (element!.symbol === 'Br' ? 30.9 : 62.4) : element!.atomization;
        finish(phase, { dfH: dfH * kJ, S: model.s298, Cp: model.cp(T), heatCapacity: model.cp, fitTMax: 6000 });
      } else {
        const reference = truths.get(species.phases[0].id)!;
        finish(phase, { dfH: rng.uniform(-18, 18) * kJ, S: reference.S * rng.uniform(0.7, 1.3), Cp: reference.Cp * rng.uniform(0.9, 1.1) });
      }
    }
    return truths;
  }

  if (species.category === 'salt') {
    const waters = species.hints.hydrateWaters ?? 0;
    const solid = saltSolid(c, waters, rng);
    const dfHcr = (species.hints.ionicEnthalpy! - 298 * waters + rng.normal(-15, 25)) * kJ;
    const fusion = rng.uniform(15, 60) * Math.sqrt(heavyAtoms(c) / 2) * kJ;
    const meltingPoint = rng.uniform(600, 1500);
    let first = true;
    for (const phase of species.phases) {
      if (phase.phase === 'cr') {
        const shift = first ? 0 : rng.uniform(0.5, 4) * kJ;
        finish(phase, { dfH: dfHcr + shift, S: solid.S + (first ? 0 : rng.uniform(0.5, 3)), Cp: solid.Cp * (first ? 1 : rng.uniform(0.98, 1.02)) });
        first = false;
      } else if (phase.phase === 'l') {
        finish(phase, { dfH: dfHcr + fusion, S: solid.S + fusion / meltingPoint, Cp: solid.Cp * 1.25 });
      } else {
        finish(phase, {
          dfH: (species.hints.ionicEnthalpy! - 285.8 * waters + rng.normal(0, 5)) * kJ,
          S: Math.max(8, species.hints.ionicEntropy! + 70 * waters + rng.normal(0, 5)),
          Cp: Math.max(5, 0.7 * solid.Cp + rng.normal(0, 10)),
        });
      }
    }
    return truths;
  }

  if (species.category === 'ion' || species.category === 'organic-ion') {
    const z = species.charge;
    let gasEnthalpy: number;
    let aqEnthalpy: number;
    let aqEntropy: number;
    if (species.category === 'ion') {
      aqEnthalpy = species.hints.ionicEnthalpy! + rng.normal(0, 2);
      gasEnthalpy = z > 0 ? aqEnthalpy + 850 * z ** 1.5 + rng.normal(0, 40) : aqEnthalpy - 60 * z * z + rng.normal(0, 30);
      aqEntropy = Math.max(5, species.hints.ionicEntropy! + rng.normal(0, 2));
    } else {
      const parentTruth = phaseTruths(parent!, seed, refs);
      const parentGas = [...parentTruth.values()][0];
      const parentLiquidEnthalpy = parentGas.dfH / kJ - (4.7 + 4.6 * heavyAtoms(parent!.composition));
      if (species.hints.ionKind === 'deprotonated') {
        gasEnthalpy = parentGas.dfH / kJ + (count(c, 'O') >= 2 ? -90 : 30) + rng.normal(0, 10);
        aqEnthalpy = parentLiquidEnthalpy + rng.normal(-5, 10);
      } else {
        gasEnthalpy = parentGas.dfH / kJ + 1530 - rng.uniform(750, 950);
        aqEnthalpy = parentLiquidEnthalpy + rng.normal(-40, 15);
      }
      aqEntropy = Math.max(20, parentGas.S * 0.55 + rng.normal(0, 10));
    }
    const aqCp = rng.uniform(20, 60) + 4 * heavyAtoms(c);
    for (const phase of species.phases) {
      if (phase.phase === 'g') finish(phase, gasTruth(gasEnthalpy));
      else if (phase.phase === 'aq') finish(phase, { dfH: aqEnthalpy * kJ, S: aqEntropy, Cp: aqCp });
      else finish(phase, { dfH: (aqEnthalpy + rng.normal(0, 0.5)) * kJ, S: aqEntropy + rng.normal(0, 1), Cp: aqCp * rng.uniform(0.97, 1.03) });
    }
    return truths;
  }

  // neutral molecules: core, molecular inorganics, organics
  let gasEnthalpy: number;
  let gasEntropy = gas.s298;
  const core = species.category === 'core' ? CORE_BY_FORMULA.get(species.formula) : undefined;
  if (core) {
    gasEnthalpy = core.gas.dfH;
    gasEntropy = core.gas.S;
  } else if (species.category === 'molecular') {
    gasEnthalpy = Object.entries(c).reduce((sum, [symbol, n]) => sum + (LIGAND_ENTHALPY[symbol] !== undefined && symbol !== centralAtom(c) ? n * LIGAND_ENTHALPY[symbol] : 0), CENTRAL_ENTHALPY[centralAtom(c)] ?? 0) + rng.normal(0, 15);
  } else {
    gasEnthalpy = organicGasEnthalpy(c, species.hints.dbe ?? 0, rng);
  }
  const heavy = heavyAtoms(c);
  const polar = count(c, 'O') + count(c, 'N') > 0;
  const vapH = core?.vapH ?? 4.7 + 4.6 * heavy + 10 * Math.min(count(c, 'O'), 2) + 6 * Math.min(count(c, 'N'), 2) + rng.normal(0, 2);
  const vapS = 85 + (polar ? 10 : 0) + rng.normal(0, 4);
  const liquid = { dfH: (gasEnthalpy - Math.max(vapH, 3)) * kJ, S: Math.max(gasEntropy - vapS, 0.35 * gasEntropy), Cp: 1.3 * gas.cp(T) + 15 + rng.normal(0, 3) };
  const fusion = (2 + 2.4 * heavy) * rng.uniform(0.7, 1.3);
  const meltingPoint = rng.uniform(120, 480);
  const crystal = { dfH: liquid.dfH - fusion * kJ, S: Math.max(liquid.S - (fusion * kJ) / meltingPoint, 0.3 * liquid.S), Cp: 0.8 * liquid.Cp };
  let crystals = 0;
  for (const phase of species.phases) {
    if (phase.phase === 'g') finish(phase, gasTruth(gasEnthalpy, gasEntropy));
    else if (phase.phase === 'l') finish(phase, { ...liquid, vapH: Math.max(vapH, 3) * kJ });
    else if (crystals++ === 0) finish(phase, crystal);
    else finish(phase, { dfH: crystal.dfH + rng.uniform(0.5, 5) * kJ, S: crystal.S + rng.uniform(-3, 3), Cp: crystal.Cp * rng.uniform(0.98, 1.02) });
  }
  return truths;
}

/** The central atom of a molecular inorganic (the one that is not a halogen or H; else the first). */
function centralAtom(c: Record<string, number>): string {
  return Object.keys(c).find((s) => LIGAND_ENTHALPY[s] === undefined) ?? Object.keys(c)[0];
}

/** Temperatures at which Cp(T) is sampled for the fit / K. */
function samplePoints(tMax: number): number[] {
  const low = [200, 250, T_REF, 350, 400, 450, 500, 600, 700, 800, 900, 1000];
  const high = [1100, 1200, 1300, 1400, 1500, 1750, 2000, 2250, 2500, 2750, 3000, 3500, 4000, 4500, 5000, 5500, 6000];
  return [...low, ...high.filter((t) => t <= tMax)];
}

/**
 * A two-range NASA-7 fit (200–1000–tMax K) of a Cp(T) curve, continuous in Cp, H and S at
 * 1000 K and anchored at the given ΔfH° and S° — the engine's own least-squares fitter.
 */
export function nasa7Fit(heatCapacity: (t: number) => number, tMax: number, formationEnthalpy: number, entropy: number, cpScale = 1): Nasa7Function {
  const points = samplePoints(tMax).map((temperature) => ({ temperature, cp: heatCapacity(temperature) * cpScale }));
  return fitNasa7TwoRange({ points, tMid: 1000, formationEnthalpy, entropy }).fit;
}
