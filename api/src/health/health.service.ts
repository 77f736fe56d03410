import type { DataSource } from 'typeorm';
import { APP_VERSION } from '../version';

export interface HealthReport {
  status: 'ok' | 'degraded';
  database: 'up' | 'down';
  version: string;
}

export async function checkHealth(dataSource: DataSource, timeoutMs = 2000): Promise<HealthReport> {
  const up = await pingDatabase(dataSource, timeoutMs);
  return { status: up ? 'ok' : 'degraded', database: up ? 'up' : 'down', version: APP_VERSION };
}

async function pingDatabase(dataSource: DataSource, timeoutMs: number): Promise<boolean> {
  if (!dataSource.isInitialized) return false;
  let timer: NodeJS.Timeout | undefined;
  const timeout = new Promise<boolean>((resolve) => {
    timer = setTimeout(() => resolve(false), timeoutMs);
  });
  const ping = dataSource.query('SELECT 1').then(
    () => true,
    () => false,
  );
  try {
    return await Promise.race([ping, timeout]);
  } finally {
    clearTimeout(timer);
  }
}
