import { Readable, Writable } from 'node:stream';
import { pipeline } from 'node:stream/promises';
import { stringify } from 'csv-stringify/sync';
import { EXPORT_COLUMNS } from './export-columns';
import { csvStages, type ExportHeader } from './export-formats';

/**
 * The CSV stages (rows encoded by csv-stringify on the encoder thread, in runs) against
 * csv-stringify itself writing the same rows in one call on this thread: the bytes must agree.
 */
describe('CSV export stages', () => {
  const header: ExportHeader = { release: { label: 'spec.1', status: 'published', publishedAt: new Date('2026-01-02T03:04:05Z') }, query: 'formula=X', sources: [] };
  const width = EXPORT_COLUMNS.length;
  const rangesColumn = EXPORT_COLUMNS.indexOf('fit_ranges');
  /** Invented rows: text that needs quoting, non-ASCII, empty and null fields, JSON as PostgreSQL prints jsonb. */
  function row(i: number): (string | null)[] {
    const fields: (string | null)[] = Array.from({ length: width }, (_, c) => `r${i}c${c}`);
    fields[1] = `comma, "quote" and\nnew line ${i}`;
    fields[2] = `α-β ${i} 🧪`;
    fields[3] = '';
    fields[4] = null;
    fields[rangesColumn] = i % 2 === 0 ? `[{"tMax": 1000, "tMin": 200, "coefficients": [1.5, -2e-05]}]` : null;
    return fields;
  }
  /** csv-stringify's own output for the rows, JSON parsed as pg would and cast as the export used to. */
  const reference = (rows: (string | null)[][]) => stringify(
    rows.map((r) => r.map((f, c) => (c === rangesColumn && f ? JSON.parse(f) : f))),
    { columns: EXPORT_COLUMNS as string[], header: true, cast: { object: (o) => JSON.stringify(o) } },
  );

  async function encoded(rows: (string | null)[][]): Promise<string> {
    const chunks: Buffer[] = [];
    const sink = new Writable({ write(chunk: Buffer, _e, callback) { chunks.push(Buffer.from(chunk)); callback(); } });
    await pipeline([Readable.from(rows), ...csvStages(header), sink]);
    return Buffer.concat(chunks).toString('utf8');
  }

  const withoutComments = (text: string) => text.split('\n').filter((line, i, lines) => !(line.startsWith('# ') && lines.slice(0, i).every((l) => l.startsWith('# ')))).join('\n');

  it('writes the same bytes as csv-stringify in one call, across many runs in order', async () => {
    const rows = Array.from({ length: 2345 }, (_, i) => row(i));
    const text = await encoded(rows);
    expect(text.startsWith('# Kelvindex export (CSV).')).toBeTrue();
    expect(withoutComments(text)).toBe(reference(rows));
    expect(text).toContain('"[{""tMax"":1000,""tMin"":200,""coefficients"":[1.5,-0.00002]}]"');
  });

  it('writes the header line alone when there are no rows', async () => {
    expect(withoutComments(await encoded([]))).toBe(`${EXPORT_COLUMNS.join(',')}\n`);
  });

  it('fails the export when a run cannot be encoded', async () => {
    const broken = row(0);
    broken[rangesColumn] = '[not json';
    await expectAsync(encoded([broken])).toBeRejectedWithError(/the CSV could not be written/);
  });
});
