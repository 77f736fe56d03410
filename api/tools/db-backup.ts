import { mkdirSync } from 'node:fs';
import path from 'node:path';
import { withDevelopmentCluster } from './development-cluster';
import { backupDatabase } from './backup';

/** `npm run db:backup [-- file]`: a pg_dump of the development database (default .data/backups/<time>.dump). */
async function main(): Promise<void> {
  const stamp = new Date().toISOString().replace(/[:.]/g, '-');
  const file = path.resolve(process.argv[3] ?? path.join('.data', 'backups', `kelvindex-${stamp}.dump`));
  mkdirSync(path.dirname(file), { recursive: true });
  await withDevelopmentCluster((cluster) => backupDatabase(cluster.bin('pg_dump'), process.env.DATABASE_URL ?? cluster.url(), file));
  console.log(`Backup written to ${file}`);
}

main().catch((error: Error) => {
  console.error(`Backup failed: ${error.message}`);
  process.exit(1);
});
