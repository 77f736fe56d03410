import { randomUUID } from 'node:crypto';
import { Client } from 'pg';
import { copyLine, copyRows } from './copy-rows';
import { checkForeignKeys, checkWrittenRows, setBasedChecksPossible, SetBasedCheckError, withRowTriggersOff } from './set-based-checks';
import { testApp } from '../testing/test-app';

const COLUMNS = ['id', 'proposal_id', 'position', 'kind', 'payload', 'source_id', 'species_id', 'species_phase_id'] as const;

/** Proposal items written the way a bulk import writes them, against the demo catalogue, always rolled back. */
describe('set-based checks of a bulk write', () => {
  let client: Client;
  let other: Client;
  let phase: { id: string; speciesId: string };
  let sourceId: string;
  let authorId: string;

  beforeAll(async () => {
    await testApp();
    client = new Client({ connectionString: process.env.DATABASE_URL });
    other = new Client({ connectionString: process.env.DATABASE_URL });
    await Promise.all([client.connect(), other.connect()]);
    [phase] = (await client.query(`SELECT id, species_id AS "speciesId" FROM species_phases ORDER BY id LIMIT 1`)).rows;
    [{ id: sourceId }] = (await client.query(`SELECT id FROM sources ORDER BY id LIMIT 1`)).rows;
    [{ id: authorId }] = (await client.query(`SELECT id FROM users ORDER BY email LIMIT 1`)).rows;
  });

  afterAll(async () => {
    await Promise.all([client.end(), other.end()]);
  });

  afterEach(async () => {
    await client.query('ROLLBACK');
  });

  async function draftWith(rows: { position: number; speciesPhaseId: string }[]): Promise<string> {
    await client.query('BEGIN');
    const [{ id }] = (await client.query(`INSERT INTO proposals (title, author_id) VALUES ('set-based check spec', $1) RETURNING id`, [authorId])).rows;
    const lines = rows.map((r) => copyLine([randomUUID(), id, r.position, 'add_value', { quantity: 'Cp' }, sourceId, phase.speciesId, r.speciesPhaseId]));
    const checks = await setBasedChecksPossible(client, 'proposal_items');
    expect(checks).not.toBeNull();
    await withRowTriggersOff(client, () => copyRows(client, 'proposal_items', COLUMNS, lines, 2));
    return id;
  }

  it('finds every foreign key of the table and its deferrable unique constraint', async () => {
    const checks = (await setBasedChecksPossible(client, 'proposal_items'))!;
    expect(checks.foreignKeys.map((fk) => fk.column).sort()).toEqual([
      'proposal_id', 'result_fit_id', 'result_species_id', 'result_species_phase_id', 'result_value_id',
      'source_id', 'species_id', 'species_phase_id', 'target_fit_id', 'target_value_id',
    ]);
    expect(checks.foreignKeys.find((fk) => fk.column === 'species_phase_id')).toEqual(jasmine.objectContaining({ referencedTable: 'species_phases', referencedColumn: 'id' }));
    expect(checks.deferrableUniques).toEqual([{ name: 'proposal_items_position_unique', columns: ['proposal_id', 'position'] }]);
  });

  it('accepts rows whose references exist, and locks each referenced row as the row trigger would', async () => {
    const proposalId = await draftWith([{ position: 1, speciesPhaseId: phase.id }, { position: 2, speciesPhaseId: phase.id }]);
    const checks = (await setBasedChecksPossible(client, 'proposal_items'))!;
    await checkWrittenRows(client, checks, COLUMNS, { column: 'proposal_id', value: proposalId });
    // FOR KEY SHARE held until the transaction ends: another transaction cannot take the row for deletion.
    await expectAsync(other.query(`SELECT 1 FROM species_phases WHERE id = $1 FOR UPDATE NOWAIT`, [phase.id])).toBeRejectedWith(jasmine.objectContaining({ code: '55P03' }));
    await expectAsync(other.query(`SELECT 1 FROM species WHERE id = $1 FOR UPDATE NOWAIT`, [phase.speciesId])).toBeRejectedWith(jasmine.objectContaining({ code: '55P03' }));
    const { rows: [{ session_replication_role: role }] } = await client.query(`SHOW session_replication_role`);
    expect(role).toBe('origin');
  });

  it('checks a range of the written rows on its own and answers how many it checked', async () => {
    const missing = randomUUID();
    const proposalId = await draftWith([1, 2, 3].map((position) => ({ position, speciesPhaseId: phase.id })).concat([{ position: 4, speciesPhaseId: missing }]));
    const checks = (await setBasedChecksPossible(client, 'proposal_items'))!;
    const scope = (from: number, to: number) => ({ column: 'proposal_id', value: proposalId, range: { column: 'position', from, to } });
    expect(await checkForeignKeys(client, checks, COLUMNS, scope(1, 3))).toBe(3);
    await expectAsync(checkForeignKeys(client, checks, COLUMNS, scope(3, 4))).toBeRejectedWithError(SetBasedCheckError, new RegExp(missing));
  });

  it('refuses a row that refers to a species phase that does not exist, naming the constraint and the value', async () => {
    const missing = randomUUID();
    const proposalId = await draftWith([{ position: 1, speciesPhaseId: phase.id }, { position: 2, speciesPhaseId: missing }]);
    const checks = (await setBasedChecksPossible(client, 'proposal_items'))!;
    const refusal = await checkWrittenRows(client, checks, COLUMNS, { column: 'proposal_id', value: proposalId }).catch((error: unknown) => error);
    expect(refusal).toEqual(jasmine.any(SetBasedCheckError));
    expect((refusal as Error).message).toContain('proposal_items_species_phase_id_fkey');
    expect((refusal as Error).message).toContain(missing);
  });

  it('refuses two rows at one position (the unique constraint whose re-check trigger was off)', async () => {
    const proposalId = await draftWith([{ position: 1, speciesPhaseId: phase.id }, { position: 1, speciesPhaseId: phase.id }]);
    const checks = (await setBasedChecksPossible(client, 'proposal_items'))!;
    await expectAsync(checkWrittenRows(client, checks, COLUMNS, { column: 'proposal_id', value: proposalId }))
      .toBeRejectedWithError(SetBasedCheckError, /proposal_items_position_unique.*\(.*, 1\)/);
  });

  it('says no for a role that may not switch row triggers off, and for a table with an INSERT trigger of its own', async () => {
    await client.query('BEGIN');
    await client.query(`CREATE ROLE kx_spec_no_replication_role NOLOGIN`);
    await client.query(`SET LOCAL ROLE kx_spec_no_replication_role`);
    expect(await setBasedChecksPossible(client, 'proposal_items')).toBeNull();
    await client.query(`RESET ROLE`);

    await client.query(`CREATE TEMP TABLE kx_spec_with_trigger (id int) ON COMMIT DROP`);
    await client.query(`CREATE FUNCTION pg_temp.kx_spec_noop() RETURNS trigger LANGUAGE plpgsql AS $$ BEGIN RETURN NEW; END $$`);
    await client.query(`CREATE TRIGGER kx_spec_noop BEFORE INSERT ON kx_spec_with_trigger FOR EACH ROW EXECUTE FUNCTION pg_temp.kx_spec_noop()`);
    expect(await setBasedChecksPossible(client, 'kx_spec_with_trigger')).toBeNull();
    expect(await setBasedChecksPossible(client, 'proposal_items')).not.toBeNull();
  });
});
