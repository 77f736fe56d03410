import { Client } from 'pg';
import { to as copyTo } from 'pg-copy-streams';
import { sampleRss, type ApiProcess } from './api-process';
import { round } from './latency-stats';
import { inlineParameters, type CapturedStatement } from './sql-load';

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

export async function exportBench(api: ApiProcess, path: string, statement: CapturedStatement | null, databaseUrl: string): Promise<ExportResult> {
  const rssBefore = api.rssMb();
  const sampler = sampleRss(api.pid, 100);
  const counter = new CsvCounter();
  const t0 = performance.now();
  const answer = await fetch(`${api.url}${path}`);
  const firstByte = (performance.now() - t0) / 1000;
  if (answer.body) {
    const reader = answer.body.getReader();
    for (;;) {
      const { done, value } = await reader.read();
      if (done) break;
      counter.add(value);
    }
  }
  const seconds = (performance.now() - t0) / 1000;
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
  if (!statement) return { api: apiResult, copy: null, ratio: null };

  const client = new Client({ connectionString: databaseUrl });
  await client.connect();
  try {
    const sql = `COPY (${inlineParameters(statement, (t) => client.escapeLiteral(t))}) TO STDOUT WITH (FORMAT csv, HEADER)`;
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
    return { api: apiResult, copy, ratio: round(apiResult.rowsPerSecond / copy.rowsPerSecond, 2) };
  } finally {
    await client.end();
  }
}
