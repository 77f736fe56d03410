import { createHash, randomBytes } from 'node:crypto';
import { existsSync } from 'node:fs';
import path from 'node:path';
import { Client } from 'pg';
import { from as copyFrom, to as copyTo } from 'pg-copy-streams';
import { sampleRss, type ApiProcess } from './api-process';
import { latestPublishedRelease } from './bench-scenarios';
import { round } from './latency-stats';
import { checkWrittenRows, setBasedChecksPossible, withRowTriggersOff } from '../src/shared/set-based-checks';

/**
 * Bulk import through the API (POST /api/v1/imports?dryRun=false, the format of
 * api/src/imports/FORMAT.md) against PostgreSQL's COPY FROM of the same rows into the same table.
 */
export interface ImportResult {
  available: boolean;
  reason?: string;
  rows?: number;
  fileBytes?: number;
  api?: { status: number; seconds: number; acceptedSeconds: number; rowsPerSecond: number; rssBeforeMb: number; rssPeakMb: number; jobStatus: string };
  /** PostgreSQL alone: COPY with a foreign-key trigger per row, and COPY with the set-based check the import makes */
  copy?: { table: string; rows: number; seconds: number; rowsPerSecond: number; setBased: { seconds: number; rowsPerSecond: number } | null } | null;
  /** the API against PostgreSQL doing the same work (the set-based COPY where the role allows it) */
  ratio?: number | null;
  problems?: unknown[];
  /** every run, when the import was run several times (the figures above are the median run's) */
  runs?: { seconds: number; acceptedSeconds: number; rowsPerSecond: number; rssBeforeMb: number; rssPeakMb: number }[];
}

const FORMAT_DOC = path.resolve(__dirname, '../../../../api/src/imports/FORMAT.md');
const CP_TEMPERATURES = [280, 290, 300, 310, 320, 330, 340, 350, 360, 370];
const KEY_PREFIX = 'kxbenchmark0';

/** A steward with a write API key in the bench database (made or refreshed on every run). */
async function stewardKey(client: Client): Promise<{ key: string; userId: string }> {
  const { rows } = await client.query(
    `INSERT INTO users (email, display_name, roles, email_verified_at) VALUES ('bench-steward@kelvindex.test', 'Benchmark steward', '{reader,steward}', now())
     ON CONFLICT (email) DO UPDATE SET roles = EXCLUDED.roles RETURNING id`,
  );
  const userId: string = rows[0].id;
  const secret = randomBytes(32).toString('base64url');
  await client.query(
    `INSERT INTO api_keys (user_id, name, prefix, secret_hash, scope) VALUES ($1, 'benchmark', $2, $3, 'write')
     ON CONFLICT (prefix) DO UPDATE SET secret_hash = EXCLUDED.secret_hash, revoked_at = NULL, user_id = EXCLUDED.user_id`,
    [userId, KEY_PREFIX, createHash('sha256').update(secret).digest('hex')],
  );
  return { key: `${KEY_PREFIX}.${secret}`, userId };
}

