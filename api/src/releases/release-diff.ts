import type { EntityManager } from 'typeorm';
import type { PhaseCode } from '../species/phase-code';
import type { Quantity, TransitionKind } from '../values/value-vocabulary';

export type ReleaseChangeKind = 'added' | 'revised' | 'retired' | 'removed' | 'recommendation';

/** How one value or fit lineage differs between two releases. */
export interface ReleaseChange {
  change: ReleaseChangeKind;
  memberKind: 'value' | 'fit';
  lineageId: string;
  speciesId: string;
  speciesName: string;
  hillFormula: string;
  speciesPhaseId: string;
  phase: PhaseCode;
  polymorph: string | null;
  quantity: Quantity;
  transitionKind: TransitionKind | null;
  /** value or fit version in the older release (null when added) */
  fromId: string | null;
  /** value or fit version in the newer release (null when retired or removed) */
  toId: string | null;
  fromRecommended: boolean | null;
  toRecommended: boolean | null;
}

/**
 * Every lineage whose membership differs between releases `fromLabel` and `toLabel` (a null
 * `fromLabel` compares with nothing, so everything is `added`):
 * `added` (only in the newer), `retired` (left out after a retirement record), `removed` (left
 * out without one), `revised` (another version), `recommendation` (same version, recommended
 * flag changed). Ordered by Hill formula, species, phase and quantity, for a per-species change log.
 */
export async function releaseDiff(manager: EntityManager, fromLabel: string | null, toLabel: string): Promise<ReleaseChange[]> {
  return manager.query(
    `WITH a AS (SELECT m.* FROM release_members m JOIN releases r ON r.id = m.release_id WHERE r.label = $1::text),
          b AS (SELECT m.* FROM release_members m JOIN releases r ON r.id = m.release_id WHERE r.label = $2),
          d AS (
            SELECT coalesce(b.lineage_id, a.lineage_id) AS lineage_id,
                   coalesce(b.member_kind, a.member_kind) AS member_kind,
                   coalesce(b.species_phase_id, a.species_phase_id) AS species_phase_id,
                   coalesce(b.quantity, a.quantity) AS quantity,
                   coalesce(b.transition_kind, a.transition_kind) AS transition_kind,
                   coalesce(a.value_id, a.fit_id) AS from_id,
                   coalesce(b.value_id, b.fit_id) AS to_id,
                   a.is_recommended AS from_recommended,
                   b.is_recommended AS to_recommended
              FROM a FULL JOIN b ON a.lineage_id = b.lineage_id
             WHERE a.id IS NULL OR b.id IS NULL
                OR coalesce(a.value_id, a.fit_id) <> coalesce(b.value_id, b.fit_id)
                OR a.is_recommended <> b.is_recommended)
     SELECT CASE
              WHEN d.from_id IS NULL THEN 'added'
              WHEN d.to_id IS NULL THEN
                CASE WHEN EXISTS (SELECT 1 FROM thermo_values t WHERE t.lineage_id = d.lineage_id AND t.is_retired)
                       OR EXISTS (SELECT 1 FROM heat_capacity_fits f WHERE f.lineage_id = d.lineage_id AND f.is_retired)
                     THEN 'retired' ELSE 'removed' END
              WHEN d.from_id <> d.to_id THEN 'revised'
              ELSE 'recommendation'
            END AS change,
            d.member_kind AS "memberKind", d.lineage_id AS "lineageId",
            s.id AS "speciesId", s.name AS "speciesName", s.hill_formula AS "hillFormula",
            sp.id AS "speciesPhaseId", sp.phase, sp.polymorph,
            d.quantity, d.transition_kind AS "transitionKind",
            d.from_id AS "fromId", d.to_id AS "toId",
            d.from_recommended AS "fromRecommended", d.to_recommended AS "toRecommended"
       FROM d
       JOIN species_phases sp ON sp.id = d.species_phase_id
       JOIN species s ON s.id = sp.species_id
      ORDER BY s.hill_formula, s.name, sp.phase, sp.polymorph NULLS FIRST, d.member_kind DESC, d.quantity, d.lineage_id`,
    [fromLabel, toLabel],
  );
}

/** Counts of a diff by kind of change, for a release's change-log header. */
export function summarizeChanges(changes: ReleaseChange[]): Record<ReleaseChangeKind, number> {
  const summary: Record<ReleaseChangeKind, number> = { added: 0, revised: 0, retired: 0, removed: 0, recommendation: 0 };
  for (const c of changes) summary[c.change]++;
  return summary;
}
