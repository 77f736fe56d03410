import type { EntityManager } from 'typeorm';
import { queryRows } from '../db/returned-rows';
import { Release } from './release.entity';

/**
 * Building a release in preparation: start from a copy of an earlier release's membership, put
 * new versions in (a new version of a lineage replaces the old one), take retired lineages out,
 * choose the recommended member of each group, publish. The database guards every step: nothing
 * here can touch a published release.
 */

/** Creates a release in preparation, holding a copy of `carryOverFrom`'s members when given. */
export async function prepareRelease(
  manager: EntityManager,
  options: { label: string; notes?: string; createdBy?: string | null; carryOverFrom?: string; id?: string },
): Promise<Release> {
  const release = await manager.save(Release, manager.create(Release, {
    ...(options.id ? { id: options.id } : {}),
    label: options.label,
    notes: options.notes ?? '',
    status: 'preparing',
    createdBy: options.createdBy ?? null,
  }));
  if (options.carryOverFrom) {
    // The subject columns (kind, lineage, species phase, quantity) are copied from the value or fit
    // by the release_members_guard trigger; NOT NULL is checked after it.
    const copied = await queryRows(
      manager,
      `INSERT INTO release_members (release_id, value_id, fit_id, is_recommended)
       SELECT $1, m.value_id, m.fit_id, m.is_recommended
         FROM release_members m JOIN releases r ON r.id = m.release_id
        WHERE r.label = $2
       RETURNING id`,
      [release.id, options.carryOverFrom],
    );
    if (copied.length === 0) {
      const base = await manager.countBy(Release, { label: options.carryOverFrom });
      if (base === 0) throw new Error(`Release ${options.carryOverFrom} does not exist`);
    }
  }
  return release;
}

/**
 * Puts a value or fit version into a release in preparation. If the release holds another version
 * of the same lineage, this one replaces it and inherits its recommended flag unless `recommended`
 * says otherwise.
 * @returns the member id
 */
export async function putInRelease(
  manager: EntityManager,
  releaseId: string,
  member: { valueId?: string; fitId?: string; recommended?: boolean; proposalId?: string | null },
): Promise<string> {
  if ((member.valueId === undefined) === (member.fitId === undefined)) throw new Error('Give exactly one of valueId and fitId');
  const table = member.valueId ? 'thermo_values' : 'heat_capacity_fits';
  const targetId = member.valueId ?? member.fitId;
  const replaced = await queryRows<{ is_recommended: boolean }>(
    manager,
    `DELETE FROM release_members m USING ${table} t
      WHERE t.id = $2 AND m.release_id = $1 AND m.lineage_id = t.lineage_id
      RETURNING m.is_recommended`,
    [releaseId, targetId],
  );
  const recommended = member.recommended ?? replaced[0]?.is_recommended ?? false;
  if (recommended) await clearRecommendation(manager, releaseId, table, targetId!);
  // member_kind, lineage_id, species_phase_id, quantity and transition_kind are copied from the
  // value or fit by the release_members_guard trigger.
  const [row] = await queryRows<{ id: string }>(
    manager,
    `INSERT INTO release_members (release_id, value_id, fit_id, is_recommended, proposal_id)
     VALUES ($1, $2, $3, $4, $5)
     RETURNING id`,
    [releaseId, member.valueId ?? null, member.fitId ?? null, recommended, member.proposalId ?? null],
  );
  return row.id;
}

/** Takes a lineage out of a release in preparation (e.g. after it was retired). */
export async function removeLineageFromRelease(manager: EntityManager, releaseId: string, lineageId: string): Promise<boolean> {
  const removed = await queryRows(manager, `DELETE FROM release_members WHERE release_id = $1 AND lineage_id = $2 RETURNING id`, [releaseId, lineageId]);
  return removed.length > 0;
}

/** Makes this member the recommended one of its group (species phase, kind, quantity, transition). */
export async function recommendMember(manager: EntityManager, memberId: string): Promise<void> {
  const [member]: { release_id: string; value_id: string | null; fit_id: string | null }[] = await manager.query(
    `SELECT release_id, value_id, fit_id FROM release_members WHERE id = $1`,
    [memberId],
  );
  if (!member) throw new Error(`Release member ${memberId} does not exist`);
  await clearRecommendation(manager, member.release_id, member.value_id ? 'thermo_values' : 'heat_capacity_fits', (member.value_id ?? member.fit_id)!);
  await manager.query(`UPDATE release_members SET is_recommended = true WHERE id = $1`, [memberId]);
}

async function clearRecommendation(manager: EntityManager, releaseId: string, table: string, targetId: string): Promise<void> {
  const subject = table === 'thermo_values'
    ? `SELECT species_phase_id, 'value' AS kind, quantity, transition_kind FROM thermo_values WHERE id = $2`
    : `SELECT species_phase_id, 'fit' AS kind, 'Cp' AS quantity, NULL::text AS transition_kind FROM heat_capacity_fits WHERE id = $2`;
  await manager.query(
    `UPDATE release_members m SET is_recommended = false
       FROM (${subject}) t
      WHERE m.release_id = $1 AND m.is_recommended AND m.species_phase_id = t.species_phase_id
        AND m.member_kind = t.kind AND m.quantity = t.quantity AND m.transition_kind IS NOT DISTINCT FROM t.transition_kind`,
    [releaseId, targetId],
  );
}

/**
 * Publishes a release in preparation; from then on the database refuses any change to it. The
 * database also refuses it while a species phase and quantity has no recommended member.
 */
export async function publishRelease(
  manager: EntityManager,
  releaseId: string,
  options: { publishedBy?: string | null; publishedAt?: Date; changeLog?: Record<string, unknown> | null } = {},
): Promise<void> {
  const updated = await queryRows(
    manager,
    `UPDATE releases SET status = 'published', published_by = $2, published_at = $3, updated_at = $3, change_log = coalesce($4::jsonb, change_log)
      WHERE id = $1 AND status = 'preparing' RETURNING id`,
    [releaseId, options.publishedBy ?? null, options.publishedAt ?? new Date(), options.changeLog ? JSON.stringify(options.changeLog) : null],
  );
  if (updated.length === 0) throw new Error(`Release ${releaseId} is not in preparation`);
}
