import { mkdtempSync, chmodSync, rmSync } from 'node:fs';
import path from 'node:path';
import { PostgresCluster } from '../../api/tools/postgres-cluster';
import { anyFreePort } from '../../api/tools/free-port';
import { prepareDatabase } from '../../api/tools/prepare-database';
import { loadConfig, type AppConfig } from '../../api/src/config';

/** A cluster of the spec's own, so stopping PostgreSQL or adding replicas cannot disturb other suites. */
export async function ownCluster(name: string): Promise<{ cluster: PostgresCluster; root: string; cleanup(): Promise<void> }> {
  const root = mkdtempSync(path.join('/tmp', `kx${name}-`));
  chmodSync(root, 0o755);
  const cluster = new PostgresCluster({ dir: path.join(root, 'primary'), port: await anyFreePort(), throwaway: true });
  await cluster.ensureInstalled();
  await cluster.init();
  await cluster.start();
  await cluster.ensureDatabase();
  return {
    cluster,
    root,
    async cleanup() {
      await cluster.destroy();
      rmSync(root, { recursive: true, force: true });
    },
  };
}

/**
 * App settings for a server of the spec's own, against `databaseUrl`, on the port the kernel
 * chooses as it starts listening (a port chosen earlier could be taken meanwhile, by a client
 * connection's ephemeral port for one).
 */
export async function ownConfig(databaseUrl: string, extra: Partial<AppConfig> = {}): Promise<AppConfig> {
  const config = loadConfig({ ...process.env, PORT: '0' });
  return { ...config, databaseUrl, ...extra };
}

export async function migrateWithDemo(config: AppConfig): Promise<void> {
  await prepareDatabase(config, { demo: true });
}

export async function waitFor(check: () => Promise<boolean>, timeoutMs: number): Promise<boolean> {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    if (await check().catch(() => false)) return true;
    await new Promise((r) => setTimeout(r, 250));
  }
  return false;
}
