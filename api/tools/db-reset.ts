import 'reflect-metadata';
import { rmSync } from 'node:fs';
import path from 'node:path';
import { loadConfig } from '../src/config';
import { PostgresCluster, developmentClusterDir } from './postgres-cluster';
import { prepareDatabase } from './prepare-database';

/** `npm run db:reset`: throws away npm start's cluster, captured mail and stored files, and migrates an empty database. */
async function main(): Promise<void> {
  if (process.env.DATABASE_URL) {
    throw new Error('DATABASE_URL is set: db:reset only resets the private development cluster; drop that database yourself.');
  }
  const projectDir = process.cwd();
  const cluster = new PostgresCluster({ dir: developmentClusterDir(projectDir), port: Number(process.env.KELVINDEX_PG_PORT ?? 54329) });
  await cluster.ensureInstalled();
  await cluster.destroy();
  rmSync(path.join(projectDir, '.data'), { recursive: true, force: true });
  await cluster.init();
  await cluster.start();
  try {
    await cluster.ensureDatabase();
    const config = loadConfig();
    config.databaseUrl = cluster.url();
    await prepareDatabase(config, { demo: false });
    console.log('The development database is empty and migrated; the next `npm start` loads the demo data again.');
  } finally {
    await cluster.stop();
  }
}

main().catch((error: Error) => {
  console.error(error.message);
  process.exit(1);
});
