import { readFileSync } from 'node:fs';
import path from 'node:path';

function readVersion(): string {
  // Works from api/src (ts) and dist/server/api/src (js): walk up to the package.json.
  for (const up of ['../..', '../../../..']) {
    try {
      return JSON.parse(readFileSync(path.resolve(__dirname, up, 'package.json'), 'utf8')).version as string;
    } catch {
      // try the next level
    }
  }
  return '0.0.0';
}

export const APP_VERSION = readVersion();
