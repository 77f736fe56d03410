import { parentPort } from 'node:worker_threads';
import { stringify, type Options as StringifyOptions } from 'csv-stringify/sync';
import { isSessionThread } from '../shared/session-thread';
import { EXPORT_COLUMNS } from './export-columns';

/**
 * CSV exports encoded on a thread of their own (a SessionThread shared by the exports): the
 * request's thread reads the rows from PostgreSQL and sends them here in runs, and csv-stringify
 * writes them out here, so a large export no longer takes the request thread's whole time (a
 * million rows cost it about 6 s of csv-stringify) and reading and encoding run side by side.
 *
 * A run crosses as one string: every field of every row, joined by NUL, the one character
 * PostgreSQL's text (and jsonb) can never hold. Null and empty text both cross as empty, which
 * csv-stringify writes alike (nothing between the commas).
 */

export const CSV_ENCODER_ROLE = 'csv-encoder';

/** csv-stringify's options for the export's rows, here and for the header line on the request thread. */
export const CSV_OPTIONS: StringifyOptions = { columns: EXPORT_COLUMNS as string[] };

/** fit_ranges arrives as PostgreSQL's jsonb text and is written as JSON.stringify writes it (no spaces). */
const JSON_COLUMN = EXPORT_COLUMNS.indexOf('fit_ranges');

export interface CsvRun {
  /** the rows' fields in EXPORT_COLUMNS order, joined by NUL */
  fields: string;
  rows: number;
}

export type ToEncoder = { session: string } & CsvRun;
/** the run as UTF-8 CSV lines, or why it could not be encoded */
export type FromEncoder = { session: string } & ({ bytes: Uint8Array } | { error: string });

/** The CSV lines of a run (no header line). */
export function encodeRun(run: CsvRun): string {
  const width = EXPORT_COLUMNS.length;
  const fields = run.fields.split('\u0000');
  if (fields.length !== run.rows * width) throw new Error(`a run of ${run.rows} rows holds ${fields.length} fields, not ${run.rows * width}`);
  const rows: string[][] = new Array(run.rows);
  for (let r = 0; r < run.rows; r++) {
    const row = fields.slice(r * width, (r + 1) * width);
    if (row[JSON_COLUMN] !== '') row[JSON_COLUMN] = JSON.stringify(JSON.parse(row[JSON_COLUMN]));
    rows[r] = row;
  }
  return stringify(rows, { ...CSV_OPTIONS, header: false });
}

if (isSessionThread(CSV_ENCODER_ROLE)) {
  const port = parentPort!;
  const utf8 = new TextEncoder();
  port.on('message', (message: ToEncoder) => {
    try {
      // Its own ArrayBuffer, handed over to the request's thread without a copy.
      const bytes = utf8.encode(encodeRun(message));
      port.postMessage({ session: message.session, bytes } satisfies FromEncoder, [bytes.buffer]);
    } catch (error) {
      port.postMessage({ session: message.session, error: (error as Error).message } satisfies FromEncoder);
    }
  });
}
