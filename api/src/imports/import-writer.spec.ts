import { randomUUID } from 'node:crypto';
import type { Principal } from '../auth/principal';
import type { ItemInput } from '../proposals/proposal-subjects';
import { testApp, type TestApp } from '../testing/test-app';
import type { PreparedImport } from './import-rows';
import { ImportWriter } from './import-writer';

/** The import's writer thread against the test database; the proposals it makes are removed again (the audit trail keeps its lines). */
describe('bulk import writer (a thread of its own, one transaction)', () => {
  let t: TestApp;
  let author: Principal;
  let phase: { id: string; speciesId: string };
  let sourceId: string;

  beforeAll(async () => {
    t = await testApp();
    const [steward] = await t.dataSource.query(`SELECT id, email, display_name AS name FROM users WHERE email = 'steward@kelvindex.test'`);
    author = { kind: 'user', userId: steward.id, email: steward.email, name: steward.name, roles: ['reader', 'steward'], scope: 'write' };
    [phase] = await t.dataSource.query(`SELECT id, species_id AS "speciesId" FROM species_phases ORDER BY id LIMIT 1`);
    [{ id: sourceId }] = await t.dataSource.query(`SELECT id FROM sources ORDER BY id LIMIT 1`);
  });

  /** Cp° items at the given positions (invented test values), all of the same phase unless told. */
  function part(positions: number[], speciesPhaseId = phase.id): PreparedImport {
    const items: ItemInput[] = positions.map((position) => ({
      id: randomUUID(), position, kind: 'add_value', sourceId,
      payload: { speciesPhaseId, quantity: 'Cp', value: String(30 + position), unit: 'J/(mol·K)', temperatureK: 300 + position, pressurePa: 100000, method: 'measured', notes: 'a "quoted" back\\slash,\ttab and\nnew line' },
    }));
    return { items, columns: items.map(() => ({ speciesId: phase.speciesId, speciesPhaseId, targetValueId: null, targetFitId: null })), problems: [], counts: { species: 0, phases: 0, values: items.length } };
  }

  const proposalRows = async (proposalId: string) => (await t.dataSource.query(`SELECT count(*)::int AS n FROM proposals WHERE id = $1`, [proposalId]))[0].n;

  it('writes the parts in one transaction, with the audit entry, and reports progress', async () => {
    const writer = new ImportWriter(t.config.databaseUrl);
    const proposalId = writer.begin(author, 'writer spec: two parts', 'made by a spec');
    const progress: number[] = [];
    writer.reportTo((n) => progress.push(n));
    const first = part([1, 2, 3]);
    writer.write(first);
    writer.write(part([4, 5]));
    // Nothing is visible outside the writer's transaction before it commits.
    expect(await proposalRows(proposalId)).toBe(0);
    try {
      expect(await writer.finish(author, 'writer spec: two parts, five values', { spec: true })).toBe(5);
      const items = await t.dataSource.query(`SELECT position, payload, species_id AS "speciesId" FROM proposal_items WHERE proposal_id = $1 ORDER BY position`, [proposalId]);
      expect(items.map((i: { position: number }) => i.position)).toEqual([1, 2, 3, 4, 5]);
      // The payload comes back as given, non-ASCII and escapes included.
      expect(items[0].payload).toEqual(first.items[0].payload);
      expect(items[0].speciesId).toBe(phase.speciesId);
      const [proposal] = await t.dataSource.query(`SELECT title FROM proposals WHERE id = $1`, [proposalId]);
      expect(proposal.title).toBe('writer spec: two parts, five values');
      const [audit] = await t.dataSource.query(`SELECT details FROM audit_entries WHERE action = 'proposal.create' AND entity_id = $1`, [proposalId]);
      expect(audit.details).toEqual({ spec: true, items: 5 });
      expect(progress.at(-1)).toBe(5);
    } finally {
      await t.dataSource.query(`DELETE FROM proposals WHERE id = $1`, [proposalId]);
    }
  });

  it('rolls everything back when a part refers to a species phase that does not exist', async () => {
    const writer = new ImportWriter(t.config.databaseUrl);
    const proposalId = writer.begin(author, 'writer spec: a missing reference', 'made by a spec');
    writer.write(part([1, 2]));
    writer.write(part([3], randomUUID()));
    await expectAsync(writer.finish(author, 'never kept', {})).toBeRejectedWithError(/proposal_items_species_phase_id_fkey/);
    expect(await proposalRows(proposalId)).toBe(0);
  });

  it('rolls back on abort, and refuses a part that repeats a position', async () => {
    const aborted = new ImportWriter(t.config.databaseUrl);
    const abortedId = aborted.begin(author, 'writer spec: aborted', 'made by a spec');
    aborted.write(part([1, 2]));
    await aborted.abort();
    expect(await proposalRows(abortedId)).toBe(0);

    const repeating = new ImportWriter(t.config.databaseUrl);
    const repeatingId = repeating.begin(author, 'writer spec: a position twice', 'made by a spec');
    repeating.write(part([1, 2]));
    repeating.write(part([2, 3]));
    await expectAsync(repeating.finish(author, 'never kept', {})).toBeRejectedWithError(/proposal_items_position_unique/);
    expect(await proposalRows(repeatingId)).toBe(0);
  });

  it('keeps two imports at once apart: one rolls back while the other commits', async () => {
    const kept = new ImportWriter(t.config.databaseUrl);
    const dropped = new ImportWriter(t.config.databaseUrl);
    const keptId = kept.begin(author, 'writer spec: kept', 'made by a spec');
    const droppedId = dropped.begin(author, 'writer spec: dropped', 'made by a spec');
    kept.write(part([1, 2]));
    dropped.write(part([1, 2]));
    dropped.write(part([3], randomUUID()));
    kept.write(part([3]));
    try {
      const [keptItems] = await Promise.all([
        kept.finish(author, 'writer spec: kept, three values', {}),
        expectAsync(dropped.finish(author, 'never kept', {})).toBeRejectedWithError(/proposal_items_species_phase_id_fkey/),
      ]);
      expect(keptItems).toBe(3);
      expect(await proposalRows(keptId)).toBe(1);
      expect(await proposalRows(droppedId)).toBe(0);
      // The writer thread outlives a failed import: the next one is written as before.
      const next = new ImportWriter(t.config.databaseUrl);
      const nextId = next.begin(author, 'writer spec: after a failure', 'made by a spec');
      next.write(part([1]));
      try {
        expect(await next.finish(author, 'writer spec: after a failure, one value', {})).toBe(1);
      } finally {
        await t.dataSource.query(`DELETE FROM proposals WHERE id = $1`, [nextId]);
      }
    } finally {
      await t.dataSource.query(`DELETE FROM proposals WHERE id = $1`, [keptId]);
    }
  });

  it('fails with the connection error code when the database cannot be reached', async () => {
    const unreachable = new URL(t.config.databaseUrl);
    unreachable.port = '9';
    const writer = new ImportWriter(unreachable.toString());
    writer.begin(author, 'never made', 'never made');
    writer.write(part([1]));
    await expectAsync(writer.finish(author, 'never made', {})).toBeRejectedWith(jasmine.objectContaining({ code: 'ECONNREFUSED' }));
  });
});
