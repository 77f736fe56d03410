import path from 'node:path';
import { run } from './shell';

/** Runs the Angular CLI from node_modules without prompts (no analytics question on a fresh machine). */
export function ng(args: string[], env: NodeJS.ProcessEnv = process.env): Promise<void> {
  const cli = path.resolve('node_modules/@angular/cli/bin/ng.js');
  return run(process.execPath, [cli, ...args], { env: { ...env, NG_CLI_ANALYTICS: 'false' } });
}
