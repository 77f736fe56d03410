/**
 * `npm run bench`: every API benchmark against the generated data set (issues 7 and 10).
 *
 * 1. Starts the bench cluster and makes sure it holds the data set (generate-data.ts).
 * 2. Runs the engine benchmark (engine-bench.ts) and keeps its figures.
 * 3. Starts the API as a separate process (NODE_ENV=production) with statement capture, sends each
 *    benchmark's requests once, and records the SQL each request sends (statement-capture.ts).
 * 4. Restarts the API without capture; for each benchmark at 1 and 16 connections: autocannon
 *    against the API, then the captured statements replayed through pg at the same concurrency.
 * 5. A full CSV export against COPY TO STDOUT, and a bulk import against COPY FROM.
 * 6. Prints the table with PASS/MISS per target and writes test-output/bench/results.json.
 *
 *   KELVINDEX_BENCH_SECONDS      seconds per measured run (default 10)
 *   KELVINDEX_BENCH_IMPORT_ROWS  rows of the generated import file (default 50 000)
 *   KELVINDEX_BENCH_ONLY         comma-separated benchmark keys to run (default all)
 */
import 'reflect-metadata';
import { spawnSync } from 'node:child_process';
import { readFileSync, rmSync, statSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { Client } from 'pg';
import { startApi, sampleRss, type ApiProcess } from './api-process';
import { startBenchCluster } from './bench-cluster';
import { checkTargets, printTable, writeResults, type BenchResults, type ScenarioRow } from './bench-report';
import { buildScenarios, latestPublishedRelease, type Scenario } from './bench-scenarios';
import { exportBench, exportedQuery } from './export-bench';
import { benchDataOptions, ensureBenchData } from './generate-data';
import { httpLoad, type HttpRequestSpec } from './http-load';
import { importBenchRuns } from './import-bench';
import { round } from './latency-stats';
import { sqlLoad, type CapturedRequest, type CapturedStatement } from './sql-load';

const projectDir = path.resolve(__dirname, '../../../..');
const SECONDS = Number(process.env.KELVINDEX_BENCH_SECONDS ?? 10);
const IMPORT_ROWS = Number(process.env.KELVINDEX_BENCH_IMPORT_ROWS ?? 50_000);
/** the import is run this many times and the median run reported */
const IMPORT_RUNS = Math.max(1, Number(process.env.KELVINDEX_BENCH_IMPORT_RUNS ?? 5));
const ONLY = process.env.KELVINDEX_BENCH_ONLY?.split(',').map((s) => s.trim()).filter(Boolean);
const CONNECTIONS = [1, 16];
/** benchmarks whose answers the API keeps in its answer cache (published release, GET) */
const CACHED_READS = ['search-formula', 'search-name', 'search-elements', 'properties'];
const UNCACHED_SUFFIX = ':uncached';
/** requests per benchmark sent once for calibration, and kept in the rotation when they succeed */
const CALIBRATION_REQUESTS = 200;

interface Calibrated {
  scenario: Scenario;
  requests: HttpRequestSpec[];
  captured: CapturedRequest[];
  failures: Record<string, number>;
  sampleFailure?: string;
}

function readCapture(file: string, from: number): { statements: CapturedStatement[]; size: number } {
  const size = statSync(file).size;
  if (size <= from) return { statements: [], size };
  const text = readFileSync(file).subarray(from, size).toString('utf8');
  return { statements: text.split('\n').filter(Boolean).map((l) => JSON.parse(l) as CapturedStatement), size };
}

/** Sends each request once (sequentially) and keeps the ones that succeed, with the SQL each sent. */
async function calibrate(api: ApiProcess, captureFile: string, scenario: Scenario): Promise<Calibrated> {
  const result: Calibrated = { scenario, requests: [], captured: [], failures: {} };
  let offset = statSync(captureFile).size;
  for (const spec of scenario.requests.slice(0, CALIBRATION_REQUESTS)) {
    const answer = await fetch(`${api.url}${spec.path}`, {
      method: spec.method,
      body: spec.body,
      headers: spec.body ? { 'content-type': 'application/json' } : {},
    });
    const body = await answer.text();
    await new Promise((resolve) => setTimeout(resolve, 5));
    const { statements, size } = readCapture(captureFile, offset);
    offset = size;
    if (answer.ok) {
      result.requests.push(spec);
      result.captured.push(statements.filter((s) => !/^\s*(SELECT 1|SELECT version\(\))\s*$/i.test(s.text)));
    } else {
      result.failures[answer.status] = (result.failures[answer.status] ?? 0) + 1;
      result.sampleFailure ??= `${spec.method} ${spec.path} → ${answer.status} ${body.slice(0, 300)}`;
    }
  }
  return result;
}

/** The statements of a full export (the request is cut off once the answer starts: the cursor query has been sent by then). */
async function captureExport(api: ApiProcess, captureFile: string, exportPath: string): Promise<{ statements: CapturedStatement[]; status: number }> {
  const offset = statSync(captureFile).size;
  const abort = new AbortController();
  const answer = await fetch(`${api.url}${exportPath}`, { signal: abort.signal });
  const status = answer.status;
  if (answer.ok && answer.body) {
    const reader = answer.body.getReader();
    await reader.read();
    abort.abort();
    await reader.cancel().catch(() => undefined);
  } else {
    await answer.text();
  }
  await new Promise((resolve) => setTimeout(resolve, 200));
  return { statements: readCapture(captureFile, offset).statements, status };
}

function engineBenchmark(): string {
  const result = spawnSync(process.execPath, [path.join(projectDir, 'dist/server/api/bench/engine-bench.js')], { cwd: projectDir, encoding: 'utf8', timeout: 300_000 });
  return `${result.stdout ?? ''}${result.status === 0 ? '' : `\n(engine benchmark exited with ${result.status}: ${result.stderr})`}`.trim();
}

async function main(): Promise<void> {
  const startedAt = new Date().toISOString();
  const loadBefore = os.loadavg().map((l) => round(l, 2));
  const bench = await startBenchCluster();
  let api: ApiProcess | undefined;
  const client = new Client({ connectionString: bench.url });
  try {
    const dataSet = await ensureBenchData(bench, benchDataOptions());
    await client.connect();
    const postgres = (await client.query('SHOW server_version')).rows[0].server_version as string;

    console.log('\nEngine benchmark (npm run bench:engine):');
    const engineOutput = engineBenchmark();
    console.log(engineOutput.replace(/^/gm, '  '));

    const scenarios = (await buildScenarios(client)).filter((s) => !ONLY || ONLY.includes(s.key));
    const release = await latestPublishedRelease(client);
    const exportPath = '/api/v1/export?format=csv';

    // Calibration: which requests succeed, and what SQL each sends.
    const captureFile = path.join(os.tmpdir(), `kelvindex-bench-capture-${process.pid}.jsonl`);
    writeFileSync(captureFile, '');
    console.log(`\nCalibrating (API with statement capture, ${CALIBRATION_REQUESTS} requests per benchmark, release ${release.label})…`);
    // Without the answer cache, so that every calibrated request records the SQL it costs when computed.
    api = await startApi(bench.url, { captureFile, env: { RESPONSE_CACHE_MB: '0' } });
    const calibrated: Calibrated[] = [];
    for (const scenario of scenarios) {
      await calibrate(api, captureFile, { ...scenario, requests: scenario.requests.slice(0, 20) }); // warm caches first
      const c = await calibrate(api, captureFile, scenario);
      calibrated.push(c);
      const statements = c.captured.length ? c.captured.reduce((a, r) => a + r.length, 0) / c.captured.length : 0;
      console.log(`  ${scenario.key.padEnd(16)} ${c.requests.length}/${Math.min(CALIBRATION_REQUESTS, scenario.requests.length)} requests succeed, ${statements.toFixed(1)} statements each` +
        (c.sampleFailure ? `; failures ${JSON.stringify(c.failures)}, e.g. ${c.sampleFailure}` : ''));
    }
    const wantExport = !ONLY || ONLY.includes('export-full');
    const exportCapture = wantExport ? await captureExport(api, captureFile, exportPath) : { statements: [], status: 0 };
    await api.stop();
    api = undefined;
    rmSync(captureFile, { force: true });

    console.log(`\nMeasuring (${SECONDS} s per run, connections ${CONNECTIONS.join(' and ')}; API process NODE_ENV=production)…`);
    api = await startApi(bench.url);
    const rows: ScenarioRow[] = [];
    const measure = async (c: Calibrated, variant: { key: string; title: string }, api: ApiProcess) => {
      for (const connections of CONNECTIONS) {
        const row: ScenarioRow = { key: variant.key, title: variant.title, connections, available: c.requests.length > 0 };
        if (!row.available) {
          row.reason = c.sampleFailure ?? 'no request to send';
          rows.push(row);
          continue;
        }
        await httpLoad(api.url, c.requests, connections, Math.min(3, SECONDS)); // warm-up, not recorded
        const rssBefore = api.rssMb();
        const sampler = sampleRss(api.pid, 250);
        const apiStats = await httpLoad(api.url, c.requests, connections, SECONDS);
        const samples = sampler.stop();
        const database = await sqlLoad(bench.url, c.captured, connections, SECONDS);
        Object.assign(row, {
          api: { ...apiStats, rssMb: { before: round(rssBefore, 1), peak: round(Math.max(...samples), 1) } },
          database,
          ratio: database.requestsPerSecond > 0 ? round(apiStats.requestsPerSecond / database.requestsPerSecond, 2) : null,
          requestsInRotation: c.requests.length,
          statementsPerRequest: round(c.captured.reduce((a, r) => a + r.length, 0) / c.captured.length, 1),
        });
        rows.push(row);
        console.log(`  ${variant.key.padEnd(22)} ${String(connections).padStart(2)} conn: API ${apiStats.requestsPerSecond} req/s p95 ${apiStats.p95} ms (${apiStats.errors} errors); PG ${database.requestsPerSecond} req/s p95 ${database.p95} ms`);
      }
    };
    for (const c of calibrated) await measure(c, c.scenario, api);
    // The answer cache serves repeated reads of a published release from memory; the same reads
    // with it turned off show what every first request (and a release in preparation) costs.
    const cacheable = calibrated.filter((c) => CACHED_READS.includes(c.scenario.key));
    if (cacheable.length > 0) {
      await api.stop();
      console.log('  …the same reads again with the answer cache off (RESPONSE_CACHE_MB=0):');
      const uncached = await startApi(bench.url, { env: { RESPONSE_CACHE_MB: '0' } });
      api = uncached;
      for (const c of cacheable) await measure(c, { key: `${c.scenario.key}${UNCACHED_SUFFIX}`, title: `${c.scenario.title}, cache off` }, uncached);
    }

    let fullExport: BenchResults['fullExport'] = { available: false, reason: 'not run (KELVINDEX_BENCH_ONLY)' };
    if (wantExport) {
      if (exportCapture.status !== 200) {
        fullExport = { available: false, reason: `GET ${exportPath} answered ${exportCapture.status}` };
      } else {
        console.log('  full CSV export through the API, then COPY TO STDOUT of the same query…');
        const rowsQuery = exportedQuery(exportCapture.statements);
        // Formula searches one at a time meanwhile: an export must not hold the other requests up.
        const searches = scenarios.find((s) => s.key === 'search-formula')?.requests.map((r) => r.path) ?? [];
        fullExport = await exportBench(api, exportPath, rowsQuery, bench.url, { what: 'species searches by formula', paths: searches });
      }
    }
    const bulkImport = !ONLY || ONLY.includes('import')
      ? (console.log(`  bulk import of ${IMPORT_ROWS.toLocaleString('en')} rows, then COPY FROM of the same rows, ${IMPORT_RUNS} times…`), await importBenchRuns(api, bench.url, IMPORT_ROWS, IMPORT_RUNS))
      : { available: false, reason: 'not run (KELVINDEX_BENCH_ONLY)' };
    await api.stop();
    api = undefined;

    const partial: Omit<BenchResults, 'targets'> = {
      startedAt,
      finishedAt: new Date().toISOString(),
      machine: {
        cpus: os.cpus().length,
        loadAverageBefore: loadBefore,
        loadAverageAfter: os.loadavg().map((l) => round(l, 2)),
        node: process.version,
        postgres,
        note: 'API, PostgreSQL and the load generator share this machine; figures are noisy when other work runs.',
      },
      dataSet,
      secondsPerRun: SECONDS,
      scenarios: rows,
      fullExport,
      bulkImport,
      engine: { output: engineOutput },
      sql: Object.fromEntries([
        ...calibrated.filter((c) => c.captured.length > 0).map((c) => [c.scenario.key, c.captured[0].map(({ text, values }) => ({ text, values }))]),
        ...(exportCapture.statements.length ? [['export-full', exportCapture.statements.map(({ text, values }) => ({ text, values }))]] : []),
      ]),
    };
    const results: BenchResults = { ...partial, targets: checkTargets(partial) };
    printTable(results);
    const file = writeResults(results, projectDir);
    console.log(`\nMachine: ${os.cpus().length} cores, load average ${loadBefore.join(' ')} before, ${results.machine.loadAverageAfter.join(' ')} after. Results: ${path.relative(projectDir, file)}`);
  } finally {
    if (api) await api.stop();
    await client.end().catch(() => undefined);
    await bench.stop();
  }
}

main().catch((error: Error) => {
  console.error(error.stack ?? error.message);
  process.exit(1);
});
