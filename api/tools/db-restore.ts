import { existsSync } from 'node:fs';
import path from 'node:path';
import { withDevelopmentCluster } from './development-cluster';
import { restoreDatabase } from './backup';

/**
 * `npm run db:restore -- file`: replaces the development database with a backup. The restore goes
 * into a new database first and is swapped in only when it succeeded, so a bad file loses nothing.
 */
async function main(): Promise<void> {
  const arg = process.argv[3];
  if (!arg) throw new Error('Say which backup to restore: npm run db:restore -- path/to/file.dump');
  const file = path.resolve(arg);
  if (!existsSync(file)) throw new Error(`No such file: ${file}`);
  await withDevelopmentCluster(async (cluster) => {
    cluster.psql('DROP DATABASE IF EXISTS kelvindex_restoring');
    cluster.psql('CREATE DATABASE kelvindex_restoring OWNER kelvindex');
    await restoreDatabase(cluster.bin('pg_restore'), cluster.url('kelvindex_restoring'), file);
    cluster.psql(`SELECT pg_terminate_backend(pid) FROM pg_stat_activity WHERE datname = 'kelvindex' AND pid <> pg_backend_pid()`);
    cluster.psql('DROP DATABASE IF EXISTS kelvindex_before_restore');
    cluster.psql('ALTER DATABASE kelvindex RENAME TO kelvindex_before_restore');
    cluster.psql('ALTER DATABASE kelvindex_restoring RENAME TO kelvindex');
  });
  console.log(`Restored ${file}. The previous database is kept as kelvindex_before_restore until the next restore.`);
}

main().catch((error: Error) => {
  console.error(`Restore failed: ${error.message}`);
  process.exit(1);
});
