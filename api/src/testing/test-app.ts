import type { Express } from 'express';
import type { DataSource } from 'typeorm';
import { createApp } from '../app';
import { loadConfig, type AppConfig } from '../config';
import { createDataSource } from '../db/data-source';
import { ObjectStore } from '../storage/object-store';
import { MailQueue } from '../mail/mail-queue';

export interface TestApp {
  app: Express;
  dataSource: DataSource;
  config: AppConfig;
  store: ObjectStore;
  mail: MailQueue;
}

let shared: Promise<TestApp> | undefined;

/**
 * One app per spec process, wired to the real PostgreSQL database (DATABASE_URL) and the local
 * object store that `npm test` started; the database is migrated and holds the demo data.
 */
export function testApp(): Promise<TestApp> {
  shared ??= (async () => {
    if (!process.env.DATABASE_URL) throw new Error('DATABASE_URL is not set: run the API specs through `npm test`');
    const config = loadConfig();
    const dataSource = createDataSource(config.databaseUrl);
    await dataSource.initialize();
    const store = new ObjectStore(config.s3);
    const mail = new MailQueue(config);
    await mail.start();
    return { app: createApp({ config, dataSource, store, mail }), dataSource, config, store, mail };
  })();
  return shared;
}
