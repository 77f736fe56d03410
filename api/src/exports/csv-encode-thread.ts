import { parentPort } from 'node:worker_threads';
import { stringify, type Options as StringifyOptions } from 'csv-stringify/sync';
import { isSessionThread } from '../shared/session-thread';
import { csvFieldWriter } from './csv-field-types';
import { EXPORT_COLUMNS } from './export-columns';

/**
 * CSV exports encoded on threads of their own (SessionThreads shared by the exports). The
 * request's thread has PostgreSQL COPY the export's rows out as text (tab-separated fields, the
 * fastest way out of the database) and hands them out as they come, in pieces of whole lines, to
 * the encoder threads in turn; here each line is read back into its fields and csv-stringify
 * writes them out. The request's thread only passes text along and puts the pieces back in order,
 * so a large export neither holds other requests up nor waits for them.
 */

export const CSV_ENCODER_ROLE = 'csv-encoder';

/** csv-stringify's options for the export's rows, here and for the header line on the request thread. */
export const CSV_OPTIONS: StringifyOptions = { columns: EXPORT_COLUMNS as string[] };

export interface CopyLines {
  /** the piece's place in the export: pieces come back from several threads, and go out in this order */
  seq: number;
  /** whole lines of COPY's text format */
  text: string;
  /** the type oid of each column (how its text is written: csv-field-types.ts) */
  types: number[];
}

export type ToEncoder = { session: string } & CopyLines;
/** the lines as CSV, or why they could not be encoded */
export type FromEncoder = { session: string; seq: number } & ({ csv: string } | { error: string });

const COPY_ESCAPES: Readonly<Record<string, string>> = { b: '\b', f: '\f', n: '\n', r: '\r', t: '\t', v: '\v', '\\': '\\' };

/**
 * COPY's text format (PostgreSQL manual, COPY, "Text Format"): fields separated by tabs, \N for
 * null, and backslash escapes for backslash and the control characters (COPY TO writes no octal
 * or hex escapes).
 */
function unescapeCopy(text: string): string {
  return text.replace(/\\(.)/g, (_sequence, c: string) => COPY_ESCAPES[c] ?? c);
}

/** The CSV lines (no header line) of whole lines of COPY text whose columns have these types. */
export function encodeCopyLines(text: string, types: readonly number[]): string {
  const writers = types.map((oid) => {
    const writer = csvFieldWriter(oid);
    if (!writer) throw new Error(`a column of type ${oid} cannot be written as CSV`);
    return writer;
  });
  const lines = text.split('\n');
  // Whole lines: the text ends with a newline, so the last piece is empty.
  if (lines.pop() !== '') throw new Error('COPY text must come in whole lines');
  const rows: (string | null)[][] = new Array(lines.length);
  for (let r = 0; r < lines.length; r++) {
    const fields: (string | null)[] = lines[r].split('\t');
    if (fields.length !== writers.length) throw new Error(`a row of ${fields.length} fields where the export has ${writers.length} columns`);
    for (let i = 0; i < fields.length; i++) {
      const field = fields[i]!;
      fields[i] = field === '\\N' ? null : writers[i](field.includes('\\') ? unescapeCopy(field) : field);
    }
    rows[r] = fields;
  }
  return stringify(rows, { ...CSV_OPTIONS, header: false });
}

if (isSessionThread(CSV_ENCODER_ROLE)) {
  const port = parentPort!;
  port.on('message', ({ session, seq, text, types }: ToEncoder) => {
    try {
      port.postMessage({ session, seq, csv: encodeCopyLines(text, types) } satisfies FromEncoder);
    } catch (error) {
      port.postMessage({ session, seq, error: (error as Error).message } satisfies FromEncoder);
    }
  });
}
