import type { DataSource, EntityManager } from 'typeorm';

/**
 * TypeORM sends repository reads to a replica but runs raw SQL (`dataSource.query`,
 * `manager.query`) on the primary. The query API reads with raw SQL, so its services get this
 * view of the data source, whose raw queries run on a replica connection (and fall back to the
 * primary with the replica fallback). Without replicas it is the data source itself.
 */
export function replicaReads(dataSource: DataSource): DataSource {
  const driver = dataSource.driver as unknown as { slaves?: unknown[] };
  if (!driver.slaves?.length) return dataSource;
  const onReplica = async (sql: string, parameters?: unknown[]) => {
    const runner = dataSource.createQueryRunner('slave');
    try {
      return await runner.query(sql, parameters);
    } finally {
      await runner.release();
    }
  };
  const manager = new Proxy(dataSource.manager, {
    get: (target, property, receiver) => (property === 'query' ? onReplica : Reflect.get(target, property, receiver)),
  }) as EntityManager;
  return new Proxy(dataSource, {
    get: (target, property, receiver) => {
      if (property === 'query') return onReplica;
      if (property === 'manager') return manager;
      return Reflect.get(target, property, receiver);
    },
  });
}
