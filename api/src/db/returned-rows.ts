import type { EntityManager } from 'typeorm';

/**
 * Runs SQL and returns its rows whatever the statement: TypeORM's `query()` answers UPDATE and
 * DELETE on PostgreSQL with `[rows, rowCount]` but SELECT and INSERT with the rows alone.
 */
export async function queryRows<T>(manager: EntityManager, sql: string, params: unknown[] = []): Promise<T[]> {
  const raw: unknown = await manager.query(sql, params);
  if (Array.isArray(raw) && raw.length === 2 && Array.isArray(raw[0]) && typeof raw[1] === 'number') return raw[0] as T[];
  return raw as T[];
}
