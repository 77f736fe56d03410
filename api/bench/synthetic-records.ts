import type { Quantity } from '../src/values/value-vocabulary';
import { benchId, SeededRandom } from './seeded-random';
import { candidateSources, fitSources, reading, SOURCE_BY_KEY, type Reading, type SyntheticSource } from './synthetic-sources';
import type { PhaseTruth } from './synthetic-thermo';
import type { PhasePlan, SpeciesPlan } from './synthetic-species';

/**
 * The versioned records of one species: value lineages (each a chain of versions, some revised,
 * some retired) and NASA-7 fit lineages, and when each version entered the catalogue — from which
 * every release's membership and its one recommended member per group follow.
 */

/** The three releases of the data set: two published, one in preparation. */
export const RELEASES = [
  { label: '2024.1', createdAt: '2024-01-15T09:00:00.000Z', publishedAt: '2024-02-01T12:00:00.000Z' },
  { label: '2025.1', createdAt: '2025-01-13T09:00:00.000Z', publishedAt: '2025-02-03T12:00:00.000Z' },
  { label: '2026.1', createdAt: '2026-01-12T09:00:00.000Z', publishedAt: null },
] as const;

export interface ValueVersion {
  id: string;
  versionNo: number;
  supersedesId: string | null;
  /** index of the release this version first appears in */
  release: number;
  createdAt: string;
  reading: Reading;
  retiredReason: string | null;
  notes: string | null;
}

export interface ValueLineage {
  lineageId: string;
  phase: PhasePlan;
  quantity: Quantity;
  transitionKind: 'vap' | null;
  source: SyntheticSource;
  /** draw order within its group: 0 is the lineage every release keeps */
  order: number;
  versions: ValueVersion[];
}

export interface FitVersion {
  id: string;
  versionNo: number;
  supersedesId: string | null;
  release: number;
  createdAt: string;
  /** ΔfH° / (J/mol) and S° / (J/(mol·K)) the fit is anchored at, and a scale on Cp (the source's spread) */
  formationEnthalpy: number;
  entropy: number;
  cpScale: number;
  notes: string | null;
}

export interface FitLineage {
  lineageId: string;
  phase: PhasePlan;
  source: SyntheticSource;
  order: number;
  tMax: number;
  heatCapacity: (t: number) => number;
  versions: FitVersion[];
}

export interface SpeciesRecords {
  values: ValueLineage[];
  fits: FitLineage[];
  /** groups whose recommendation moves to the second-best member from release 2025.1 on */
  switchedGroups: Set<string>;
}

const ALTERNATIVE_CHANCE: Record<Quantity, number> = { dfH: 0.35, S: 0.25, Cp: 0.15, dfG: 0.1, dtrsH: 0.1 };

function dateBefore(release: number, rng: SeededRandom): string {
  return new Date(Date.parse(RELEASES[release].createdAt) - rng.int(1, 200) * 86_400_000 - rng.int(0, 86_399) * 1000).toISOString();
}

/** Sources drawn without replacement, by weight. */
function drawSources(candidates: readonly (readonly [string, number])[], n: number, rng: SeededRandom): string[] {
  const pool = [...candidates];
  const out: string[] = [];
  while (out.length < n && pool.length > 0) {
    const key = rng.weighted(pool);
    out.push(key);
    pool.splice(pool.findIndex(([k]) => k === key), 1);
  }
  return out;
}

/** A source's reading of a true value: noise of the size of its uncertainty, rounding, ± as it prints it. */
function readTrue(source: SyntheticSource, quantity: Quantity, truth: number, rng: SeededRandom, improved = false): Reading {
  const range = source.uncertainty[quantity] ?? (quantity === 'dfH' || quantity === 'dfG' || quantity === 'dtrsH' ? [1000, 5000] : [0.5, 3]);
  const u = rng.logUniform(range[0], range[1]) * (improved ? 0.6 : 1);
  const spread = source.method === 'estimated' ? 1 : 0.7;
  let value = truth + rng.normal(0, u * spread);
  if (quantity === 'S' || quantity === 'Cp' || quantity === 'dtrsH') value = Math.max(value, 0.5 * truth, 0.05);
  const stated = !improved && rng.chance(source.withoutUncertainty) ? null : u;
  return reading(source, quantity, value, stated);
}

