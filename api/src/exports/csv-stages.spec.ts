import { Readable, Writable } from 'node:stream';
import { pipeline } from 'node:stream/promises';
import { stringify } from 'csv-stringify/sync';
import { to as copyTo } from 'pg-copy-streams';
import { ownConnection } from '../testing/own-connection';
import { EXPORT_COLUMNS } from './export-columns';
import { csvStages, type ExportHeader } from './export-formats';

/**
 * The CSV stages (PostgreSQL's COPY text read back and written by csv-stringify on the encoder
 * thread) against csv-stringify writing the same rows as pg reads them (numbers, booleans and
 * JSON parsed, then cast as the export always has): the bytes must agree.
 */
describe('CSV export stages', () => {
  const db = ownConnection();
  const header: ExportHeader = { release: { label: 'spec.1', status: 'published', publishedAt: new Date('2026-01-02T03:04:05Z') }, query: 'formula=X', sources: [] };

  /** Columns of every type the export writes, with text that needs quoting or COPY escapes, nulls and empty text; invented values. */
  const kinds = [
    `'comma, "quote", tab' || chr(9) || 'and' || chr(10) || 'new line, back\\slash ' || g`,
    `CASE WHEN g % 3 = 0 THEN NULL WHEN g % 3 = 1 THEN '' ELSE 'α-β 🧪 ' || g END`,
    `(ARRAY[1e-5, 1e15, -0.0, 298.15, -74873.123, 1/3.0, 5e-324, 1.7976931348623157e308])[1 + g % 8]::float8 * (CASE WHEN g % 2 = 0 THEN 1 ELSE -1 END)`,
    `(g * 0.1)::float4`,
    `g % 2 = 0`,
    `(g - 500)::int4`,
    `g::int8 * 1000000000`,
    `(g / 7.0)::numeric(12, 4)`,
    `md5(g::text)::uuid`,
    `CASE WHEN g % 4 = 0 THEN NULL ELSE jsonb_build_array(jsonb_build_object('tMin', 200, 'tMax', 1000 + g, 'coefficients', jsonb_build_array(1.5, -2e-05, g))) END`,
    `chr(13) || 'carriage' || chr(92) || 'N'`,
  ];
  const columns = EXPORT_COLUMNS.map((name, i) => `${kinds[i % kinds.length]} AS c${i}`).join(', ');
  const query = (rows: number) => `SELECT ${columns} FROM generate_series(1, ${rows}) AS g ORDER BY g`;

  async function viaStages(rows: number): Promise<string> {
    const { fields } = await db.client.query(`${query(rows)} LIMIT 0`);
    const chunks: Buffer[] = [];
    const sink = new Writable({ write(chunk: Buffer, _e, callback) { chunks.push(Buffer.from(chunk)); callback(); } });
    await pipeline([db.client.query(copyTo(`COPY (${query(rows)}) TO STDOUT`)), ...csvStages(header, fields.map((f) => f.dataTypeID)), sink]);
    return Buffer.concat(chunks).toString('utf8');
  }

  async function reference(rows: number): Promise<string> {
    const { rows: parsed } = await db.client.query({ text: query(rows), rowMode: 'array' });
    return stringify(parsed, { columns: EXPORT_COLUMNS as string[], header: true, cast: { boolean: (b) => (b ? 'true' : 'false'), object: (o) => JSON.stringify(o) } });
  }

  const comments = (text: string) => text.match(/^(# .*\n)*/)![0];

  it('writes the same bytes as csv-stringify does for the rows as pg reads them, across many pieces in order', async () => {
    const text = await viaStages(3000);
    expect(comments(text)).toContain('# release spec.1 (published 2026-01-02T03:04:05.000Z)');
    expect(text.slice(comments(text).length)).toBe(await reference(3000));
    expect(text).toContain('"[{""tMax"":1002,""tMin"":200,""coefficients"":[1.5,-0.00002,2]}]"');
  });

  it('writes the header line alone when there are no rows', async () => {
    const text = await viaStages(0);
    expect(text.slice(comments(text).length)).toBe(`${EXPORT_COLUMNS.join(',')}\n`);
  });

  it('fails the export when a line has fewer fields than the export has columns', async () => {
    const types = EXPORT_COLUMNS.map(() => 25);
    const stages = csvStages(header, types);
    const sink = new Writable({ write(_chunk, _e, callback) { callback(); } });
    await expectAsync(pipeline([Readable.from([Buffer.from('only\ttwo\n')]), ...stages, sink])).toBeRejectedWithError(/the CSV could not be written: a row of 2 fields/);
  });

  it('refuses a column of a type it cannot write as pg would read it', async () => {
    const sink = new Writable({ write(_chunk, _e, callback) { callback(); } });
    await expectAsync(pipeline([Readable.from([Buffer.from('2026-01-01\n')]), ...csvStages(header, [1082]), sink])).toBeRejectedWithError(/type 1082 cannot be written as CSV/);
  });
});
