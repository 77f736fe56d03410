import path from 'node:path';
import { ownCluster, ownConfig, migrateWithDemo, waitFor } from './own-cluster';
import { anyFreePort } from '../../api/tools/free-port';
import { startServer, type RunningServer } from '../../api/src/server';
import { DEMO_PASSWORD } from '../../seeds-demo/demo-accounts';
import type { PostgresCluster } from '../../api/tools/postgres-cluster';
import { User } from '../../api/src/accounts/user.entity';

describe('reads on a streaming replica', () => {
  let own: Awaited<ReturnType<typeof ownCluster>>;
  let replica: PostgresCluster;
  let server: RunningServer;

  beforeAll(async () => {
    own = await ownCluster('replica');
    const config = await ownConfig(own.cluster.url());
    await migrateWithDemo(config);
    replica = await own.cluster.createReplica(path.join(own.root, 'replica'), await anyFreePort());
    await replica.start();
    server = await startServer({ ...config, databaseReplicaUrls: [replica.url()] });
  }, 180_000);

  afterAll(async () => {
    await server?.close().catch(() => undefined);
    await replica?.destroy().catch(() => undefined);
    await own?.cleanup();
  }, 60_000);

  // The replica's own view of its sessions: a client whose last statement was the users read.
  const usersReadsOnReplica = () =>
    Number(replica.psql(`SELECT count(*) FROM pg_stat_activity WHERE datname = 'kelvindex' AND query LIKE '%FROM "users"%'`).trim());

  it('really is a replica: in recovery and read-only', () => {
    expect(replica.psql('SELECT pg_is_in_recovery()').trim()).toBe('t');
  });

  it('sends reads to the replica and writes to the primary', async () => {
    expect(usersReadsOnReplica()).toBe(0);
    // A repository read outside a transaction: TypeORM routes it to a replica.
    const users = await server.dataSource.getRepository(User).find();
    expect(users.length).toBeGreaterThan(0);
    expect(usersReadsOnReplica()).toBeGreaterThan(0);

    // Signing in writes (last sign-in time, audit line): the replica would refuse, so it went to the primary.
    const res = await fetch(`${server.url}/api/v1/auth/login`, {
      method: 'POST',
      headers: { 'Content-Type': 'application/json' },
      body: JSON.stringify({ email: 'reader@kelvindex.test', password: DEMO_PASSWORD }),
    });
    expect(res.status).toBe(200);
    const replicated = await waitFor(async () => replica.psql(`SELECT count(*) FROM audit_entries WHERE action = 'auth.sign_in'`, 'kelvindex').trim() !== '0', 10_000);
    expect(replicated).toBeTrue();
  }, 60_000);

  it('answers the query API (raw SQL reads) from the replica too', async () => {
    const search = await fetch(`${server.url}/api/v1/species?formula=H2O`);
    expect(search.status).toBe(200);
    expect(((await search.json()) as { total: number }).total).toBeGreaterThan(0);
    const onReplica = Number(replica.psql(`SELECT count(*) FROM pg_stat_activity WHERE datname = 'kelvindex' AND query ILIKE '%species%'`).trim());
    expect(onReplica).toBeGreaterThan(0);
  }, 60_000);

  it('keeps serving reads from the primary when the replica goes away', async () => {
    await replica.stop(false);
    const users = await server.dataSource.getRepository(User).find();
    expect(users.length).toBeGreaterThan(0);
    const search = await fetch(`${server.url}/api/v1/species?formula=CO2`);
    expect(search.status).toBe(200);
    const res = await fetch(`${server.url}/api/v1/auth/login`, {
      method: 'POST',
      headers: { 'Content-Type': 'application/json' },
      body: JSON.stringify({ email: 'reader@kelvindex.test', password: DEMO_PASSWORD }),
    });
    expect(res.status).toBe(200);
  }, 60_000);
});
