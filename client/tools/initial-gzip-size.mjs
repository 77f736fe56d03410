#!/usr/bin/env node
// Measures what a reader downloads before the first page shows: the initial JS and CSS named in
// the built index.html, gzip-compressed at level 6 (the default of common servers). Angular's
// budgets measure raw bytes and its build table estimates brotli, so this checks the product
// target itself: at most 180 kB (180 000 bytes) gzip. Usage, after `npx ng build`:
//   node client/tools/initial-gzip-size.mjs [dist/client/browser]
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { gzipSync } from 'node:zlib';

const LIMIT_BYTES = 180_000;
const browserDir = process.argv[2] ?? 'dist/client/browser';
const indexHtml = readFileSync(join(browserDir, 'index.html'), 'utf8');

const initialFiles = new Set();
for (const tag of indexHtml.match(/<(script|link)\b[^>]*>/g) ?? []) {
  const isScript = tag.startsWith('<script');
  const isStyleOrPreload = /rel="(stylesheet|modulepreload)"/.test(tag);
  const url = /(?:src|href)="([^"]+\.(?:js|css))"/.exec(tag)?.[1];
  if (url && (isScript || isStyleOrPreload) && !/^[a-z]+:|^\/\//i.test(url)) {
    initialFiles.add(url.replace(/^\//, ''));
  }
}

let raw = 0;
let gzip = 0;
for (const file of [...initialFiles].sort()) {
  const contents = readFileSync(join(browserDir, file));
  const compressed = gzipSync(contents, { level: 6 }).length;
  raw += contents.length;
  gzip += compressed;
  console.log(`${file.padEnd(28)} ${(contents.length / 1000).toFixed(2).padStart(9)} kB raw ${(compressed / 1000).toFixed(2).padStart(8)} kB gzip`);
}
console.log(`${'initial total'.padEnd(28)} ${(raw / 1000).toFixed(2).padStart(9)} kB raw ${(gzip / 1000).toFixed(2).padStart(8)} kB gzip (raw/gzip ${(raw / gzip).toFixed(2)})`);

if (gzip > LIMIT_BYTES) {
  console.error(`Initial download ${(gzip / 1000).toFixed(2)} kB gzip exceeds the ${LIMIT_BYTES / 1000} kB target.`);
  process.exit(1);
}
