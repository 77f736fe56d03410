import type { EntityManager } from 'typeorm';
import type { PhaseCode } from '../species/phase-code';
import type { FitRange } from '../values/fit-ranges';
import type { FitForm, Method, Quantity, TransitionKind, UncertaintyKind } from '../values/value-vocabulary';
import { Release } from './release.entity';

/** One value version as a release holds it, with what a reader needs to cite it. */
export interface SnapshotValue {
  valueId: string;
  lineageId: string;
  versionNo: number;
  recommended: boolean;
  speciesId: string;
  speciesName: string;
  hillFormula: string;
  speciesPhaseId: string;
  phase: PhaseCode;
  polymorph: string | null;
  quantity: Quantity;
  transitionKind: TransitionKind | null;
  /** SI: J/mol or J/(mol·K) */
  valueSi: number;
  uncertaintySi: number | null;
  uncertaintyKind: UncertaintyKind | null;
  coverageFactor: number | null;
  /** K */
  temperatureK: number;
  /** Pa */
  pressurePa: number;
  method: Method;
  levelOfTheory: string | null;
  enteredValue: string;
  enteredUnit: string;
  sourceId: string;
  sourceKey: string;
  doi: string | null;
}

/** One heat-capacity fit version as a release holds it. */
export interface SnapshotFit {
  fitId: string;
  lineageId: string;
  versionNo: number;
  recommended: boolean;
  speciesId: string;
  hillFormula: string;
  speciesPhaseId: string;
  phase: PhaseCode;
  polymorph: string | null;
  form: FitForm;
  tMinK: number;
  tMaxK: number;
  ranges: FitRange[];
  pressurePa: number;
  method: Method;
  sourceId: string;
  sourceKey: string;
}

export interface ReleaseSnapshot {
  release: { id: string; label: string; status: Release['status']; publishedAt: Date | null };
  values: SnapshotValue[];
  fits: SnapshotFit[];
}

export interface SnapshotFilter {
  speciesId?: string;
  speciesPhaseId?: string;
  quantity?: Quantity;
  /** only the recommended member of each species phase and quantity */
  recommendedOnly?: boolean;
}

/**
 * The release with this label, or the latest published release when no label is given;
 * undefined when there is none.
 */
export async function findRelease(manager: EntityManager, label?: string): Promise<Release | undefined> {
  const query = manager.getRepository(Release).createQueryBuilder('r');
  if (label !== undefined) query.where('r.label = :label', { label });
  else query.where(`r.status = 'published'`).orderBy(`split_part(r.label, '.', 1)::int`, 'DESC').addOrderBy(`split_part(r.label, '.', 2)::int`, 'DESC');
  return (await query.limit(1).getOne()) ?? undefined;
}

/**
 * Exactly what release `label` holds ("as of release R"): the value and fit versions that are its
 * members, with their recommended flags, ordered by Hill formula, phase, quantity and lineage.
 * For a published release the answer never changes: its membership and every row it points at
 * are immutable in the database.
 *
 * @returns undefined when no release has this label
 */
export async function releaseSnapshot(manager: EntityManager, label: string, filter: SnapshotFilter = {}): Promise<ReleaseSnapshot | undefined> {
  const release = await findRelease(manager, label);
  if (!release) return undefined;
  const valueWhere = memberConditions(release.id, filter, true);
  const fitWhere = memberConditions(release.id, filter, false);

  const values: SnapshotValue[] = await manager.query(
    `SELECT v.id AS "valueId", v.lineage_id AS "lineageId", v.version_no AS "versionNo", m.is_recommended AS "recommended",
            s.id AS "speciesId", s.name AS "speciesName", s.hill_formula AS "hillFormula",
            sp.id AS "speciesPhaseId", sp.phase, sp.polymorph,
            v.quantity, v.transition_kind AS "transitionKind", v.value_si AS "valueSi", v.uncertainty_si AS "uncertaintySi",
            v.uncertainty_kind AS "uncertaintyKind", v.coverage_factor AS "coverageFactor", v.temperature_k AS "temperatureK",
            v.pressure_pa AS "pressurePa", v.method, v.level_of_theory AS "levelOfTheory",
            v.entered_value AS "enteredValue", v.entered_unit AS "enteredUnit",
            src.id AS "sourceId", src.short_key AS "sourceKey", src.doi
       FROM release_members m
       JOIN thermo_values v ON v.id = m.value_id
       JOIN species_phases sp ON sp.id = m.species_phase_id
       JOIN species s ON s.id = sp.species_id
       JOIN sources src ON src.id = v.source_id
      WHERE ${valueWhere.sql}
      ORDER BY s.hill_formula, s.name, sp.phase, sp.polymorph NULLS FIRST, v.quantity, v.transition_kind NULLS FIRST,
               m.is_recommended DESC, src.short_key, v.lineage_id`,
    valueWhere.params,
  );
  // A fit is a Cp function: a quantity filter other than Cp leaves fits out.
  const fits: SnapshotFit[] = filter.quantity && filter.quantity !== 'Cp' ? [] : await manager.query(
    `SELECT f.id AS "fitId", f.lineage_id AS "lineageId", f.version_no AS "versionNo", m.is_recommended AS "recommended",
            s.id AS "speciesId", s.hill_formula AS "hillFormula", sp.id AS "speciesPhaseId", sp.phase, sp.polymorph,
            f.form, f.t_min_k AS "tMinK", f.t_max_k AS "tMaxK", f.ranges, f.pressure_pa AS "pressurePa", f.method,
            src.id AS "sourceId", src.short_key AS "sourceKey"
       FROM release_members m
       JOIN heat_capacity_fits f ON f.id = m.fit_id
       JOIN species_phases sp ON sp.id = m.species_phase_id
       JOIN species s ON s.id = sp.species_id
       JOIN sources src ON src.id = f.source_id
      WHERE ${fitWhere.sql}
      ORDER BY s.hill_formula, s.name, sp.phase, sp.polymorph NULLS FIRST, m.is_recommended DESC, src.short_key, f.lineage_id`,
    fitWhere.params,
  );
  return {
    release: { id: release.id, label: release.label, status: release.status, publishedAt: release.publishedAt },
    values,
    fits,
  };
}

function memberConditions(releaseId: string, filter: SnapshotFilter, withQuantity: boolean): { sql: string; params: unknown[] } {
  const params: unknown[] = [releaseId];
  const conditions = ['m.release_id = $1'];
  const add = (sql: string, value: unknown) => {
    params.push(value);
    conditions.push(sql.replace('?', `$${params.length}`));
  };
  if (filter.speciesId) add('sp.species_id = ?', filter.speciesId);
  if (filter.speciesPhaseId) add('m.species_phase_id = ?', filter.speciesPhaseId);
  if (withQuantity && filter.quantity) add('m.quantity = ?', filter.quantity);
  if (filter.recommendedOnly) conditions.push('m.is_recommended');
  return { sql: conditions.join(' AND '), params };
}
