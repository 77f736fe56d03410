import 'reflect-metadata';
import { randomBytes } from 'node:crypto';
import { DataSource, type EntityManager } from 'typeorm';
import { dataSourceOptions } from './data-source';

/**
 * Database helpers for specs that run against the real PostgreSQL of DATABASE_URL.
 *
 * - `inRolledBackTransaction`: the spec's writes vanish at the end, so the shared, migrated and
 *   seeded database is exactly as before for every other spec.
 * - `attempt`: runs one statement inside a savepoint and returns the error it raised (or undefined),
 *   so a spec can try many refused statements in one transaction.
 * - `withScratchDatabase`: a fresh, empty database on the same cluster (the role may create
 *   databases), for specs that need to migrate from nothing; dropped afterwards.
 */

let shared: Promise<DataSource> | undefined;

export function databaseUrl(): string {
  const url = process.env.DATABASE_URL;
  if (!url) throw new Error('DATABASE_URL is not set: the database specs need a migrated PostgreSQL (run them through `npm test`)');
  return url;
}

/** One initialised data source per spec process, on DATABASE_URL. */
export function sharedDataSource(): Promise<DataSource> {
  shared ??= (async () => {
    const dataSource = quietDataSource(databaseUrl());
    await dataSource.initialize();
    return dataSource;
  })();
  return shared;
}

/** The application's data source settings, without logging: refused statements are expected in these specs. */
function quietDataSource(url: string): DataSource {
  return new DataSource({ ...dataSourceOptions(url), logging: false });
}

/** Runs `work` in a transaction that is always rolled back. */
export async function inRolledBackTransaction<T>(work: (manager: EntityManager) => Promise<T>): Promise<T> {
  const dataSource = await sharedDataSource();
  const runner = dataSource.createQueryRunner();
  await runner.connect();
  await runner.startTransaction();
  try {
    return await work(runner.manager);
  } finally {
    await runner.rollbackTransaction();
    await runner.release();
  }
}

/** What PostgreSQL said when it refused a statement. */
export interface DatabaseRefusal {
  code: string;
  constraint?: string;
  message: string;
  /** the original error, for translateDatabaseError */
  error: unknown;
}

/**
 * Runs one statement in a savepoint; returns the refusal, or undefined when it succeeded.
 * Takes SQL text or a function using the manager.
 */
export async function attempt(manager: EntityManager, statement: string | (() => Promise<unknown>), params: unknown[] = []): Promise<DatabaseRefusal | undefined> {
  const savepoint = `attempt_${randomBytes(4).toString('hex')}`;
  await manager.query(`SAVEPOINT ${savepoint}`);
  try {
    if (typeof statement === 'string') await manager.query(statement, params);
    else await statement();
    await manager.query(`RELEASE SAVEPOINT ${savepoint}`);
    return undefined;
  } catch (error) {
    await manager.query(`ROLLBACK TO SAVEPOINT ${savepoint}`);
    const pg = ((error as { driverError?: unknown }).driverError ?? error) as { code?: string; constraint?: string; message?: string };
    return { code: pg.code ?? '', constraint: pg.constraint, message: pg.message ?? String(error), error };
  }
}

/** A fresh, empty database on DATABASE_URL's cluster, with an (unmigrated) data source on it. */
export interface ScratchDatabase {
  dataSource: DataSource;
  url: string;
  /** closes the data source and drops the database */
  drop(): Promise<void>;
}

export async function createScratchDatabase(): Promise<ScratchDatabase> {
  const admin = await sharedDataSource();
  const name = `kx_scratch_${process.pid}_${randomBytes(3).toString('hex')}`;
  await admin.query(`CREATE DATABASE ${name}`);
  const url = new URL(databaseUrl());
  url.pathname = `/${name}`;
  const dataSource = quietDataSource(url.toString());
  const drop = async () => {
    if (dataSource.isInitialized) await dataSource.destroy();
    await admin.query(`DROP DATABASE IF EXISTS ${name} WITH (FORCE)`);
  };
  try {
    await dataSource.initialize();
  } catch (error) {
    await drop();
    throw error;
  }
  return { dataSource, url: url.toString(), drop };
}

/** Runs `work` on a scratch database and drops it afterwards. */
export async function withScratchDatabase<T>(work: (dataSource: DataSource, url: string) => Promise<T>): Promise<T> {
  const scratch = await createScratchDatabase();
  try {
    return await work(scratch.dataSource, scratch.url);
  } finally {
    await scratch.drop();
  }
}
