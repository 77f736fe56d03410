/**
 * Preloaded into the API process for the calibration run only (`node --require …`): records every
 * SQL statement the API sends through `pg` (text and parameters, one JSON line each) in the file
 * named by KELVINDEX_BENCH_CAPTURE. The benchmark then replays exactly those statements straight
 * through `pg` to measure "PostgreSQL doing the same work", whatever the query code looks like.
 * The job queue's own polling (schema pgboss) is left out.
 */
import { appendFileSync } from 'node:fs';

interface Submitted {
  name?: string;
  text?: string;
  values?: unknown[];
  cursor?: { text?: string; values?: unknown[] };
}

const file = process.env.KELVINDEX_BENCH_CAPTURE;
if (file) {
  // The API's own copy of pg (the same module TypeORM and pg-query-stream use).
  const pg = require(require.resolve('pg', { paths: [process.cwd()] })) as typeof import('pg');
  const prototype = pg.Client.prototype as unknown as { query: (...args: unknown[]) => unknown };
  const original = prototype.query;
  prototype.query = function capture(this: unknown, ...args: unknown[]) {
    const [config, values] = args;
    let text: string | undefined;
    let params: unknown[] | undefined;
    if (typeof config === 'string') {
      text = config;
      params = Array.isArray(values) ? values : undefined;
    } else if (config && typeof config === 'object') {
      const submitted = config as Submitted;
      text = submitted.text ?? submitted.cursor?.text;
      params = submitted.values ?? submitted.cursor?.values;
    }
    if (text && !/\bpgboss\b/i.test(text)) {
      const name = typeof config === 'object' ? (config as Submitted | null)?.name : undefined;
      appendFileSync(file, `${JSON.stringify({ name, text, values: params ?? [], stream: Boolean((config as Submitted)?.cursor) })}\n`);
    }
    return original.apply(this, args);
  };
}
