import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * What the editorial workflow adds to the schema:
 * - `users.preferences`: a user's display settings (e.g. the energy unit), a JSON object;
 * - `sources.merged_into_id`: a duplicate source merged by an editor points at the one kept.
 *   Values and fits keep citing the duplicate's row (they are never changed in place), and
 *   readers follow the pointer.
 */
export class WorkflowAdditions1764800600000 implements MigrationInterface {
  name = 'WorkflowAdditions1764800600000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`ALTER TABLE users ADD COLUMN preferences jsonb NOT NULL DEFAULT '{}'`);
    await q.query(`ALTER TABLE users ADD CONSTRAINT users_preferences_object CHECK (jsonb_typeof(preferences) = 'object')`);
    await q.query(`ALTER TABLE sources ADD COLUMN merged_into_id uuid REFERENCES sources (id)`);
    await q.query(`ALTER TABLE sources ADD CONSTRAINT sources_merged_into_other CHECK (merged_into_id <> id)`);
    await q.query(`CREATE INDEX sources_merged_into ON sources (merged_into_id) WHERE merged_into_id IS NOT NULL`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP INDEX sources_merged_into`);
    await q.query(`ALTER TABLE sources DROP CONSTRAINT sources_merged_into_other`);
    await q.query(`ALTER TABLE sources DROP COLUMN merged_into_id`);
    await q.query(`ALTER TABLE users DROP CONSTRAINT users_preferences_object`);
    await q.query(`ALTER TABLE users DROP COLUMN preferences`);
  }
}
