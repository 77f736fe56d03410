import { Readable } from 'node:stream';
import { pipeline } from 'node:stream/promises';
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
    // Chunks of ~256 kB: fewer, larger writes to the socket.
    function* chunks(): Generator<string> {
      let buffer = first.value;
      inStatement = 1;
      while (inStatement < rowsPerStatement) {
        const next = iterator.next();
        if (next.done) {
          finished = true;
          break;
        }
        buffer += next.value;
        inStatement++;
        if (buffer.length > 262_144) {
          yield buffer;
          buffer = '';
        }
      }
      if (buffer) yield buffer;
    }
    const stream = client.query(copyFrom(`COPY ${table} (${columns.join(', ')}) FROM STDIN`));
    await pipeline(Readable.from(chunks(), { objectMode: false }), stream);
    total += inStatement;
    if (afterStatement) await afterStatement(total);
  }
  return total;
}
