import type { Request } from 'express';
import type { PoolClient } from 'pg';
import type { EntityManager } from 'typeorm';
import type { AppContext } from '../app-context';
import type { Principal } from '../auth/principal';
import { recordAudit } from '../audit/audit.service';
import { CatalogueView } from '../proposals/proposal-subjects';
import { NotFoundError, UnprocessableError, UnsupportedMediaTypeError } from '../shared/errors';
import { copyLine, copyRows } from '../shared/copy-rows';
import { checkWrittenRows, setBasedChecksPossible, withRowTriggersOff } from '../shared/set-based-checks';
import { safeFileName } from '../shared/uploads';
import { decodeUtf8, parseCsv, parseXml, type ImportProblem, type ImportRow } from './import-files';
import { checkDraft, draftImport, importReferences, speciesNamesIn, type ImportSources, type PreparedImport } from './import-rows';

/** Rows per COPY statement (its foreign-key checks run at its end) and per progress update. */
const BATCH = 5000;
const ITEM_COLUMNS = ['id', 'proposal_id', 'position', 'kind', 'payload', 'source_id', 'species_id', 'species_phase_id'] as const;
/** Problems kept on the job row; the dry run's answer carries all of them. */
const STORED_PROBLEMS = 10_000;
export const MAX_IMPORT_ROWS = 200_000;
/** A job still marked running this long after it started, with no worker here, was interrupted. */
const INTERRUPTED_AFTER_MS = 15 * 60_000;

export interface ImportJobView {
  id: string;
  fileName: string;
  format: 'csv' | 'xml';
  dryRun: boolean;
  status: string;
  totalRows: number | null;
  processedRows: number;
  errorCount: number;
  errors: ImportProblem[];
  proposalId: string | null;
  createdAt: Date;
  startedAt: Date | null;
  finishedAt: Date | null;
}

const JOB_COLUMNS = `id, file_name AS "fileName", format, dry_run AS "dryRun", status, total_rows AS "totalRows", processed_rows AS "processedRows",
  error_count AS "errorCount", errors, proposal_id AS "proposalId", created_at AS "createdAt", started_at AS "startedAt", finished_at AS "finishedAt"`;

/**
 * Bulk import of values from CSV or XML (FORMAT.md). A dry run checks every row and answers every
 * problem with its line, writing nothing but the job record. A real import first checks the same
 * way (any problem: 422, nothing written), then creates ONE draft proposal with all its items in a
 * single transaction, COPYed in statements of 5000 rows, reporting progress on the job row through a
 * second connection (the transaction's own writes stay invisible until it commits).
 */
export class ImportsService {
  /** Jobs still writing, so a test or a shutdown can wait for them. */
  static readonly running = new Map<string, Promise<void>>();

  constructor(private readonly ctx: AppContext) {}

