import 'reflect-metadata';
import autocannon from 'autocannon';
import { spawn, type ChildProcess } from 'node:child_process';
import { existsSync, readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { Pool } from 'pg';
import { loadConfig } from '../src/config';
import { createDataSource } from '../src/db/data-source';
import { ExportService } from '../src/exports/export.service';
import { anyFreePort } from '../tools/free-port';

/**
 * `npm run bench:api`: figures for the read API against whatever DATABASE_URL holds (meant for the
 * 100 000-species data set of the performance issue; the demo data work too, with fewer distinct
 * inputs). Prints figures; asserts nothing.
 *
 * - species search by formula and property tables at 10 temperatures: 16 connections for
 *   BENCH_SECONDS (default 10) each, requests/s and latency percentiles;
 * - the full CSV export of the release: time and rows/s, against PostgreSQL's own
 *   `COPY (same query) TO STDOUT` through psql, with the API process's resident memory sampled.
 *
 * The API runs as its own process (dist/server/api/src/main.js), so load generator and server do not
 * share an event loop. BENCH_RELEASE picks the release (default: the latest published one).
 */

const CONNECTIONS = 16;
const SECONDS = Number(process.env.BENCH_SECONDS ?? 10);
const root = path.resolve(__dirname, '../../../..');

function percentile(sorted: number[], p: number): number {
  if (sorted.length === 0) return Number.NaN;
  return sorted[Math.min(sorted.length - 1, Math.floor((p / 100) * sorted.length))];
}

async function startApi(port: number): Promise<ChildProcess> {
  const child = spawn(process.execPath, [path.join(root, 'dist/server/api/src/main.js')], {
    env: { ...process.env, PORT: String(port), NODE_ENV: 'production' },
    stdio: ['ignore', 'ignore', 'inherit'],
  });
  const deadline = Date.now() + 30_000;
  while (Date.now() < deadline) {
    if (child.exitCode !== null) throw new Error(`the API exited with ${child.exitCode}`);
    try {
      if ((await fetch(`http://127.0.0.1:${port}/api/v1/health`)).ok) return child;
    } catch {
      // not listening yet
    }
    await new Promise((r) => setTimeout(r, 200));
  }
  throw new Error('the API did not start within 30 s');
}

function residentMb(pid: number): number {
  const status = readFileSync(`/proc/${pid}/status`, 'utf8');
  const kb = Number(/VmRSS:\s+(\d+)/.exec(status)?.[1] ?? 0);
  return kb / 1024;
}

/** Runs autocannon over a rotating list of paths; latencies from every response. */
async function load(name: string, base: string, paths: string[]): Promise<void> {
  const latencies: number[] = [];
  let next = 0;
  const result = await new Promise<autocannon.Result>((resolve, reject) => {
    const instance = autocannon(
      {
        url: base,
        connections: CONNECTIONS,
        duration: SECONDS,
        requests: [{ setupRequest: (request) => ({ ...request, path: paths[next++ % paths.length] }) }],
      },
      (error, done) => (error ? reject(error) : resolve(done)),
    );
    instance.on('response', (_client: unknown, _status: number, _bytes: number, responseTime: number) => latencies.push(responseTime));
  });
  latencies.sort((a, b) => a - b);
  const non2xx = result.non2xx + result.errors;
  console.log(
    `${name.padEnd(34)} ${result.requests.average.toFixed(0).padStart(6)} req/s   ` +
      `p50 ${percentile(latencies, 50).toFixed(1)} ms   p95 ${percentile(latencies, 95).toFixed(1)} ms   p99 ${percentile(latencies, 99).toFixed(1)} ms` +
      `   (${latencies.length} requests, ${non2xx} not 2xx, ${paths.length} distinct inputs)`,
  );
}

function psqlBinary(): string {
  const lib = '/usr/lib/postgresql';
  const version = existsSync(lib) ? readdirSync(lib).sort((a, b) => Number(b) - Number(a))[0] : undefined;
  return version ? path.join(lib, version, 'bin/psql') : 'psql';
}

async function timeCopy(databaseUrl: string, sql: string): Promise<{ seconds: number; bytes: number }> {
  const started = performance.now();
  let bytes = 0;
  await new Promise<void>((resolve, reject) => {
    const child = spawn(psqlBinary(), [databaseUrl, '-q', '-c', `COPY (${sql}) TO STDOUT WITH (FORMAT csv, HEADER)`], { stdio: ['ignore', 'pipe', 'inherit'] });
    child.stdout.on('data', (chunk: Buffer) => (bytes += chunk.length));
    child.once('error', reject);
    child.once('exit', (code) => (code === 0 ? resolve() : reject(new Error(`psql exited with ${code}`))));
  });
  return { seconds: (performance.now() - started) / 1000, bytes };
}

async function main(): Promise<void> {
  const config = loadConfig();
  const pool = new Pool({ connectionString: config.databaseUrl, max: 2 });
  const releaseLabel: string | undefined = process.env.BENCH_RELEASE ??
    (await pool.query(`SELECT label FROM releases WHERE status = 'published' ORDER BY split_part(label, '.', 1)::int DESC, split_part(label, '.', 2)::int DESC LIMIT 1`)).rows[0]?.label;
  if (!releaseLabel) throw new Error('no published release in this database');
  const release = (await pool.query(`SELECT id, label, status, published_at AS "publishedAt" FROM releases WHERE label = $1`, [releaseLabel])).rows[0];
  const counts = (await pool.query(
    `SELECT count(DISTINCT sp.species_id)::int AS species, count(*)::int AS members
       FROM release_members m JOIN species_phases sp ON sp.id = m.species_phase_id WHERE m.release_id = $1`, [release.id])).rows[0];
  console.log(`release ${releaseLabel}: ${counts.species} species, ${counts.members} values and fits; ${CONNECTIONS} connections, ${SECONDS} s per scenario\n`);

  const formulas: string[] = (await pool.query(
    `SELECT s.formula FROM species s
      WHERE EXISTS (SELECT 1 FROM species_phases sp JOIN release_members m ON m.species_phase_id = sp.id WHERE sp.species_id = s.id AND m.release_id = $1)
      ORDER BY md5(s.id::text) LIMIT 500`, [release.id])).rows.map((r) => r.formula);
  const withFits: { id: string; phase: string; tMin: number; tMax: number }[] = (await pool.query(
    `SELECT sp.species_id AS id, sp.phase, f.t_min_k AS "tMin", f.t_max_k AS "tMax"
       FROM release_members m JOIN species_phases sp ON sp.id = m.species_phase_id JOIN heat_capacity_fits f ON f.id = m.fit_id
      WHERE m.release_id = $1 AND m.is_recommended ORDER BY md5(f.id::text) LIMIT 500`, [release.id])).rows;

  const port = await anyFreePort();
  const api = await startApi(port);
  const base = `http://127.0.0.1:${port}`;
  try {
    await load('species search by formula', base, formulas.map((f) => `/api/v1/species?formula=${encodeURIComponent(f)}&release=${releaseLabel}`));
    if (withFits.length > 0) {
      await load('properties at 10 temperatures', base, withFits.map((s) => {
        const step = (s.tMax - s.tMin) / 9;
        const temperatures = Array.from({ length: 10 }, (_, i) => (s.tMin + i * step).toFixed(2)).join(',');
        return `/api/v1/species/${s.id}/properties?phase=${encodeURIComponent(s.phase)}&T=${temperatures}&release=${releaseLabel}`;
      }));
    } else {
      console.log('properties at 10 temperatures: no heat-capacity fits in this release');
    }

    // Full CSV export against COPY of the same query.
    const dataSource = createDataSource(config.databaseUrl);
    await dataSource.initialize();
    const { sql } = new ExportService(dataSource).rowsQuery({ ...release, explicit: true }, { filter: { elementsMode: 'contains' }, recommendedOnly: false });
    await dataSource.destroy();
    const copySql = sql.replace(/\$1\b/g, `'${release.id}'`);
    const copy = await timeCopy(config.databaseUrl, copySql);

    const before = residentMb(api.pid!);
    let peak = before;
    const sampler = setInterval(() => (peak = Math.max(peak, residentMb(api.pid!))), 100);
    const started = performance.now();
    const response = await fetch(`${base}/api/v1/export?format=csv&release=${releaseLabel}`);
    let bytes = 0;
    let lines = 0;
    for await (const chunk of response.body as unknown as AsyncIterable<Uint8Array>) {
      bytes += chunk.length;
      for (const b of chunk) if (b === 10) lines++;
    }
    const seconds = (performance.now() - started) / 1000;
    clearInterval(sampler);
    const rows = counts.members;
    console.log(
      `${'full CSV export'.padEnd(34)} ${seconds.toFixed(2)} s, ${(rows / seconds).toFixed(0)} rows/s, ${(bytes / 1e6).toFixed(1)} MB (${lines} lines)` +
        `   COPY of the same rows: ${copy.seconds.toFixed(2)} s, ${(rows / copy.seconds).toFixed(0)} rows/s, ${(copy.bytes / 1e6).toFixed(1)} MB` +
        `   → export speed ${((copy.seconds / seconds) * 100).toFixed(0)} % of COPY`,
    );
    console.log(`${'API resident memory during export'.padEnd(34)} ${before.toFixed(0)} MB before, ${peak.toFixed(0)} MB peak`);
  } finally {
    api.kill('SIGTERM');
    await pool.end();
  }
}

main().catch((error: Error) => {
  console.error(error);
  process.exit(1);
});
