import 'reflect-metadata';
import { createDataSource } from '../src/db/data-source';
import { ObjectStore } from '../src/storage/object-store';
import type { AppConfig } from '../src/config';
import { loadDemoData } from '../../seeds-demo/load-demo';

/** Brings the schema up to date and, when asked, loads the demo data (idempotent). */
export async function prepareDatabase(config: AppConfig, options: { demo: boolean }): Promise<void> {
  const dataSource = createDataSource(config.databaseUrl);
  await dataSource.initialize();
  try {
    const applied = await dataSource.runMigrations({ transaction: 'each' });
    console.log(applied.length ? `Applied ${applied.length} migration(s): ${applied.map((m) => m.name).join(', ')}` : 'Schema is up to date.');
    if (options.demo) {
      const started = Date.now();
      const store = new ObjectStore(config.s3);
      try {
        await store.ensureBucket();
        await loadDemoData(dataSource, store);
      } finally {
        store.destroy();
      }
      console.log(`Demo data ready (${((Date.now() - started) / 1000).toFixed(1)} s).`);
    }
  } finally {
    await dataSource.destroy();
  }
}
