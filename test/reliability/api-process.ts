import { spawn, type ChildProcess } from 'node:child_process';
import path from 'node:path';
import { waitFor } from './own-cluster';

/** The API as its own process (as in production), so a spec can kill it outright. */
export async function startApiProcess(databaseUrl: string, port: number): Promise<{ child: ChildProcess; url: string }> {
  const child = spawn(process.execPath, [path.resolve('dist/server/api/src/main.js')], {
    env: { ...process.env, DATABASE_URL: databaseUrl, PORT: String(port), NODE_ENV: 'production' },
    stdio: ['ignore', 'ignore', 'inherit'],
  });
  const url = `http://127.0.0.1:${port}`;
  const up = await waitFor(async () => (await fetch(`${url}/api/v1/health`)).status === 200, 30_000);
  if (!up) {
    child.kill('SIGKILL');
    throw new Error('the API process did not come up');
  }
  return { child, url };
}

export function killHard(child: ChildProcess): Promise<void> {
  return new Promise((resolve) => {
    if (child.exitCode !== null || child.signalCode !== null) return resolve();
    child.once('exit', () => resolve());
    child.kill('SIGKILL');
  });
}