/** ΔfH° and ΔfG° of an element in its reference state: zero by definition, exact. */
const EXACT_ZERO: Reading = { valueSi: 0, uncertaintySi: 0, uncertaintyKind: 'standard', coverageFactor: null, enteredValue: '0', enteredUnit: 'kJ/mol' };

/** Every value and fit lineage of a species, deterministic for the seed. */
export function speciesRecords(species: SpeciesPlan, truths: Map<string, PhaseTruth>, seed: string): SpeciesRecords {
  const rng = new SeededRandom(`${seed}/records/${species.index}`);
  const values: ValueLineage[] = [];
  const fits: FitLineage[] = [];
  const switchedGroups = new Set<string>();
  const definitional = (phase: PhasePlan) => phase.isReferenceState || species.category === 'electron';

  for (const phase of species.phases) {
    const truth = truths.get(phase.id)!;
    const quantities: Quantity[] = ['dfH', 'S', 'Cp'];
    const always = species.category !== 'organic' && species.category !== 'salt' && species.category !== 'organic-ion';
    if (always || rng.chance(0.55)) quantities.push('dfG');
    if (species.category === 'organic' && phase.phase === 'l' && truth.vapH && rng.chance(0.3)) quantities.push('dtrsH');

    for (const quantity of quantities) {
      const trueValue = quantity === 'dtrsH' ? truth.vapH! : truth[quantity as 'dfH' | 'S' | 'Cp' | 'dfG'];
      const zero = (quantity === 'dfH' || quantity === 'dfG') && definitional(phase);
      const candidates = candidateSources(species.category, phase.phase, quantity);
      const n = zero ? 1 : 1 + (rng.chance(ALTERNATIVE_CHANCE[quantity]) ? 1 : 0) + (rng.chance(0.04) ? 1 : 0);
      const keys = drawSources(candidates, n, rng);
      keys.forEach((key, order) => {
        const source = SOURCE_BY_KEY.get(key)!;
        const intro = order === 0 ? species.introRelease : Math.min(2, species.introRelease + rng.weighted([[0, 75], [1, 20], [2, 5]]));
        const lineageId = benchId('bench-value', `${phase.id}/${quantity}/${order}/1`);
        const first: ValueVersion = {
          id: lineageId, versionNo: 1, supersedesId: null, release: intro, createdAt: dateBefore(intro, rng),
          reading: zero ? EXACT_ZERO : readTrue(source, quantity, trueValue, rng), retiredReason: null, notes: null,
        };
        const versions = [first];
        for (let r = intro + 1; r <= 2 && !zero; r++) {
          const previous = versions[versions.length - 1];
          const id = benchId('bench-value', `${phase.id}/${quantity}/${order}/${previous.versionNo + 1}`);
          if (order > 0 && rng.chance(0.01)) {
            versions.push({
              id, versionNo: previous.versionNo + 1, supersedesId: previous.id, release: r, createdAt: dateBefore(r, rng), reading: previous.reading,
              retiredReason: 'Superseded by a re-evaluation of the same measurements; kept out of later releases.', notes: null,
            });
            break;
          }
          if (rng.chance(r === 1 ? 0.03 : 0.02)) {
            versions.push({
              id, versionNo: previous.versionNo + 1, supersedesId: previous.id, release: r, createdAt: dateBefore(r, rng),
              reading: readTrue(source, quantity, trueValue, rng, true), retiredReason: null,
              notes: 'Revised: recalculated with the corrected auxiliary data of the source’s erratum.',
            });
          }
        }
        values.push({ lineageId, phase, quantity, transitionKind: quantity === 'dtrsH' ? 'vap' : null, source, order, versions });
      });
      if (keys.length > 1 && rng.chance(0.03)) switchedGroups.add(groupKey(phase.id, 'value', quantity, quantity === 'dtrsH' ? 'vap' : null));
    }

    if (truth.heatCapacity && (phase.phase === 'g' || phase.isReferenceState)) {
      const atoms = Object.values(species.composition).reduce((a, k) => a + k, 0);
      const sources = fitSources(species.category, atoms);
      const keys = phase.phase === 'g' ? [sources.primary, ...(rng.chance(0.08) ? [sources.alternative] : [])] : ['bx-ref-2019'];
      keys.forEach((key, order) => {
        const source = SOURCE_BY_KEY.get(key)!;
        const intro = order === 0 ? species.introRelease : Math.min(2, species.introRelease + rng.weighted([[0, 80], [1, 20]]));
        const anchor = (spread: number) => ({
          formationEnthalpy: truth.dfH + (definitional(phase) ? 0 : rng.normal(0, 1000 * spread)),
          entropy: truth.S + rng.normal(0, 0.3 * spread),
          cpScale: 1 + rng.normal(0, 0.004 * spread),
        });
        const lineageId = benchId('bench-fit', `${phase.id}/${order}/1`);
        const versions: FitVersion[] = [{ id: lineageId, versionNo: 1, supersedesId: null, release: intro, createdAt: dateBefore(intro, rng), ...anchor(order + 1), notes: null }];
        if (intro === 0 && rng.chance(0.01)) {
          versions.push({
            id: benchId('bench-fit', `${phase.id}/${order}/2`), versionNo: 2, supersedesId: lineageId, release: 1, createdAt: dateBefore(1, rng), ...anchor(0.5),
            notes: 'Refitted to the revised heat-capacity table.',
          });
        }
        fits.push({ lineageId, phase, source, order, tMax: truth.fitTMax!, heatCapacity: truth.heatCapacity!, versions });
      });
    }
  }
  return { values, fits, switchedGroups };
}

