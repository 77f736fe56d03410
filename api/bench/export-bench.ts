import { Client } from 'pg';
import { to as copyTo } from 'pg-copy-streams';
import { sampleRss, type ApiProcess } from './api-process';
import { loadStats, round, type LoadStats } from './latency-stats';
import { inlineStatement, type CapturedStatement } from './sql-load';

/** A full-size export through the API against PostgreSQL's own COPY of the same rows. */
export interface ExportResult {
  api: {
    status: number;
    seconds: number;
    firstByteSeconds: number;
    bytes: number;
    rows: number;
    rowsPerSecond: number;
    megabytesPerSecond: number;
    rssBeforeMb: number;
    rssPeakMb: number;
    rssAfterMb: number;
    /** RSS at each tenth of the export, to show whether it grows with the output */
    rssTrendMb: number[];
  };
  copy: { seconds: number; bytes: number; rows: number; rowsPerSecond: number; megabytesPerSecond: number } | null;
  /** API rows/s over COPY rows/s */
  ratio: number | null;
  /** other requests (one at a time) answered while the export streamed: does the export hold the API up? */
  meanwhile: (LoadStats & { what: string }) | null;
}

/** Counts rows of a streamed CSV: lines that are neither `#` comments nor the header. */
class CsvCounter {
  bytes = 0;
  lines = 0;
  comments = 0;
  private atLineStart = true;

  add(chunk: Uint8Array): void {
    this.bytes += chunk.length;
    for (let i = 0; i < chunk.length; i++) {
      const byte = chunk[i];
      if (this.atLineStart && byte === 0x23) this.comments++;
      this.atLineStart = byte === 0x0a;
      if (this.atLineStart) this.lines++;
    }
  }

  get rows(): number {
    return Math.max(0, this.lines - this.comments - 1);
  }
}

/**
 * The statement that reads an export's rows, from those captured while it ran: a streamed
 * query, or the query inside a COPY … TO STDOUT (the CSV export's way out of the database).
 */
export function exportedQuery(statements: CapturedStatement[]): CapturedStatement | null {
  const streamed = statements.find((s) => s.stream);
  if (streamed) return streamed;
  const copy = statements.map((s) => /^COPY \(([\s\S]*)\) TO STDOUT$/.exec(s.text)).find(Boolean);
  return copy ? { text: copy[1], values: [], stream: true } : null;
}

/** Probe requests start this far apart (or when the one before is answered, if later): few enough not to slow the export measured. */
const PROBE_INTERVAL_MS = 100;

/** Requests sent one at a time, at most one per PROBE_INTERVAL_MS, from the same paths in turn, until `until` settles. */
async function requestsDuring(api: ApiProcess, paths: string[], until: Promise<unknown>): Promise<{ latencies: number[]; errors: number; seconds: number }> {
  let over = false;
  void until.finally(() => (over = true)).catch(() => undefined);
  const latencies: number[] = [];
  let errors = 0;
  const t0 = performance.now();
  for (let i = 0; !over && paths.length > 0; i++) {
    const start = performance.now();
    const answer = await fetch(`${api.url}${paths[i % paths.length]}`);
    await answer.arrayBuffer();
    if (answer.ok) latencies.push(performance.now() - start);
    else errors++;
    const pause = start + PROBE_INTERVAL_MS - performance.now();
    if (pause > 0) await Promise.race([new Promise((resolve) => setTimeout(resolve, pause)), until.catch(() => undefined)]);
  }
  return { latencies, errors, seconds: (performance.now() - t0) / 1000 };
}

/**
 * The export through the API, with `probe.paths` asked one at a time while it streams; then
 * PostgreSQL's COPY of the captured statement.
 */
export async function exportBench(api: ApiProcess, path: string, statement: CapturedStatement | null, databaseUrl: string, probe: { what: string; paths: string[] } | null = null): Promise<ExportResult> {
  const rssBefore = api.rssMb();
  const sampler = sampleRss(api.pid, 100);
  const counter = new CsvCounter();
  const t0 = performance.now();
  let firstByte = 0;
  const streamed = (async () => {
    const answer = await fetch(`${api.url}${path}`);
    firstByte = (performance.now() - t0) / 1000;
    if (answer.body) {
      const reader = answer.body.getReader();
      for (;;) {
        const { done, value } = await reader.read();
        if (done) break;
        counter.add(value);
      }
    }
    return answer;
  })();
  const [answer, probed] = await Promise.all([streamed, probe ? requestsDuring(api, probe.paths, streamed) : null]);
  const seconds = (performance.now() - t0) / 1000;
  const meanwhile = probe && probed ? { what: probe.what, ...loadStats(probed.latencies, 1, probed.seconds, probed.errors) } : null;
  const samples = sampler.stop();
  const trend = Array.from({ length: 10 }, (_, k) => round(samples[Math.min(samples.length - 1, Math.floor(((k + 1) * samples.length) / 10) - 1)] ?? Number.NaN, 1));
  const apiResult = {
    status: answer.status,
    seconds: round(seconds, 2),
    firstByteSeconds: round(firstByte, 2),
    bytes: counter.bytes,
    rows: counter.rows,
    rowsPerSecond: Math.round(counter.rows / seconds),
    megabytesPerSecond: round(counter.bytes / 1e6 / seconds, 1),
    rssBeforeMb: round(rssBefore, 1),
    rssPeakMb: round(Math.max(...samples), 1),
    rssAfterMb: round(api.rssMb(), 1),
    rssTrendMb: trend,
  };
  if (!statement) return { api: apiResult, copy: null, ratio: null, meanwhile };

  const client = new Client({ connectionString: databaseUrl });
  await client.connect();
  try {
    const sql = `COPY (${inlineStatement(statement, (t) => client.escapeLiteral(t))}) TO STDOUT WITH (FORMAT csv, HEADER)`;
    const copyCounter = new CsvCounter();
    const c0 = performance.now();
    const stream = client.query(copyTo(sql));
    for await (const chunk of stream) copyCounter.add(chunk as Buffer);
    const copySeconds = (performance.now() - c0) / 1000;
    const copy = {
      seconds: round(copySeconds, 2),
      bytes: copyCounter.bytes,
      rows: copyCounter.rows,
      rowsPerSecond: Math.round(copyCounter.rows / copySeconds),
      megabytesPerSecond: round(copyCounter.bytes / 1e6 / copySeconds, 1),
    };
    return { api: apiResult, copy, ratio: round(apiResult.rowsPerSecond / copy.rowsPerSecond, 2), meanwhile };
  } finally {
    await client.end();
  }
}
