import { ownCluster, ownConfig, migrateWithDemo, waitFor } from './own-cluster';
import { startApiProcess, killHard } from './api-process';
import { anyFreePort } from '../../api/tools/free-port';
import { DEMO_PASSWORD } from '../../seeds-demo/demo-accounts';

const ROWS = 30_000;

/** Heat-capacity points of water vapour at distinct temperatures: every row is valid and unique. */
function importFile(): string {
  const lines = ['formula,name,phase,quantity,value,unit,uncertainty,temperature,pressure,method,sourceKey'];
  for (let i = 0; i < ROWS; i++) {
    const t = (300 + i * 0.01).toFixed(2);
    lines.push(`H2O,water,g,Cp,${(33.6 + i * 1e-5).toFixed(5)},J/(mol·K),0.1,${t},100000,measured,nbs-1982`);
  }
  return lines.join('\n') + '\n';
}

describe('the API process killed in the middle of a bulk import', () => {
  let own: Awaited<ReturnType<typeof ownCluster>>;

  beforeAll(async () => {
    own = await ownCluster('crash');
    await migrateWithDemo(await ownConfig(own.cluster.url()));
  }, 120_000);

  afterAll(async () => {
    await own?.cleanup();
  }, 60_000);

  it('leaves the import entirely present or entirely absent after a restart', async () => {
    const port = await anyFreePort();
    const first = await startApiProcess(own.cluster.url(), port);
    const title = `crash test import ${Date.now()}`;
    try {
      const login = await fetch(`${first.url}/api/v1/auth/login`, {
        method: 'POST',
        headers: { 'Content-Type': 'application/json' },
        body: JSON.stringify({ email: 'steward@kelvindex.test', password: DEMO_PASSWORD }),
      });
      const { accessToken } = (await login.json()) as { accessToken: string };
      const form = new FormData();
      form.append('title', title);
      form.append('file', new Blob([importFile()], { type: 'text/csv' }), 'crash.csv');
      const started = await fetch(`${first.url}/api/v1/imports?dryRun=false`, { method: 'POST', headers: { Authorization: `Bearer ${accessToken}` }, body: form });
      expect(started.status).toBe(202);
      // Kill while the rows are being written: as soon as the job reports progress, or at once.
      const job = (await started.json()) as { id: string };
      await waitFor(async () => {
        const res = await fetch(`${first.url}/api/v1/imports/${job.id}`, { headers: { Authorization: `Bearer ${accessToken}` } });
        const body = (await res.json()) as { status: string; processedRows?: number };
        return body.status !== 'running' || (body.processedRows ?? 0) > 0;
      }, 5_000);
    } finally {
      await killHard(first.child);
    }

    const second = await startApiProcess(own.cluster.url(), port);
    try {
      const proposals = own.cluster.psql(`SELECT count(*) FROM proposals WHERE title = '${title}'`, 'kelvindex').trim();
      const items = Number(
        own.cluster.psql(`SELECT count(*) FROM proposal_items i JOIN proposals p ON p.id = i.proposal_id WHERE p.title = '${title}'`, 'kelvindex').trim(),
      );
      expect(['0', '1']).toContain(proposals);
      expect(items === 0 || items === ROWS).withContext(`items written: ${items}`).toBeTrue();
      expect(items === 0).toBe(proposals === '0');
    } finally {
      await killHard(second.child);
    }
  }, 180_000);
});
