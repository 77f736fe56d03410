import { spawn, type ChildProcess } from 'node:child_process';
import { createWriteStream, mkdtempSync, readFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { anyFreePort } from '../tools/free-port';

/**
 * The API as a separate process (node dist/server/api/src/main.js, NODE_ENV=production), as it
 * runs in production, so that its resident memory can be read from /proc and no benchmark code
 * shares its event loop.
 */
export interface ApiProcess {
  url: string;
  pid: number;
  /** resident set size / MB, from /proc/<pid>/status */
  rssMb(): number;
  stop(): Promise<void>;
}

const root = path.resolve(__dirname, '../../../..');

export async function startApi(databaseUrl: string, options: { captureFile?: string; env?: NodeJS.ProcessEnv } = {}): Promise<ApiProcess> {
  const port = await anyFreePort();
  const scratch = mkdtempSync(path.join(os.tmpdir(), 'kelvindex-bench-api-'));
  const env: NodeJS.ProcessEnv = {
    ...process.env,
    NODE_ENV: 'production',
    HOST: '127.0.0.1',
    PORT: String(port),
    DATABASE_URL: databaseUrl,
    DATABASE_REPLICA_URLS: '',
    PUBLIC_READ: 'true',
    CLIENT_DIR: path.join(scratch, 'no-client'),
    MAIL_OUTBOX_DIR: path.join(scratch, 'outbox'),
    // No mail or evidence files are sent during the benchmark; these only keep the defaults off npm start's fakes.
    SMTP_PORT: '9',
    S3_ENDPOINT: 'http://127.0.0.1:9',
    ...options.env,
  };
  const args = [path.join(root, 'dist/server/api/src/main.js')];
  if (options.captureFile) {
    env.KELVINDEX_BENCH_CAPTURE = options.captureFile;
    args.unshift('--require', path.join(root, 'dist/server/api/bench/statement-capture.js'));
  }
  // A CPU profile of the API, written when it stops (open it in Chrome's DevTools).
  if (process.env.KELVINDEX_BENCH_PROFILE_DIR) args.unshift('--cpu-prof', `--cpu-prof-dir=${process.env.KELVINDEX_BENCH_PROFILE_DIR}`);
  // Flags for the API's node (--trace-gc, --max-semi-space-size=…), to try a setting without a rebuild.
  if (process.env.KELVINDEX_BENCH_API_NODE_ARGS) args.unshift(...process.env.KELVINDEX_BENCH_API_NODE_ARGS.split(/\s+/).filter(Boolean));
  const child = spawn(process.execPath, args, { cwd: root, env, stdio: ['ignore', 'pipe', 'pipe'] });
  let output = '';
  child.stdout!.on('data', (chunk: Buffer) => (output += chunk.toString()));
  child.stderr!.on('data', (chunk: Buffer) => (output += chunk.toString()));
  // The API's own output (with NODE_OPTIONS=--trace-gc, say), kept in a file for a closer look.
  if (process.env.KELVINDEX_BENCH_API_LOG) {
    const log = createWriteStream(process.env.KELVINDEX_BENCH_API_LOG, { flags: 'a' });
    child.stdout!.pipe(log, { end: false });
    child.stderr!.pipe(log, { end: false });
  }
  const url = `http://127.0.0.1:${port}`;
  await waitForHealth(url, child, () => output);
  return {
    url,
    pid: child.pid!,
    rssMb: () => rssMb(child.pid!),
    stop: () => stopChild(child),
  };
}

async function waitForHealth(url: string, child: ChildProcess, output: () => string): Promise<void> {
  const deadline = Date.now() + 60_000;
  while (Date.now() < deadline) {
    if (child.exitCode !== null) throw new Error(`The API exited (${child.exitCode}) before it was ready:\n${output()}`);
    try {
      const answer = await fetch(`${url}/api/v1/health`);
      if (answer.ok) return;
    } catch {
      // not listening yet
    }
    await new Promise((resolve) => setTimeout(resolve, 200));
  }
  child.kill('SIGKILL');
  throw new Error(`The API did not answer /api/v1/health within 60 s:\n${output()}`);
}

export function rssMb(pid: number): number {
  try {
    const match = /VmRSS:\s+(\d+)\s+kB/.exec(readFileSync(`/proc/${pid}/status`, 'utf8'));
    return match ? Number(match[1]) / 1024 : Number.NaN;
  } catch {
    return Number.NaN;
  }
}

/** Samples a process's RSS every `intervalMs` until stopped; returns the samples (MB). */
export function sampleRss(pid: number, intervalMs = 100): { stop(): number[] } {
  const samples: number[] = [rssMb(pid)];
  const timer = setInterval(() => samples.push(rssMb(pid)), intervalMs);
  return {
    stop() {
      clearInterval(timer);
      samples.push(rssMb(pid));
      return samples.filter((s) => Number.isFinite(s));
    },
  };
}

function stopChild(child: ChildProcess): Promise<void> {
  if (child.exitCode !== null) return Promise.resolve();
  return new Promise((resolve) => {
    const timer = setTimeout(() => child.kill('SIGKILL'), 10_000);
    child.once('exit', () => {
      clearTimeout(timer);
      resolve();
    });
    child.kill('SIGTERM');
  });
}
