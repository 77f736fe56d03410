import 'reflect-metadata';
import { chmodSync, existsSync, mkdtempSync, readFileSync, rmSync } from 'node:fs';
import path from 'node:path';
import { spawn, type ChildProcess } from 'node:child_process';
import { loadConfig, type AppConfig } from '../src/config';
import { PostgresCluster } from './postgres-cluster';
import { startMailCatcher, startObjectStoreFake } from './local-fakes';
import { prepareDatabase } from './prepare-database';
import { anyFreePort } from './free-port';
import { aptInstall, commandExists, run } from './shell';
import { ng } from './angular-cli';

interface SuiteCount {
  suite: string;
  passed: number;
  failed: number;
  note?: string;
}

const ALL_SUITES = ['api', 'reliability', 'client', 'e2e'] as const;
type SuiteName = (typeof ALL_SUITES)[number];

/**
 * `npm test`: a throwaway PostgreSQL cluster and local fakes, then the API, client and end-to-end
 * suites; the last line printed is the grand total.
 */
async function main(): Promise<void> {
  const started = Date.now();
  const wanted = (process.env.KELVINDEX_SUITES ?? ALL_SUITES.join(',')).split(',') as SuiteName[];
  const tmp = mkdtempSync('/tmp/kxt-');
  chmodSync(tmp, 0o755);
  const counts: SuiteCount[] = [];
  const stops: (() => Promise<void>)[] = [];
  try {
    const cluster = new PostgresCluster({ dir: path.join(tmp, 'pg'), port: await anyFreePort(), throwaway: true });
    await cluster.ensureInstalled();
    await cluster.init();
    await cluster.start();
    stops.push(() => cluster.stop());
    if (wanted.includes('client') || wanted.includes('e2e')) await ensureChromium();

    const env = await testEnvironment(tmp);
    const base = loadConfig(env);
    const mail = await startMailCatcher(base.smtp.port, base.mailOutboxDir);
    stops.push(() => mail.close());
    const objects = await startObjectStoreFake(Number(new URL(base.s3.endpoint).port), path.join(tmp, 'objects'), base.s3.bucket);
    stops.push(() => objects.close());

    const databaseFor = async (name: string): Promise<NodeJS.ProcessEnv> => {
      await cluster.ensureDatabase(name);
      const suiteEnv = { ...env, DATABASE_URL: cluster.url(name) };
      await prepareDatabase(loadConfig(suiteEnv), { demo: true });
      return suiteEnv;
    };

    if (wanted.includes('api')) {
      counts.push(await jasmineSuite('api', 'api/jasmine.json', await databaseFor('kelvindex_api'), tmp));
    }
    if (wanted.includes('reliability')) {
      counts.push(await jasmineSuite('reliability', 'test/reliability/jasmine.json', env, tmp));
    }
    if (wanted.includes('client')) {
      counts.push(await karmaSuite(env, tmp));
    }
    if (wanted.includes('e2e')) {
      counts.push(await e2eSuite(await databaseFor('kelvindex_e2e'), tmp));
    }
  } catch (error) {
    console.error(`\nThe test set-up failed: ${(error as Error).message}`);
    counts.push({ suite: 'set-up', passed: 0, failed: 1, note: (error as Error).message });
  } finally {
    for (const stop of stops.reverse()) await stop().catch((e: Error) => console.error(e.message));
    rmSync(tmp, { recursive: true, force: true });
  }
  report(counts, Date.now() - started);
}

async function testEnvironment(tmp: string): Promise<NodeJS.ProcessEnv> {
  return {
    ...process.env,
    NODE_ENV: 'test',
    PORT: String(await anyFreePort()),
    SMTP_PORT: String(await anyFreePort()),
    MAIL_OUTBOX_DIR: path.join(tmp, 'outbox'),
    S3_ENDPOINT: `http://127.0.0.1:${await anyFreePort()}`,
    CLIENT_DIR: path.resolve('dist/client/browser'),
    KELVINDEX_TEST_TMP: tmp,
    JWT_SECRET: 'kelvindex-test-secret',
  };
}

