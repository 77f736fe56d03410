import { spawn, spawnSync, type SpawnOptions } from 'node:child_process';

export const isRoot = typeof process.getuid === 'function' && process.getuid() === 0;

/** Runs a command to completion, streaming its output; rejects with the exit code. */
export function run(command: string, args: string[], options: SpawnOptions = {}): Promise<void> {
  return new Promise((resolve, reject) => {
    const child = spawn(command, args, { stdio: 'inherit', ...options });
    child.once('error', reject);
    child.once('exit', (code, signal) => {
      if (code === 0) resolve();
      else reject(new Error(`${command} ${args.join(' ')} exited with ${signal ?? code}`));
    });
  });
}

/** Runs a short command and returns its output; throws with stderr when it fails. */
export function capture(command: string, args: string[], options: { env?: NodeJS.ProcessEnv } = {}): string {
  const result = spawnSync(command, args, { encoding: 'utf8', env: options.env ?? process.env });
  if (result.error) throw result.error;
  if (result.status !== 0) {
    throw new Error(`${command} ${args.join(' ')} failed: ${(result.stderr || result.stdout).trim()}`);
  }
  return result.stdout;
}

export function commandExists(command: string): boolean {
  return spawnSync('sh', ['-c', `command -v ${command}`], { stdio: 'ignore' }).status === 0;
}

let aptUpdated = false;

/** Installs Debian packages when we may (root with apt-get); otherwise explains what to run. */
export async function aptInstall(packages: string[], why: string): Promise<void> {
  const command = `apt-get update && apt-get install -y ${packages.join(' ')}`;
  if (!isRoot || !commandExists('apt-get')) {
    throw new Error(`${why} is missing. Install it as root with:\n  ${command}`);
  }
  console.log(`Installing ${packages.join(', ')} with apt-get (${why})…`);
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  if (!aptUpdated) {
    await run('apt-get', ['update', '-q'], { env, stdio: ['ignore', 'ignore', 'inherit'] });
    aptUpdated = true;
  }
  await run('apt-get', ['install', '-y', '-q', '--no-install-recommends', ...packages], {
    env,
    stdio: ['ignore', 'ignore', 'inherit'],
  });
}
