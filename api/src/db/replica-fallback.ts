import type { DataSource } from 'typeorm';

type Connection = [unknown, () => void];
interface ReplicatingDriver {
  slaves: unknown[];
  obtainSlaveConnection(): Promise<Connection>;
  obtainMasterConnection(): Promise<Connection>;
}

const UNREACHABLE = new Set(['ECONNREFUSED', 'ECONNRESET', 'ETIMEDOUT', 'EHOSTUNREACH', '57P01', '57P03']);

/**
 * TypeORM sends reads to a random replica and fails when that replica is down. A replica that
 * cannot be reached should cost nothing but speed, so its reads go to the primary instead.
 */
export function fallBackToPrimaryWhenReplicaIsDown(dataSource: DataSource): void {
  const driver = dataSource.driver as unknown as ReplicatingDriver;
  if (!Array.isArray(driver.slaves) || driver.slaves.length === 0) return;
  const fromReplica = driver.obtainSlaveConnection.bind(driver);
  driver.obtainSlaveConnection = async () => {
    try {
      return await fromReplica();
    } catch (error) {
      const code = (error as { code?: string }).code ?? '';
      const timedOut = /timeout|terminated/i.test((error as Error).message ?? '');
      if (!UNREACHABLE.has(code) && !timedOut) throw error;
      return driver.obtainMasterConnection();
    }
  };
}
