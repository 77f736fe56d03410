import { PostgresCluster, developmentClusterDir } from './postgres-cluster';

/**
 * Runs `work` against npm start's cluster, starting it for the duration when it is not running
 * (and leaving it running when it was).
 */
export async function withDevelopmentCluster<T>(work: (cluster: PostgresCluster) => Promise<T>): Promise<T> {
  const cluster = new PostgresCluster({ dir: developmentClusterDir(process.cwd()), port: Number(process.env.KELVINDEX_PG_PORT ?? 54329) });
  await cluster.ensureInstalled();
  await cluster.init();
  await cluster.start();
  try {
    await cluster.ensureDatabase();
    return await work(cluster);
  } finally {
    await cluster.stop();
  }
}