/** Cp° at ten temperatures for crystals and liquids of the release, as a DSC campaign would report them. */
async function importCsv(client: Client, rows: number): Promise<string> {
  const release = await latestPublishedRelease(client);
  const phases: { formula: string; name: string; phase: string }[] = (await client.query(
    `SELECT s.formula, s.name, sp.phase FROM species s JOIN species_phases sp ON sp.species_id = s.id
      WHERE sp.phase IN ('cr', 'l') AND sp.polymorph IS NULL
        AND EXISTS (SELECT 1 FROM release_members m WHERE m.species_phase_id = sp.id AND m.release_id = $1)
      ORDER BY md5(sp.id::text || 'import') LIMIT $2`,
    [release.id, Math.ceil(rows / CP_TEMPERATURES.length)],
  )).rows;
  const quote = (text: string) => (/[",\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text);
  const lines = ['formula,name,phase,quantity,value,unit,uncertainty,uncertaintyKind,coverageFactor,temperature,pressure,method,sourceKey,sourceLocator'];
  let n = 0;
  for (const p of phases) {
    for (const t of CP_TEMPERATURES) {
      if (n >= rows) break;
      const cp = (40 + ((n * 7919) % 4000) / 10 + t / 20).toFixed(2);
      lines.push([quote(p.formula), quote(p.name), p.phase, 'Cp', cp, 'J/(mol·K)', '0.40', 'expanded', '2', String(t), '1 bar', 'measured', 'bx-dsc-2022', `run ${n + 1}`].join(','));
      n++;
    }
  }
  return `${lines.join('\n')}\n`;
}

/**
 * The import `runs` times; answers the median run (by rows/s) with every run listed. One run
 * varies by ±10 % or more on a 2-core machine, so one figure alone says little.
 */
export async function importBenchRuns(api: ApiProcess, databaseUrl: string, rows: number, runs: number): Promise<ImportResult> {
  const results: ImportResult[] = [];
  for (let i = 0; i < runs; i++) {
    const result = await importBench(api, databaseUrl, rows);
    if (!result.api) return result;
    results.push(result);
  }
  const sorted = [...results].sort((a, b) => a.api!.rowsPerSecond - b.api!.rowsPerSecond);
  const median = sorted[Math.floor((sorted.length - 1) / 2)];
  return { ...median, runs: results.map((r) => ({ seconds: r.api!.seconds, acceptedSeconds: r.api!.acceptedSeconds, rowsPerSecond: r.api!.rowsPerSecond, rssBeforeMb: r.api!.rssBeforeMb, rssPeakMb: r.api!.rssPeakMb })) };
}

export async function importBench(api: ApiProcess, databaseUrl: string, rows: number): Promise<ImportResult> {
  if (!existsSync(FORMAT_DOC)) return { available: false, reason: 'api/src/imports/FORMAT.md is not there yet (bulk import not delivered)' };
  const client = new Client({ connectionString: databaseUrl });
  await client.connect();
  try {
    // Earlier runs leave dead rows (their drafts are deleted, the COPY baselines rolled back): clear
    // them first, so that autovacuum does not start in the middle of this run.
    await client.query('VACUUM ANALYZE proposal_items');
    const { key, userId } = await stewardKey(client);
    const csv = await importCsv(client, rows);
    const form = new FormData();
    form.append('file', new Blob([csv], { type: 'text/csv' }), 'benchmark-import.csv');
    form.append('title', 'Benchmark import (generated Cp° rows)');

    const rssBefore = api.rssMb();
    const sampler = sampleRss(api.pid, 100);
    const t0 = performance.now();
    const answer = await fetch(`${api.url}/api/v1/imports?dryRun=false`, { method: 'POST', body: form, headers: { 'x-api-key': key } });
    const acceptedSeconds = (performance.now() - t0) / 1000;
    const body = (await answer.json().catch(() => ({}))) as Record<string, unknown>;
    if (answer.status === 404) {
      sampler.stop();
      return { available: false, reason: 'POST /api/v1/imports answers 404 (route not mounted)' };
    }
    if (answer.status !== 202 && answer.status !== 200 && answer.status !== 201) {
      sampler.stop();
      return { available: true, rows, reason: `the import was refused: ${answer.status} ${String(body.message ?? '')}`, problems: ((body.details as { errors?: unknown[] })?.errors ?? (body.errors as unknown[]) ?? []).slice(0, 5) };
    }
    const job = (body.job ?? body) as { id: string; status: string; proposalId?: string };
    let status = job.status;
    let proposalId = job.proposalId ?? null;
    while (status === 'queued' || status === 'running') {
      await new Promise((resolve) => setTimeout(resolve, 100));
      const poll = (await (await fetch(`${api.url}/api/v1/imports/${job.id}`, { headers: { 'x-api-key': key } })).json()) as { status: string; proposalId?: string; job?: { status: string; proposalId?: string } };
      const current = poll.job ?? poll;
      status = current.status;
      proposalId = current.proposalId ?? proposalId;
    }
    const seconds = (performance.now() - t0) / 1000;
    const samples = sampler.stop();
    const apiResult = {
      status: answer.status, seconds: round(seconds, 2), acceptedSeconds: round(acceptedSeconds, 2), rowsPerSecond: Math.round(rows / seconds),
      rssBeforeMb: round(rssBefore, 1), rssPeakMb: round(Math.max(...samples), 1), jobStatus: status,
    };
    const copy = proposalId ? await copyBaseline(client, proposalId, userId) : null;
    if (proposalId) await client.query(`DELETE FROM proposals WHERE id = $1 AND state = 'draft'`, [proposalId]);
    return {
      available: true, rows, fileBytes: Buffer.byteLength(csv), api: apiResult, copy,
      ratio: copy ? round(apiResult.rowsPerSecond / (copy.setBased ?? copy).rowsPerSecond, 2) : null,
    };
  } finally {
    await client.end();
  }
}

/**
 * PostgreSQL writing the same rows itself: the proposal items the import created, COPYed FROM
 * STDIN into proposal_items under a fresh draft, once with the foreign-key triggers firing per row
 * and once as the import writes them (row triggers off, then one set-based check), each in a
 * transaction that is rolled back.
 */
async function copyBaseline(client: Client, proposalId: string, userId: string): Promise<ImportResult['copy']> {
  const columns: string[] = (await client.query(
    `SELECT column_name FROM information_schema.columns WHERE table_name = 'proposal_items' AND column_name NOT IN ('id', 'proposal_id') ORDER BY ordinal_position`,
  )).rows.map((r: { column_name: string }) => r.column_name);
  const copyOnce = async (setBased: boolean) => {
    await client.query('BEGIN');
    try {
      const draft = (await client.query(`INSERT INTO proposals (title, author_id) VALUES ('COPY baseline', $1) RETURNING id`, [userId])).rows[0].id as string;
      const chunks: Buffer[] = [];
      const out = client.query(copyTo(`COPY (SELECT gen_random_uuid(), ${client.escapeLiteral(draft)}::uuid, ${columns.join(', ')} FROM proposal_items WHERE proposal_id = ${client.escapeLiteral(proposalId)} ORDER BY position) TO STDOUT`));
      for await (const chunk of out) chunks.push(chunk as Buffer);
      const data = Buffer.concat(chunks);
      const rows = data.toString('utf8').split('\n').length - 1;
      const checks = setBased ? await setBasedChecksPossible(client, 'proposal_items') : null;
      if (setBased && !checks) return null;
      const t0 = performance.now();
      const copy = () => new Promise<void>((resolve, reject) => {
        const stream = client.query(copyFrom(`COPY proposal_items (id, proposal_id, ${columns.join(', ')}) FROM STDIN`));
        stream.on('finish', resolve);
        stream.on('error', reject);
        stream.end(data);
      });
      if (checks) {
        await withRowTriggersOff(client, copy);
        await checkWrittenRows(client, checks, ['id', 'proposal_id', ...columns], { column: 'proposal_id', value: draft });
      } else {
        await copy();
      }
      const seconds = (performance.now() - t0) / 1000;
      return { rows, seconds: round(seconds, 2), rowsPerSecond: Math.round(rows / seconds) };
    } finally {
      await client.query('ROLLBACK');
    }
  };
  const perRow = (await copyOnce(false))!;
  const setBased = await copyOnce(true);
  return { table: 'proposal_items', ...perRow, setBased: setBased && { seconds: setBased.seconds, rowsPerSecond: setBased.rowsPerSecond } };
}
