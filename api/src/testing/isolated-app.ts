import { randomBytes } from 'node:crypto';
import type { Express } from 'express';
import type { DataSource } from 'typeorm';
import { createApp } from '../app';
import { loadConfig, type AppConfig } from '../config';
import { createDataSource } from '../db/data-source';
import { databaseUrl, sharedDataSource } from '../db/test-database';
import { ImportsService } from '../imports/imports.service';
import { loadDemoData } from '../../../seeds-demo/load-demo';
import { testApp } from './test-app';

export interface IsolatedApp {
  app: Express;
  dataSource: DataSource;
  config: AppConfig;
  /** waits for background work (imports), closes the connections and drops the database */
  close(): Promise<void>;
}

/**
 * The app on a database of its own (same cluster): migrated and loaded with the demo data, for
 * specs that change what other specs read (publishing a release, a 100 000-row import). Sign-ins
 * from `bearerFor` work here too: demo users have the same ids in every load. The object store
 * and the mail queue are the shared test ones.
 */
export async function isolatedTestApp(overrides: Partial<AppConfig> = {}): Promise<IsolatedApp> {
  const shared = await testApp();
  const admin = await sharedDataSource();
  const name = `kx_iso_${process.pid}_${randomBytes(3).toString('hex')}`;
  await admin.query(`CREATE DATABASE ${name}`);
  const url = new URL(databaseUrl());
  url.pathname = `/${name}`;
  const config: AppConfig = { ...loadConfig(), ...overrides, databaseUrl: url.toString() };
  const dataSource = createDataSource(config.databaseUrl);
  try {
    await dataSource.initialize();
    await dataSource.runMigrations({ transaction: 'each' });
    await loadDemoData(dataSource, shared.store);
  } catch (error) {
    if (dataSource.isInitialized) await dataSource.destroy();
    await admin.query(`DROP DATABASE IF EXISTS ${name} WITH (FORCE)`);
    throw error;
  }
  const app = createApp({ config, dataSource, store: shared.store, mail: shared.mail });
  return {
    app,
    dataSource,
    config,
    async close() {
      await Promise.allSettled([...ImportsService.running.values()]);
      if (dataSource.isInitialized) await dataSource.destroy();
      await admin.query(`DROP DATABASE IF EXISTS ${name} WITH (FORCE)`);
    },
  };
}