async function ensureChromium(): Promise<void> {
  if (commandExists('chromium')) return;
  await aptInstall(['chromium', 'fonts-liberation'], 'Chromium for the browser tests (Debian packages chromium, fonts-liberation)');
}

async function jasmineSuite(suite: string, config: string, env: NodeJS.ProcessEnv, tmp: string): Promise<SuiteCount> {
  const countsFile = path.join(tmp, `${suite}-counts.json`);
  heading(suite);
  const jasmineBin = path.resolve('node_modules/jasmine/bin/jasmine.js');
  try {
    const filter = process.env.KELVINDEX_FILTER ? [`--filter=${process.env.KELVINDEX_FILTER}`] : [];
    await run(process.execPath, ['--enable-source-maps', jasmineBin, `--config=${config}`, ...filter], {
      env: { ...env, KELVINDEX_COUNTS_FILE: countsFile, KELVINDEX_SUITE: suite },
    });
  } catch {
    // failures are counted from the counts file
  }
  return readCounts(suite, countsFile);
}

async function karmaSuite(env: NodeJS.ProcessEnv, tmp: string): Promise<SuiteCount> {
  const countsFile = path.join(tmp, 'client-counts.json');
  heading('client');
  try {
    await ng(['test', '--watch=false', '--progress=false'], { ...env, KELVINDEX_COUNTS_FILE: countsFile, CHROME_BIN: '/usr/bin/chromium' });
  } catch {
    // counted below
  }
  return readCounts('client', countsFile);
}

async function e2eSuite(env: NodeJS.ProcessEnv, tmp: string): Promise<SuiteCount> {
  heading('e2e: building the client');
  try {
    await ng(['build'], env);
  } catch (error) {
    return { suite: 'e2e', passed: 0, failed: 1, note: `client build failed: ${(error as Error).message}` };
  }
  const config: AppConfig = loadConfig(env);
  const server = spawn(process.execPath, ['--enable-source-maps', path.resolve('dist/server/api/src/main.js')], { env, stdio: ['ignore', 'inherit', 'inherit'] });
  try {
    await waitForHealth(`http://127.0.0.1:${config.port}/api/v1/health`, server);
    return await jasmineSuite('e2e', 'test/e2e/jasmine.json', { ...env, APP_URL: `http://127.0.0.1:${config.port}` }, tmp);
  } catch (error) {
    return { suite: 'e2e', passed: 0, failed: 1, note: (error as Error).message };
  } finally {
    server.kill('SIGTERM');
  }
}

async function waitForHealth(url: string, child: ChildProcess, timeoutMs = 30_000): Promise<void> {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    if (child.exitCode !== null) throw new Error(`the API exited with ${child.exitCode} before it was ready`);
    try {
      if ((await fetch(url)).ok) return;
    } catch {
      // not listening yet
    }
    await new Promise((r) => setTimeout(r, 200));
  }
  throw new Error(`the API did not answer ${url} within ${timeoutMs / 1000} s`);
}

function readCounts(suite: string, file: string): SuiteCount {
  if (!existsSync(file)) return { suite, passed: 0, failed: 1, note: 'the runner ended without reporting (crash or compile error)' };
  const parsed = JSON.parse(readFileSync(file, 'utf8')) as SuiteCount;
  return { suite, passed: parsed.passed, failed: parsed.failed };
}

function heading(text: string): void {
  console.log(`\n━━ ${text} ${'━'.repeat(Math.max(0, 60 - text.length))}`);
}

function report(counts: SuiteCount[], elapsedMs: number): void {
  heading('summary');
  for (const c of counts) {
    console.log(`${c.suite.padEnd(10)} ${String(c.passed).padStart(5)} passed ${String(c.failed).padStart(4)} failed${c.note ? `  (${c.note})` : ''}`);
  }
  console.log(`time: ${(elapsedMs / 1000).toFixed(0)} s`);
  const passed = counts.reduce((n, c) => n + c.passed, 0);
  const failed = counts.reduce((n, c) => n + c.failed, 0);
  console.log(`${passed} passed, ${failed} failed`);
  process.exitCode = failed > 0 || counts.length === 0 ? 1 : 0;
}

main();
