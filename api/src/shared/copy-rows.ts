import { Readable } from 'node:stream';
import { finished, pipeline } from 'node:stream/promises';
import type { ClientBase } from 'pg';
import { from as copyFrom } from 'pg-copy-streams';

/**
 * Rows into PostgreSQL with `COPY … FROM STDIN` (text format), the fastest way in. Rows are
 * written as they are generated, and the load is split into several COPY statements so that the
 * queue of foreign-key checks (AFTER triggers, fired at the end of each statement) stays small.
 */

/**
 * A value in COPY's text format: \N for null, backslash escapes, JS arrays as PostgreSQL array
 * literals (text[]), other objects as JSON (jsonb; pass a JSON array for a jsonb column as a string).
 */
export function copyField(value: unknown): string {
  if (value === null || value === undefined) return '\\N';
  if (typeof value === 'number') {
    if (!Number.isFinite(value)) throw new Error(`cannot COPY the number ${value}`);
    return String(value);
  }
  if (typeof value === 'boolean') return value ? 't' : 'f';
  if (Array.isArray(value)) {
    const literal = `{${value.map((item) => `"${String(item).replace(/\\/g, '\\\\').replace(/"/g, '\\"')}"`).join(',')}}`;
    return escapeText(literal);
  }
  if (typeof value === 'object') return escapeText(JSON.stringify(value));
  return escapeText(String(value));
}

function escapeText(text: string): string {
  return /[\\\n\r\t]/.test(text) ? text.replace(/[\\\n\r\t]/g, (c) => ({ '\\': '\\\\', '\n': '\\n', '\r': '\\r', '\t': '\\t' })[c]!) : text;
}

const NON_ASCII = /[^\x00-\x7f]/;

/** One row of COPY text, ending in a newline. */
export function copyLine(fields: readonly unknown[]): string {
  let line = '';
  for (let i = 0; i < fields.length; i++) line += (i ? '\t' : '') + copyField(fields[i]);
  return `${line}\n`;
}

/**
 * COPYs the lines into `table (columns)`, `rowsPerStatement` rows per COPY statement, on the
 * caller's connection (and so in its transaction); `afterStatement` hears the rows written so far
 * after each statement (its foreign-key checks included). Returns the number of rows.
 */
export async function copyRows(
  client: ClientBase, table: string, columns: readonly string[], lines: Iterable<string>, rowsPerStatement = 100_000,
  afterStatement?: (rowsWritten: number) => void | Promise<void>,
): Promise<number> {
  const iterator = lines[Symbol.iterator]();
  let total = 0;
  let finished = false;
  while (!finished) {
    let inStatement = 0;
    const first = iterator.next();
    if (first.done) break;
    // Chunks of ~256 kB: fewer, larger writes to the socket. Lines are joined (not appended one by
    // one, which leaves a string of thousands of pieces to flatten) and ASCII goes out as it is.
    function* chunks(): Generator<Buffer> {
      let lines: string[] = [first.value];
      let length = first.value.length;
      inStatement = 1;
      while (inStatement < rowsPerStatement) {
        const next = iterator.next();
        if (next.done) {
          finished = true;
          break;
        }
        lines.push(next.value);
        length += next.value.length;
        inStatement++;
        if (length > 262_144) {
          yield encode(lines.join(''));
          lines = [];
          length = 0;
        }
      }
      if (lines.length > 0) yield encode(lines.join(''));
    }
    const stream = client.query(copyFrom(`COPY ${table} (${columns.join(', ')}) FROM STDIN`));
    await pipeline(Readable.from(chunks(), { objectMode: false }), stream);
    total += inStatement;
    if (afterStatement) await afterStatement(total);
  }
  return total;
}

function encode(text: string): Buffer {
  return Buffer.from(text, NON_ASCII.test(text) ? 'utf8' : 'latin1');
}

const PIECE_BYTES = 1 << 20;

/**
 * COPY text written straight into byte buffers, row by row: no line strings to build, join and
 * encode. A row may run across two pieces; COPY reads them as one stream.
 */
export class CopyTextBuilder {
  readonly pieces: Buffer[] = [];
  rows = 0;
  private buffer = Buffer.allocUnsafe(PIECE_BYTES);
  private at = 0;
  private startOfRow = true;

  /** A field that needs no escaping: an integer, or text of ASCII letters, digits and dashes (a uuid, a vocabulary word); null is \N. */
  word(value: string | number | null): this {
    return this.put(value === null ? '\\N' : typeof value === 'number' ? String(value) : value);
  }

  /** A jsonb field from JSON text, written as UTF-8. */
  jsonText(text: string): this {
    // JSON text holds no raw newline or tab; its backslashes are COPY's escape character.
    const escaped = text.includes('\\') ? text.replace(/\\/g, '\\\\') : text;
    this.reserve(escaped.length * 3 + 1);
    if (!this.startOfRow) this.buffer[this.at++] = 9;
    this.startOfRow = false;
    this.at += this.buffer.write(escaped, this.at, 'utf8');
    return this;
  }

  endRow(): void {
    this.reserve(1);
    this.buffer[this.at++] = 10;
    this.startOfRow = true;
    this.rows++;
  }

  /** The bytes so far; the builder is done with. */
  finish(): Buffer[] {
    if (this.at > 0) this.pieces.push(this.buffer.subarray(0, this.at));
    this.at = 0;
    return this.pieces;
  }

  /** `text` is ASCII: one byte per character. */
  private put(text: string): this {
    this.reserve(text.length + 1);
    if (!this.startOfRow) this.buffer[this.at++] = 9;
    this.startOfRow = false;
    this.at += this.buffer.write(text, this.at, 'latin1');
    return this;
  }

  private reserve(bytes: number): void {
    if (this.at + bytes <= this.buffer.length) return;
    this.pieces.push(this.buffer.subarray(0, this.at));
    this.buffer = Buffer.allocUnsafe(Math.max(PIECE_BYTES, bytes));
    this.at = 0;
  }
}

/** One COPY statement of ready bytes (`CopyTextBuilder`) on `client`. */
export async function copyPieces(client: ClientBase, table: string, columns: readonly string[], pieces: readonly Buffer[]): Promise<void> {
  const stream = client.query(copyFrom(`COPY ${table} (${columns.join(', ')}) FROM STDIN`));
  const done = finished(stream);
  for (const piece of pieces) stream.write(piece);
  stream.end();
  await done;
}