  async start(user: Principal, file: Express.Multer.File, options: { dryRun: boolean; title?: string }, req: Request) {
    const fileName = safeFileName(file.originalname, 'import');
    const format = formatOf(fileName, file.mimetype);
    if (!format) throw new UnsupportedMediaTypeError('Import files are CSV (.csv, text/csv) or XML (.xml, application/xml); see FORMAT.md');
    const started = Date.now();

    const decoded = decodeUtf8(file.buffer);
    const parsed = 'problem' in decoded ? { rows: [], problems: [decoded.problem], records: 0 } : format === 'csv' ? parseCsv(decoded.text) : parseXml(decoded.text);
    const problems: ImportProblem[] = [...parsed.problems];
    if (parsed.rows.length > MAX_IMPORT_ROWS) problems.push({ line: 1, message: `at most ${MAX_IMPORT_ROWS} rows per file (this one has ${parsed.rows.length})` });
    if (parsed.rows.length === 0 && problems.length === 0) problems.push({ line: 1, message: 'the file holds no rows of values' });

    const prepared = problems.length === 0 || parsed.rows.length > 0
      ? await this.prepare(parsed.rows)
      : { items: [], columns: [], problems: [], counts: { species: 0, phases: 0, values: 0 } };
    problems.push(...prepared.problems);
    problems.sort((a, b) => a.line - b.line);
    const checkedMs = Date.now() - started;

    const job = await this.ctx.dataSource.transaction(async (m) => {
      const [row] = await m.query(
        `INSERT INTO import_jobs (created_by, file_name, format, dry_run, status, total_rows, processed_rows, error_count, errors, started_at, finished_at)
         VALUES ($1, $2, $3, $4, $5, $6, $7, $8, $9, now(), CASE WHEN $5 IN ('succeeded', 'failed') THEN now() END) RETURNING id`,
        [user.userId, fileName, format, options.dryRun, options.dryRun ? 'succeeded' : problems.length > 0 ? 'failed' : 'running',
          parsed.records, options.dryRun || problems.length > 0 ? parsed.records : 0, problems.length, JSON.stringify(problems.slice(0, STORED_PROBLEMS))],
      );
      await recordAudit(m, {
        action: options.dryRun ? 'import.dry_run' : 'import.start', actor: user, entityType: 'import_job', entityId: row.id,
        details: { fileName, format, rows: parsed.rows.length, problems: problems.length },
      }, req);
      return row.id as string;
    });
    const summary = { rows: parsed.records, wouldCreate: prepared.counts, checkedInMs: checkedMs };

    if (options.dryRun) return { status: 200, body: { ...(await this.get(user, job)), errors: problems, ...summary } };
    if (problems.length > 0) {
      throw new UnprocessableError(`${problems.length} problem${problems.length === 1 ? '' : 's'} in ${fileName}; nothing was imported: ${problems.slice(0, 3).map((p) => `line ${p.line}${p.field ? ` (${p.field})` : ''}: ${p.message}`).join('; ')}${problems.length > 3 ? '; …' : ''}`, { jobId: job, problems });
    }

    if (this.ctx.store) await this.ctx.store.put(`imports/${job}/${fileName}`, file.buffer, format === 'csv' ? 'text/csv' : 'application/xml').catch(() => undefined);
    const title = options.title?.trim() || `Import of ${fileName} (${prepared.counts.values} value${prepared.counts.values === 1 ? '' : 's'})`;
    const work = this.write(user, job, title, prepared, parsed.rows.length, req)
      .catch((error: Error) => this.fail(job, error))
      .finally(() => ImportsService.running.delete(job));
    ImportsService.running.set(job, work);
    return { status: 202, body: { ...(await this.get(user, job)), ...summary } };
  }

  /**
   * Checks the rows against just the part of the catalogue they name: the species their formulas
   * and names can mean, then the species the items name by name (those the import adds, to see
   * clashes with species of other formulas).
   */
  private async prepare(rows: ImportRow[]): Promise<PreparedImport> {
    const manager = this.ctx.dataSource.manager;
    const references = importReferences(rows);
    const catalogue = new CatalogueView();
    const [sources] = await Promise.all([
      this.sources(manager, references.sourceKeys, references.dois),
      catalogue.loadSpeciesOfFormulas(manager, references),
    ]);
    const draft = draftImport(rows, references, catalogue, sources);
    await catalogue.loadSpeciesNamed(manager, speciesNamesIn(draft));
    return checkDraft(draft, catalogue);
  }

  private async sources(manager: EntityManager, keys: string[], dois: string[]): Promise<ImportSources> {
    const rows: { id: string; shortKey: string; doi: string | null; mergedInto: string | null }[] = await manager.query(
      `SELECT id, short_key AS "shortKey", doi, merged_into_id AS "mergedInto" FROM sources WHERE short_key = ANY($1::text[]) OR doi = ANY($2::text[])`,
      [keys, dois],
    );
    const byKey = new Map<string, string>();
    const byDoi = new Map<string, string>();
    for (const r of rows) {
      // A merged duplicate's key still works and means the source it was merged into.
      byKey.set(r.shortKey, r.mergedInto ?? r.id);
      if (r.doi) byDoi.set(r.doi, r.mergedInto ?? r.id);
    }
    return { byKey, byDoi };
  }

