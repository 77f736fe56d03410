import { copyLine, copyRows, CopyTextBuilder, copyPieces } from './copy-rows';
import { ownConnection } from '../testing/own-connection';

/** COPY text as PostgreSQL reads it back: written into a temporary table, always rolled back. */
describe('COPY text', () => {
  const db = ownConnection();
  const tricky = [
    { unit: 'J/(mol·K)', name: 'α-D-glucose', note: 'a "quoted" back\\slash,\ttab and\nnew line', emoji: 'flask 🧪', empty: '', n: 1.5e-7, flag: true, list: [1, null] },
    { unit: 'kJ/mol', nested: { deeper: ['\\N', '\\.', 'tab\there'] } },
  ];

  beforeEach(async () => {
    await db.client.query('BEGIN');
    await db.client.query(`CREATE TEMP TABLE kx_spec_copy (id uuid, position integer, kind text, payload jsonb, note text) ON COMMIT DROP`);
  });

  afterEach(async () => {
    await db.client.query('ROLLBACK');
  });

  it('builds bytes from words, nulls and JSON text (as UTF-8) that PostgreSQL reads back as the same values', async () => {
    const text = new CopyTextBuilder();
    const ids = ['4b0f6c1e-3f1a-4e7e-9d7a-2f1b3c4d5e6f', '0c8d1f2a-5b6c-4d7e-8f90-a1b2c3d4e5f6'];
    tricky.forEach((payload, i) => text.word(ids[i]).word(i + 1).word(i === 0 ? 'add_value' : null).jsonText(JSON.stringify(payload)).word(null).endRow());
    expect(text.rows).toBe(2);
    await copyPieces(db.client, 'kx_spec_copy', ['id', 'position', 'kind', 'payload', 'note'], text.finish());
    const { rows } = await db.client.query(`SELECT id, position, kind, payload, note FROM kx_spec_copy ORDER BY position`);
    expect(rows).toEqual([
      { id: ids[0], position: 1, kind: 'add_value', payload: tricky[0], note: null },
      { id: ids[1], position: 2, kind: null, payload: tricky[1], note: null },
    ]);
  });

  it('starts a new piece when one fills up; a row may run across two, as COPY allows', async () => {
    const text = new CopyTextBuilder();
    const long = 'x'.repeat(300_000);
    for (let i = 1; i <= 8; i++) text.word(i).jsonText(JSON.stringify({ long })).endRow();
    const pieces = text.finish();
    expect(pieces.length).toBeGreaterThan(1);
    expect(pieces.some((piece) => piece[piece.length - 1] !== 10)).toBeTrue();
    await copyPieces(db.client, 'kx_spec_copy', ['position', 'payload'], pieces);
    const { rows } = await db.client.query(`SELECT count(*)::int AS n, sum(length(payload->>'long'))::int AS chars FROM kx_spec_copy`);
    expect(rows[0]).toEqual({ n: 8, chars: 8 * 300_000 });
  });

  it('writes lines of any text with copyRows, statement by statement', async () => {
    const heard: number[] = [];
    const lines = tricky.map((payload, i) => copyLine([null, i + 1, 'kind', payload, tricky[0].note]));
    expect(await copyRows(db.client, 'kx_spec_copy', ['id', 'position', 'kind', 'payload', 'note'], lines, 1, (n) => { heard.push(n); })).toBe(2);
    expect(heard).toEqual([1, 2]);
    const { rows } = await db.client.query(`SELECT payload, note FROM kx_spec_copy ORDER BY position`);
    expect(rows).toEqual([{ payload: tricky[0], note: tricky[0].note }, { payload: tricky[1], note: tricky[0].note }]);
  });
});
