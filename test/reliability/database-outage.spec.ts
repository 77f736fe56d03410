import { ownCluster, ownConfig, migrateWithDemo, waitFor } from './own-cluster';
import { startServer, type RunningServer } from '../../api/src/server';
import { DEMO_PASSWORD } from '../../seeds-demo/demo-accounts';
import type { PostgresCluster } from '../../api/tools/postgres-cluster';

describe('PostgreSQL stops while the API serves', () => {
  let own: Awaited<ReturnType<typeof ownCluster>>;
  let cluster: PostgresCluster;
  let server: RunningServer;

  beforeAll(async () => {
    own = await ownCluster('outage');
    cluster = own.cluster;
    const config = await ownConfig(cluster.url());
    await migrateWithDemo(config);
    server = await startServer(config);
  }, 120_000);

  afterAll(async () => {
    await server?.close().catch(() => undefined);
    await own?.cleanup();
  }, 60_000);

  const signIn = () =>
    fetch(`${server.url}/api/v1/auth/login`, {
      method: 'POST',
      headers: { 'Content-Type': 'application/json' },
      body: JSON.stringify({ email: 'reader@kelvindex.test', password: DEMO_PASSWORD }),
    });

  it('answers 503 with a clear message while the database is down, and recovers without a restart', async () => {
    expect((await fetch(`${server.url}/api/v1/health`)).status).toBe(200);
    expect((await signIn()).status).toBe(200);

    await cluster.stop(false);

    const health = await fetch(`${server.url}/api/v1/health`);
    expect(health.status).toBe(503);
    expect(((await health.json()) as { database: string }).database).toBe('down');
    const during = await signIn();
    expect(during.status).toBe(503);
    expect(((await during.json()) as { message: string }).message).toContain('database is unreachable');

    await cluster.start();
    const recovered = await waitFor(async () => (await fetch(`${server.url}/api/v1/health`)).status === 200, 20_000);
    expect(recovered).toBeTrue();
    expect((await signIn()).status).toBe(200);
  }, 90_000);
});
