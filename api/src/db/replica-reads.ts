import { createHash } from 'node:crypto';
import type { DataSource, EntityManager } from 'typeorm';

/**
 * Distinct statement texts that get a named prepared statement. The query API builds its SQL from
 * a fixed set of fragments, so the number of texts is small; the cap keeps a text that embeds a
 * literal by mistake from filling every connection's statement cache.
 */
const MAX_PREPARED_TEXTS = 500;
const preparedNames = new Map<string, string>();

/** The statement name of a text, or undefined once the cap is reached (the text then runs unnamed). */
export function preparedName(sql: string): string | undefined {
  let name = preparedNames.get(sql);
  if (name === undefined && preparedNames.size < MAX_PREPARED_TEXTS) {
    name = `kx_${createHash('sha1').update(sql).digest('hex').slice(0, 20)}`;
    preparedNames.set(sql, name);
  }
  return name;
}

interface PgClient {
  query(config: { name?: string; text: string; values?: unknown[] }): Promise<{ rows: unknown[] }>;
}

/**
 * The read side of the query API. Its services read with raw SQL (`dataSource.query`,
 * `manager.query`); through this view those reads:
 *
 * - run on a replica connection when replicas are configured (TypeORM sends only repository reads
 *   there by itself), falling back to the primary with the replica fallback;
 * - run as named prepared statements, so that PostgreSQL plans each statement text once per
 *   connection. Planning these joins costs several times more than executing them on an index.
 */
export function replicaReads(dataSource: DataSource): DataSource {
  const driver = dataSource.driver as unknown as { slaves?: unknown[] };
  const mode = driver.slaves?.length ? 'slave' : 'master';
  const read = async (sql: string, parameters?: unknown[]) => {
    const runner = dataSource.createQueryRunner(mode);
    try {
      const client = (await runner.connect()) as PgClient;
      const result = await client.query({ name: preparedName(sql), text: sql, values: parameters ?? [] });
      return result.rows;
    } finally {
      await runner.release();
    }
  };
  const manager = new Proxy(dataSource.manager, {
    get: (target, property, receiver) => (property === 'query' ? read : Reflect.get(target, property, receiver)),
  }) as EntityManager;
  return new Proxy(dataSource, {
    get: (target, property, receiver) => {
      if (property === 'query') return read;
      if (property === 'manager') return manager;
      return Reflect.get(target, property, receiver);
    },
  });
}
