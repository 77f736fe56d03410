import type { DataSource } from 'typeorm';
import { withScratchDatabase } from './test-database';

/** Tables the migrations create (pg-boss keeps its own schema and is not listed). */
const TABLES = [
  'api_keys', 'audit_entries', 'evidence_files', 'heat_capacity_fits', 'import_jobs', 'one_time_tokens', 'proposal_comments',
  'proposal_items', 'proposal_reviews', 'proposals', 'rate_limit_counters', 'refresh_tokens', 'release_members', 'releases',
  'saved_reaction_terms', 'saved_reactions', 'sources', 'species', 'species_phases', 'thermo_values', 'users', 'watches',
];

async function schemaObjects(ds: DataSource) {
  const tables: { name: string }[] = await ds.query(
    `SELECT table_name AS name FROM information_schema.tables WHERE table_schema = 'public' AND table_name <> 'schema_migrations' ORDER BY 1`,
  );
  const functions: { name: string }[] = await ds.query(
    `SELECT p.proname AS name FROM pg_proc p JOIN pg_namespace n ON n.oid = p.pronamespace WHERE n.nspname = 'public' ORDER BY 1`,
  );
  const extensions: { name: string }[] = await ds.query(`SELECT extname AS name FROM pg_extension WHERE extname <> 'plpgsql' ORDER BY 1`);
  const triggers: { name: string }[] = await ds.query(`SELECT tgname AS name FROM pg_trigger WHERE NOT tgisinternal ORDER BY 1`);
  const types: { name: string }[] = await ds.query(
    `SELECT t.typname AS name FROM pg_type t JOIN pg_namespace n ON n.oid = t.typnamespace
      WHERE n.nspname = 'public' AND t.typtype IN ('e', 'd', 'c') AND NOT EXISTS (SELECT 1 FROM pg_class c WHERE c.reltype = t.oid)`,
  );
  return {
    tables: tables.map((t) => t.name),
    functions: functions.map((f) => f.name),
    extensions: extensions.map((e) => e.name),
    triggers: triggers.map((t) => t.name),
    types: types.map((t) => t.name),
  };
}

async function revertAll(ds: DataSource): Promise<number> {
  let reverted = 0;
  while ((await ds.query(`SELECT count(*)::int AS n FROM schema_migrations`))[0].n > 0) {
    await ds.undoLastMigration({ transaction: 'each' });
    reverted++;
  }
  return reverted;
}

describe('schema migrations', () => {
  it('run forward from an empty database, back down to nothing, and forward again', async () => {
    await withScratchDatabase(async (ds) => {
      const empty = await schemaObjects(ds);
      expect(empty.tables).toEqual([]);

      const applied = await ds.runMigrations({ transaction: 'each' });
      expect(applied.length).toBe(ds.migrations.length);
      expect(applied.length).toBeGreaterThanOrEqual(5);
      const up = await schemaObjects(ds);
      expect(up.tables).toEqual(jasmine.arrayContaining(TABLES));
      expect(up.extensions).toContain('pg_trgm');
      expect(up.functions).toEqual(jasmine.arrayContaining(['kx_cas_rn_is_valid', 'kx_refuse_change', 'kx_releases_guard', 'kx_release_members_guard']));
      expect(up.triggers).toEqual(jasmine.arrayContaining(['audit_entries_append_only', 'release_members_guard', 'releases_guard', 'thermo_values_append_only']));

      // Down: every migration reverts, and nothing is left behind that was not there before.
      expect(await revertAll(ds)).toBe(applied.length);
      expect(await schemaObjects(ds)).toEqual(empty);

      // And forward again: the down migrations left nothing that blocks a fresh run.
      const again = await ds.runMigrations({ transaction: 'each' });
      expect(again.length).toBe(applied.length);
      expect(await schemaObjects(ds)).toEqual(up);
      expect(await ds.showMigrations()).toBeFalse();
    });
  });

  it('names each migration class with the timestamp of its file, in order', async () => {
    await withScratchDatabase(async (ds) => {
      const names = ds.migrations.map((m) => m.name ?? m.constructor.name);
      const stamps = names.map((n) => Number(/(\d{13})$/.exec(n!)?.[1]));
      expect(stamps.every((s) => Number.isFinite(s))).toBeTrue();
      expect([...stamps].sort((a, b) => a - b)).toEqual(stamps);
    });
  });
});
