import path from 'node:path';
import { ownCluster, ownConfig, migrateWithDemo } from './own-cluster';
import { anyFreePort } from '../../api/tools/free-port';
import { PostgresCluster } from '../../api/tools/postgres-cluster';
import { backupDatabase, restoreDatabase } from '../../api/tools/backup';
import { startServer, type RunningServer } from '../../api/src/server';

const FORMATS = ['csv', 'json', 'xml', 'nasa7'];

async function exportsOfEveryRelease(server: RunningServer): Promise<Map<string, Buffer>> {
  const releases = (await (await fetch(`${server.url}/api/v1/releases`)).json()) as { items: { label: string; status: string }[] };
  const published = releases.items.filter((r) => r.status === 'published');
  const out = new Map<string, Buffer>();
  for (const release of published) {
    for (const format of FORMATS) {
      const res = await fetch(`${server.url}/api/v1/export?format=${format}&release=${release.label}`);
      if (res.status !== 200) throw new Error(`export ${format} of ${release.label} answered ${res.status}`);
      out.set(`${release.label}.${format}`, Buffer.from(await res.arrayBuffer()));
    }
  }
  return out;
}

describe('backup and restore', () => {
  let own: Awaited<ReturnType<typeof ownCluster>>;
  let restored: PostgresCluster;

  beforeAll(async () => {
    own = await ownCluster('backup');
  }, 60_000);

  afterAll(async () => {
    await restored?.destroy().catch(() => undefined);
    await own?.cleanup();
  }, 60_000);

  it('restores a pg_dump into a fresh cluster where every release exports byte-for-byte as before', async () => {
    const config = await ownConfig(own.cluster.url());
    await migrateWithDemo(config);
    const original = await startServer(config);
    let before: Map<string, Buffer>;
    try {
      before = await exportsOfEveryRelease(original);
    } finally {
      await original.close();
    }
    expect(before.size).toBeGreaterThanOrEqual(2 * FORMATS.length);

    const dump = path.join(own.root, 'kelvindex.dump');
    await backupDatabase(own.cluster.bin('pg_dump'), own.cluster.url(), dump);

    restored = new PostgresCluster({ dir: path.join(own.root, 'restored'), port: await anyFreePort(), throwaway: true });
    await restored.ensureInstalled();
    await restored.init();
    await restored.start();
    await restored.ensureDatabase();
    await restoreDatabase(restored.bin('pg_restore'), restored.url(), dump);

    const copy = await startServer(await ownConfig(restored.url()));
    try {
      const after = await exportsOfEveryRelease(copy);
      expect([...after.keys()]).toEqual([...before.keys()]);
      for (const [name, bytes] of before) {
        expect(after.get(name)!.equals(bytes)).withContext(name).toBeTrue();
      }
    } finally {
      await copy.close();
    }
  }, 180_000);
});