  /**
   * The one transaction of a real import: proposal, items COPYed in statements of BATCH rows,
   * audit; progress on the side. The items were checked against the catalogue a moment ago; a
   * draft is checked again in full when it is submitted, and the database's foreign keys refuse
   * anything that vanished meanwhile.
   */
  private async write(user: Principal, jobId: string, title: string, prepared: PreparedImport, rows: number, req: Request): Promise<void> {
    const items = prepared.items;
    const total = items.length;
    const proposalId = await this.ctx.dataSource.transaction(async (m) => {
      const [proposal] = await m.query(
        `INSERT INTO proposals (title, summary, author_id) VALUES ($1, $2, $3) RETURNING id`,
        [title.slice(0, 300), `Created by bulk import ${jobId}.`, user.userId],
      );
      function* lines(): Generator<string> {
        for (const [i, item] of items.entries()) {
          const cols = prepared.columns[i];
          yield copyLine([item.id, proposal.id, item.position, item.kind, item.payload, item.sourceId, cols.speciesId, cols.speciesPhaseId]);
        }
      }
      // The transaction's own connection: COPY runs in the same transaction as everything else here.
      const client = (await m.queryRunner!.connect()) as PoolClient;
      const copy = () => copyRows(client, 'proposal_items', ITEM_COLUMNS, lines(), BATCH, (written) => this.progress(jobId, Math.floor((rows * written) / total)));
      // One check of every reference after the COPY where the database role allows it, else a trigger per row.
      const checks = await setBasedChecksPossible(client, 'proposal_items');
      if (checks) {
        await withRowTriggersOff(client, copy);
        await checkWrittenRows(client, checks, ITEM_COLUMNS, { column: 'proposal_id', value: proposal.id });
      } else {
        await copy();
      }
      await recordAudit(m, { action: 'proposal.create', actor: user, entityType: 'proposal', entityId: proposal.id, details: { title, importJobId: jobId, items: total } }, req);
      return proposal.id as string;
    });
    await this.ctx.dataSource.query(
      `UPDATE import_jobs SET status = 'succeeded', processed_rows = total_rows, proposal_id = $2, finished_at = now() WHERE id = $1`,
      [jobId, proposalId],
    );
    await recordAudit(this.ctx.dataSource.manager, { action: 'import.finish', actor: user, entityType: 'import_job', entityId: jobId, details: { proposalId, items: total } }, req);
  }

  /** Progress, through its own connection so that it is visible while the import's transaction runs. */
  private progress(jobId: string, processedRows: number): void {
    // Not awaited, so the COPY goes on meanwhile; only a running job's count moves, so a late update cannot undo the end.
    this.ctx.dataSource.query(`UPDATE import_jobs SET processed_rows = LEAST(total_rows, $2) WHERE id = $1 AND status = 'running' AND processed_rows < $2`, [jobId, processedRows])
      .catch((error: Error) => console.error(`could not record the progress of import ${jobId}: ${error.message}`));
  }

  private async fail(jobId: string, error: Error): Promise<void> {
    console.error(`import ${jobId} failed: ${error.message}`);
    await this.ctx.dataSource.query(
      `UPDATE import_jobs SET status = 'failed', processed_rows = 0, error_count = error_count + 1,
              errors = errors || jsonb_build_array(jsonb_build_object('line', 0, 'message', $2::text)), finished_at = now()
        WHERE id = $1`,
      [jobId, `the import was rolled back: ${error.message}`],
    ).catch((e: Error) => console.error(`could not record the failure of import ${jobId}: ${e.message}`));
  }

  async get(user: Principal, id: string): Promise<ImportJobView & { progress: number }> {
    let [job] = await this.ctx.dataSource.query(`SELECT ${JOB_COLUMNS}, created_by AS "createdBy" FROM import_jobs WHERE id = $1`, [id]);
    if (!job || (job.createdBy !== user.userId && !user.roles.includes('admin'))) throw new NotFoundError(`No import ${id}`);
    if (job.status === 'running' && !ImportsService.running.has(id) && Date.now() - new Date(job.startedAt).getTime() > INTERRUPTED_AFTER_MS) {
      // The server stopped while importing: the database rolled the transaction back, so nothing was written.
      await this.fail(id, new Error('the server stopped while importing; nothing was written; upload the file again'));
      [job] = await this.ctx.dataSource.query(`SELECT ${JOB_COLUMNS}, created_by AS "createdBy" FROM import_jobs WHERE id = $1`, [id]);
    }
    const { createdBy: _c, ...view } = job;
    return { ...view, progress: job.totalRows ? Math.min(1, job.processedRows / job.totalRows) : job.status === 'succeeded' ? 1 : 0 };
  }

  async list(user: Principal) {
    const items = await this.ctx.dataSource.query(
      `SELECT id, file_name AS "fileName", format, dry_run AS "dryRun", status, total_rows AS "totalRows", processed_rows AS "processedRows",
              error_count AS "errorCount", proposal_id AS "proposalId", created_at AS "createdAt", finished_at AS "finishedAt"
         FROM import_jobs WHERE created_by = $1 ORDER BY created_at DESC LIMIT 100`,
      [user.userId],
    );
    return { items };
  }
}

function formatOf(fileName: string, mimetype: string): 'csv' | 'xml' | undefined {
  const type = mimetype.split(';')[0].trim().toLowerCase();
  if (/\.csv$/i.test(fileName) || type === 'text/csv' || type === 'application/csv') return 'csv';
  if (/\.xml$/i.test(fileName) || type === 'application/xml' || type === 'text/xml') return 'xml';
  return undefined;
}
