import { run } from './shell';

/** pg_dump in the custom format: compressed, and pg_restore can pick it apart. */
export function backupDatabase(pgDump: string, databaseUrl: string, file: string): Promise<void> {
  return run(pgDump, ['--format=custom', '--no-owner', '--file', file, '--dbname', databaseUrl]);
}

/**
 * Restores a dump into an empty database (the caller creates it), in one transaction so a broken
 * dump leaves nothing half-restored.
 */
export function restoreDatabase(pgRestore: string, databaseUrl: string, file: string): Promise<void> {
  return run(pgRestore, ['--no-owner', '--single-transaction', '--exit-on-error', '--dbname', databaseUrl, file]);
}
