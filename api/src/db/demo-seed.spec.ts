import bcrypt from 'bcryptjs';
import { createHash } from 'node:crypto';
import type { DataSource } from 'typeorm';
import { DEMO_ACCOUNTS, DEMO_PASSWORD } from '../../../seeds-demo/demo-accounts';
import { loadDemoData, type DemoLoadSummary, type EvidenceStore } from '../../../seeds-demo/load-demo';
import { PROPOSAL_STATES } from '../proposals/proposal-vocabulary';
import { releaseSnapshot } from '../releases/release-snapshot';
import { createScratchDatabase, type ScratchDatabase } from './test-database';

const TABLES = [
  'users', 'sources', 'species', 'species_phases', 'thermo_values', 'heat_capacity_fits', 'releases', 'release_members',
  'proposals', 'proposal_items', 'proposal_reviews', 'proposal_comments', 'evidence_files', 'watches', 'saved_reactions',
  'saved_reaction_terms', 'import_jobs', 'audit_entries',
];

/** A fingerprint of every row of every table: equal fingerprints = nothing changed. */
async function fingerprint(ds: DataSource): Promise<Record<string, string>> {
  const result: Record<string, string> = {};
  for (const table of TABLES) {
    const [row] = await ds.query(`SELECT md5(coalesce(string_agg(t::text, '|' ORDER BY t::text), '')) AS h FROM ${table} t`);
    result[table] = row.h;
  }
  return result;
}

class MemoryStore implements EvidenceStore {
  readonly objects = new Map<string, { body: Buffer; mediaType: string }>();
  async put(key: string, body: Buffer, mediaType: string): Promise<void> {
    this.objects.set(key, { body, mediaType });
  }
}

describe('demo data loader', () => {
  // One empty, migrated database for this suite, dropped at the end.
  // It is loaded twice up front, so that the specs do not depend on their order.
  let scratch: ScratchDatabase;
  const store = new MemoryStore();
  let first: DemoLoadSummary;
  let second: DemoLoadSummary;
  let before: Record<string, string>;
  let after: Record<string, string>;
  beforeAll(async () => {
    scratch = await createScratchDatabase();
    await scratch.dataSource.runMigrations({ transaction: 'each' });
    first = await loadDemoData(scratch.dataSource, store);
    before = await fingerprint(scratch.dataSource);
    second = await loadDemoData(scratch.dataSource, store);
    after = await fingerprint(scratch.dataSource);
  });
  afterAll(async () => {
    await scratch?.drop();
  });

  it('loads into an empty database within 10 s, and a second run changes nothing', async () => {
    const ds = scratch.dataSource;
    expect(first.durationMs).toBeLessThan(10_000);
    expect(first.inserted.thermo_values).toBeGreaterThan(50);
    expect(first.counts).toEqual(first.inserted);
    expect(first.uploaded).toBe(store.objects.size);

    expect(second.durationMs).toBeLessThan(10_000);
    expect(Object.values(second.inserted).every((n) => n === 0)).toBeTrue();
    expect(second.counts).toEqual(first.counts);
    expect(after).toEqual(before);

    // The scenario: users with the one demo password, releases, proposals in every state.
    const users: { email: string; password_hash: string; roles: string[] }[] = await ds.query(`SELECT email, password_hash, roles FROM users ORDER BY email`);
    expect(users.map((u) => u.email).sort()).toEqual(DEMO_ACCOUNTS.map((a) => a.email).sort());
    for (const user of users) {
      expect(user.password_hash).toMatch(/^\$2[aby]\$10\$/);
      expect(user.roles).toEqual(DEMO_ACCOUNTS.find((a) => a.email === user.email)!.roles);
    }
    expect(await bcrypt.compare(DEMO_PASSWORD, users[0].password_hash)).toBeTrue();

    const releases: { label: string; status: string }[] = await ds.query(`SELECT label, status FROM releases ORDER BY label`);
    expect(releases).toEqual([
      { label: '2026.1', status: 'published' },
      { label: '2026.2', status: 'published' },
      { label: '2027.1', status: 'preparing' },
    ]);
    const states: { state: string }[] = await ds.query(`SELECT DISTINCT state FROM proposals`);
    expect(states.map((s) => s.state).sort()).toEqual([...PROPOSAL_STATES].sort());

    // Evidence files: the rows describe exactly the bytes put in the store.
    const files: { object_key: string; sha256: string; size_bytes: string; media_type: string }[] = await ds.query(`SELECT object_key, sha256, size_bytes, media_type FROM evidence_files`);
    expect(files.length).toBeGreaterThan(0);
    for (const file of files) {
      const stored = store.objects.get(file.object_key);
      expect(stored).withContext(file.object_key).toBeDefined();
      expect(createHash('sha256').update(stored!.body).digest('hex')).toBe(file.sha256);
      expect(stored!.body.length).toBe(Number(file.size_bytes));
      expect(stored!.mediaType).toBe(file.media_type);
    }
  });

  it('builds two published releases that differ as the change log says, and they are frozen', async () => {
    const ds = scratch.dataSource;
    const manager = ds.manager;
    const [carbon] = await ds.query(`SELECT id FROM species WHERE name = 'carbon'`);
    const first = (await releaseSnapshot(manager, '2026.1', { speciesId: carbon.id, quantity: 'dfH' }))!;
    const second = (await releaseSnapshot(manager, '2026.2', { speciesId: carbon.id, quantity: 'dfH' }))!;
    const gasIn = (s: typeof first) => s.values.filter((v) => v.phase === 'g');
    // ΔfH°(C, g) (CODATA 1989): version 1 without its uncertainty in 2026.1, version 2 with it in 2026.2.
    expect(gasIn(first).map((v) => [v.versionNo, v.valueSi, v.uncertaintySi])).toEqual([[1, 716680, null]]);
    expect(gasIn(second).map((v) => [v.versionNo, v.valueSi, v.uncertaintySi])).toEqual([[2, 716680, 450]]);
    expect(gasIn(first)[0].lineageId).toBe(gasIn(second)[0].lineageId);

    const [log] = await ds.query(`SELECT change_log -> 'summary' AS summary FROM releases WHERE label = '2026.2'`);
    expect(log.summary.revised).toBe(1);
    expect(log.summary.retired).toBe(1);
    expect(log.summary.added).toBeGreaterThan(0);

    // Every group of alternatives in a published release has exactly one recommended member.
    const groups: { n: number }[] = await ds.query(
      `SELECT count(*) FILTER (WHERE m.is_recommended)::int AS n FROM release_members m JOIN releases r ON r.id = m.release_id
        WHERE r.status = 'published' GROUP BY m.release_id, m.species_phase_id, m.member_kind, m.quantity, m.transition_kind`,
    );
    expect(groups.length).toBeGreaterThan(0);
    expect(groups.every((g) => g.n === 1)).toBeTrue();

    await expectAsync(ds.query(`DELETE FROM release_members m USING releases r WHERE r.id = m.release_id AND r.label = '2026.1'`))
      .toBeRejectedWithError(/2026\.1 is published/);
    await expectAsync(ds.query(`UPDATE releases SET notes = '' WHERE label = '2026.2'`)).toBeRejectedWithError(/2026\.2 is published/);
  });
});
