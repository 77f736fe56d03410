import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Only revisions, retirements and recommendations have a target value, and the index on it is only
 * ever searched for one value: leaving out the rows without one (every value a bulk import adds)
 * spares an index entry per imported row.
 */
export class PartialItemTargetIndex1764801300000 implements MigrationInterface {
  name = 'PartialItemTargetIndex1764801300000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`DROP INDEX proposal_items_target_value`);
    await q.query(`CREATE INDEX proposal_items_target_value ON proposal_items (target_value_id) WHERE target_value_id IS NOT NULL`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP INDEX proposal_items_target_value`);
    await q.query(`CREATE INDEX proposal_items_target_value ON proposal_items (target_value_id)`);
  }
}