export function groupKey(phaseId: string, kind: 'value' | 'fit', quantity: string, transition: string | null): string {
  return `${phaseId}|${kind}|${quantity}|${transition ?? ''}`;
}

/** A lineage as release `r` holds it: the version, and whether it is the group's recommended member. */
export interface Membership {
  kind: 'value' | 'fit';
  lineageId: string;
  versionId: string;
  phaseId: string;
  quantity: Quantity;
  transitionKind: 'vap' | null;
  recommended: boolean;
}

/**
 * What release `r` holds of a species: for each lineage present, the latest version up to r
 * (retired lineages drop out), and per group exactly one recommended member — the best source
 * by priority, or the second best in groups whose recommendation changed in 2025.1.
 */
export function membership(records: SpeciesRecords, r: number): Membership[] {
  const groups = new Map<string, { priority: number; order: number; member: Membership }[]>();
  const add = (key: string, priority: number, order: number, member: Membership) => {
    const list = groups.get(key) ?? [];
    list.push({ priority, order, member });
    groups.set(key, list);
  };
  for (const lineage of records.values) {
    const held = lineage.versions.filter((v) => v.release <= r);
    const version = held[held.length - 1];
    if (!version || version.retiredReason) continue;
    add(groupKey(lineage.phase.id, 'value', lineage.quantity, lineage.transitionKind), lineage.source.priority, lineage.order, {
      kind: 'value', lineageId: lineage.lineageId, versionId: version.id, phaseId: lineage.phase.id, quantity: lineage.quantity,
      transitionKind: lineage.transitionKind, recommended: false,
    });
  }
  for (const lineage of records.fits) {
    const held = lineage.versions.filter((v) => v.release <= r);
    const version = held[held.length - 1];
    if (!version) continue;
    add(groupKey(lineage.phase.id, 'fit', 'Cp', null), lineage.source.priority, lineage.order, {
      kind: 'fit', lineageId: lineage.lineageId, versionId: version.id, phaseId: lineage.phase.id, quantity: 'Cp', transitionKind: null, recommended: false,
    });
  }
  const out: Membership[] = [];
  for (const [key, list] of groups) {
    list.sort((a, b) => a.priority - b.priority || a.order - b.order);
    const pick = records.switchedGroups.has(key) && r >= 1 && list.length > 1 ? 1 : 0;
    list[pick].member.recommended = true;
    for (const entry of list) out.push(entry.member);
  }
  return out;
}
