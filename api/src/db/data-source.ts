import 'reflect-metadata';
import path from 'node:path';
import { DataSource, DataSourceOptions } from 'typeorm';
import { GuardedClient } from './guarded-client';
import { fallBackToPrimaryWhenReplicaIsDown } from './replica-fallback';

/** dist/server/api/src/db → dist/server */
const compiledRoot = path.resolve(__dirname, '../../..');

export function dataSourceOptions(databaseUrl: string, replicaUrls: string[] = []): DataSourceOptions {
  const common = {
    type: 'postgres' as const,
    entities: [path.join(compiledRoot, 'api/src/**/*.entity.js')],
    migrations: [path.join(compiledRoot, 'migrations/*.js')],
    migrationsTableName: 'schema_migrations',
    synchronize: false,
    logging: ['error' as const],
    // Every pooled client keeps an 'error' listener (guarded-client.ts).
    extra: { max: 20, connectionTimeoutMillis: 5000, Client: GuardedClient },
  };
  if (replicaUrls.length === 0) return { ...common, url: databaseUrl };
  return {
    ...common,
    replication: { master: { url: databaseUrl }, slaves: replicaUrls.map((url) => ({ url, connectTimeoutMS: 1000 })) },
  };
}

export function createDataSource(databaseUrl: string, replicaUrls: string[] = []): DataSource {
  return new DataSource(dataSourceOptions(databaseUrl, replicaUrls));
}

/** Connects, with reads falling back to the primary when a replica is unreachable. */
export async function openDataSource(databaseUrl: string, replicaUrls: string[] = []): Promise<DataSource> {
  const dataSource = createDataSource(databaseUrl, replicaUrls);
  await dataSource.initialize();
  fallBackToPrimaryWhenReplicaIsDown(dataSource);
  return dataSource;
}
