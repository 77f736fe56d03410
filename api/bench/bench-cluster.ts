import { chmodSync, mkdirSync } from 'node:fs';
import path from 'node:path';
import { Client } from 'pg';
import { PostgresCluster } from '../tools/postgres-cluster';
import { isRoot } from '../tools/shell';

/**
 * The benchmark's own PostgreSQL cluster: its own folder and fixed port, never npm start's
 * (54329) or npm test's throwaway clusters, so that a 100 000-species data set survives between
 * runs and nothing else ever touches it.
 */
export const BENCH_PG_PORT = Number(process.env.KELVINDEX_BENCH_PG_PORT ?? 54339);

/**
 * Settings of a modest production server (the defaults are sized for a laptop); applied once,
 * when the cluster is created. fsync stays on: the figures are for a real, durable database.
 */
const SERVER_SETTINGS: Record<string, string> = {
  shared_buffers: '512MB',
  max_wal_size: '8GB',
  checkpoint_timeout: '30min',
  effective_cache_size: '4GB',
  random_page_cost: '1.1',
};

export function benchClusterDir(projectDir = process.cwd()): string {
  if (process.env.KELVINDEX_BENCH_PG_DIR) return process.env.KELVINDEX_BENCH_PG_DIR;
  if (!isRoot) return path.join(projectDir, '.data', 'bench-pg');
  const parent = '/var/lib/kelvindex';
  mkdirSync(parent, { recursive: true, mode: 0o755 });
  chmodSync(parent, 0o755);
  return path.join(parent, 'bench');
}

export interface BenchCluster {
  cluster: PostgresCluster;
  url: string;
  /** stops the cluster when this process started it */
  stop(): Promise<void>;
}

/** Creates (first time), tunes and starts the bench cluster, with the application role and database. */
export async function startBenchCluster(): Promise<BenchCluster> {
  const cluster = new PostgresCluster({ dir: benchClusterDir(), port: BENCH_PG_PORT });
  await cluster.ensureInstalled();
  await cluster.init();
  await cluster.start();
  const changed = Object.entries(SERVER_SETTINGS).filter(([name, value]) => cluster.psql(`SELECT current_setting('${name}')`).trim() !== value);
  if (changed.length > 0) {
    for (const [name, value] of changed) cluster.psql(`ALTER SYSTEM SET ${name} = '${value}'`);
    console.log(`Bench cluster: setting ${changed.map(([n, v]) => `${n}=${v}`).join(', ')} (restart).`);
    await cluster.stop(false);
    await cluster.start();
  }
  await cluster.ensureDatabase();
  return { cluster, url: cluster.url(), stop: () => cluster.stop() };
}

/** What the generator leaves in the database's comment once a data set is completely loaded. */
export interface BenchMarker {
  generator: number;
  seed: string;
  species: number;
  generatedAt: string;
  rows: Record<string, number>;
  loadSeconds: number;
  /** rows of every table over the load time */
  rowsPerSecond: number;
  tables?: { table: string; rows: number; seconds: number }[];
}

export async function readMarker(url: string): Promise<BenchMarker | null> {
  const client = new Client({ connectionString: url });
  await client.connect();
  try {
    const { rows } = await client.query(`SELECT shobj_description(oid, 'pg_database') AS comment FROM pg_database WHERE datname = current_database()`);
    const parsed = rows[0]?.comment ? JSON.parse(rows[0].comment) : null;
    return parsed?.kelvindexBench ?? null;
  } catch {
    return null;
  } finally {
    await client.end();
  }
}

export async function writeMarker(client: Client, marker: BenchMarker): Promise<void> {
  const text = JSON.stringify({ kelvindexBench: marker }).replace(/'/g, "''");
  await client.query(`COMMENT ON DATABASE ${client.database} IS '${text}'`);
}

/** Throws the bench database away (the next load starts from an empty schema). */
export async function recreateDatabase(bench: BenchCluster): Promise<void> {
  const database = new URL(bench.url).pathname.slice(1);
  bench.cluster.psql(`DROP DATABASE IF EXISTS ${database} WITH (FORCE)`);
  await bench.cluster.ensureDatabase(database);
}
