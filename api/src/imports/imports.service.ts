import { randomUUID } from 'node:crypto';
import type { Request } from 'express';
import type { EntityManager } from 'typeorm';
import type { AppContext } from '../app-context';
import type { Principal } from '../auth/principal';
import { recordAudit } from '../audit/audit.service';
import { CatalogueView } from '../proposals/proposal-subjects';
import { NotFoundError, UnprocessableError, UnsupportedMediaTypeError } from '../shared/errors';
import { safeFileName } from '../shared/uploads';
import { csvRows, decodeUtf8, parseXml, rowsOf, type ImportProblem, type RowReader } from './import-files';
import { checkDraft, draftImport, importReferences, newImportState, speciesNamesIn, type ImportSources, type PreparedImport } from './import-rows';
import { ImportWriter } from './import-writer';

/** Rows whose species are fetched at a time; each part is one COPY statement and one progress update. */
const PART_ROWS = 5000;
/** Rows checked between two turns of the event loop. */
const STEP_ROWS = 1000;
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
 * problem with its line, writing nothing but the job record. A real import checks the same way
 * (any problem: 422, nothing written) and writes ONE draft proposal with all its items in a single
 * transaction. Rows are checked in parts of PART_ROWS; while one part is checked the parts before it
 * are COPYed in that transaction (the database works while the API checks), and the first problem
 * stops the writing and rolls it back. Progress shows on the job row through a second connection
 * (the transaction's own writes stay invisible until it commits).
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

    // The writer's thread starts, connects and begins its transaction while the file is read; it
    // is handed to the background only when every row passed, and otherwise rolled back.
    const writer = options.dryRun ? null : new ImportWriter(this.ctx.config.databaseUrl);
    let handedOver = false;
    try {
      const decoded = decodeUtf8(file.buffer);
      const reader = 'problem' in decoded ? rowsOf({ rows: [], problems: [decoded.problem], records: 0 })
        : format === 'csv' ? csvRows(decoded.text) : rowsOf(parseXml(decoded.text));
      const jobId = randomUUID();
      const writing = writer && reader.problems.length === 0 ? writer : null;
      writing?.begin(user, options.title?.trim() || `Import of ${fileName}`, `Created by bulk import ${jobId}.`);
      const checked = await this.check(reader, writing);
      const problems = checked.problems;
      const checkedMs = Date.now() - started;

      const job = await this.ctx.dataSource.transaction(async (m) => {
        const [row] = await m.query(
          `INSERT INTO import_jobs (id, created_by, file_name, format, dry_run, status, total_rows, processed_rows, error_count, errors, started_at, finished_at)
           VALUES ($10, $1, $2, $3, $4, $5, $6, $7, $8, $9, now(), CASE WHEN $5 IN ('succeeded', 'failed') THEN now() END) RETURNING id`,
          [user.userId, fileName, format, options.dryRun, options.dryRun ? 'succeeded' : problems.length > 0 ? 'failed' : 'running',
            reader.records, options.dryRun || problems.length > 0 ? reader.records : 0, problems.length, JSON.stringify(problems.slice(0, STORED_PROBLEMS)), jobId],
        );
        await recordAudit(m, {
          action: options.dryRun ? 'import.dry_run' : 'import.start', actor: user, entityType: 'import_job', entityId: row.id,
          details: { fileName, format, rows: checked.rows, problems: problems.length },
        }, req);
        return row.id as string;
      });
      const summary = { rows: reader.records, wouldCreate: checked.counts, checkedInMs: checkedMs };

      if (options.dryRun) return { status: 200, body: { ...(await this.get(user, job)), errors: problems, ...summary } };
      if (problems.length > 0) {
        throw new UnprocessableError(`${problems.length} problem${problems.length === 1 ? '' : 's'} in ${fileName}; nothing was imported: ${problems.slice(0, 3).map((p) => `line ${p.line}${p.field ? ` (${p.field})` : ''}: ${p.message}`).join('; ')}${problems.length > 3 ? '; …' : ''}`, { jobId: job, problems });
      }

      // Every row is one value, so the title can now say how many.
      const title = options.title?.trim() || `Import of ${fileName} (${checked.rows} value${checked.rows === 1 ? '' : 's'})`;
      const items = checked.counts.species + checked.counts.phases + checked.counts.values;
      writing!.reportTo((written) => this.progress(job, Math.floor((reader.records * written) / Math.max(1, items))));
      handedOver = true;
      const work = this.finish(user, job, writing!, file, fileName, format, title, req)
        .catch((error: Error) => this.fail(job, error))
        .finally(() => ImportsService.running.delete(job));
      ImportsService.running.set(job, work);
      return { status: 202, body: { ...(await this.get(user, job)), ...summary } };
    } finally {
      if (writer && !handedOver) await writer.abort();
    }
  }

  /**
   * Reads and checks the rows part by part against just the part of the catalogue they name: the
   * species their formulas and names can mean, then the species the items name by name (those the
   * import adds, to see clashes with species of other formulas). The next part is read and its
   * species fetched while a part is checked; each part goes to `writer` while no problem is known.
   * Answers every problem, in line order.
   */
  private async check(reader: RowReader, writer: ImportWriter | null): Promise<{ problems: ImportProblem[]; counts: PreparedImport['counts']; rows: number }> {
    const manager = this.ctx.dataSource.manager;
    const catalogue = new CatalogueView();
    const sources: ImportSources = { byKey: new Map(), byDoi: new Map() };
    const state = newImportState();
    const problems: ImportProblem[] = [];
    const counts = { species: 0, phases: 0, values: 0 };
    let rows = 0;
    const read = async (max: number) => {
      const part = reader.next(max);
      const references = importReferences(part);
      await Promise.all([this.loadSources(manager, references.sourceKeys, references.dois, sources), catalogue.loadSpeciesOfFormulas(manager, references)]);
      return { part, references };
    };
    const problemFree = () => problems.length === 0 && reader.problems.length === 0 && rows <= MAX_IMPORT_ROWS;
    let unwritten: PreparedImport[] = [];
    const flush = () => {
      if (writer && problemFree() && unwritten.length > 0) writer.write(joinParts(unwritten));
      unwritten = [];
    };
    // The first part is small, so that the database starts writing soon.
    let next = read(STEP_ROWS);
    for (;;) {
      const { part, references } = await next;
      if (part.length === 0) break;
      rows += part.length;
      next = read(PART_ROWS);
      // Awaited in the next round; until then a failure must not count as unhandled.
      next.catch(() => undefined);
      for (let at = 0; at < part.length; at += STEP_ROWS) {
        const draft = draftImport(part.slice(at, at + STEP_ROWS), references, catalogue, sources, state);
        await catalogue.loadSpeciesNamed(manager, speciesNamesIn(draft));
        const prepared = checkDraft(draft, catalogue, state);
        problems.push(...prepared.problems);
        counts.species += prepared.counts.species;
        counts.phases += prepared.counts.phases;
        counts.values += prepared.counts.values;
        unwritten.push(prepared);
        // A turn of the event loop now and then, for the writer's messages and the next part's species.
        await new Promise((resolve) => setImmediate(resolve));
      }
      flush();
    }
    problems.push(...reader.problems);
    if (rows > MAX_IMPORT_ROWS) problems.push({ line: 1, message: `at most ${MAX_IMPORT_ROWS} rows per file (this one has ${rows})` });
    if (rows === 0 && problems.length === 0) problems.push({ line: 1, message: 'the file holds no rows of values' });
    problems.sort((a, b) => a.line - b.line);
    return { problems, counts, rows };
  }

  /** Adds to `into` the sources the rows name by key or DOI and `into` does not hold yet. */
  private async loadSources(manager: EntityManager, keys: string[], dois: string[], into: ImportSources): Promise<void> {
    const wantedKeys = keys.filter((k) => !into.byKey.has(k));
    const wantedDois = dois.filter((d) => !into.byDoi.has(d));
    if (wantedKeys.length === 0 && wantedDois.length === 0) return;
    const rows: { id: string; shortKey: string; doi: string | null; mergedInto: string | null }[] = await manager.query(
      `SELECT id, short_key AS "shortKey", doi, merged_into_id AS "mergedInto" FROM sources WHERE short_key = ANY($1::text[]) OR doi = ANY($2::text[])`,
      [wantedKeys, wantedDois],
    );
    for (const r of rows) {
      // A merged duplicate's key still works and means the source it was merged into.
      into.byKey.set(r.shortKey, r.mergedInto ?? r.id);
      if (r.doi) into.byDoi.set(r.doi, r.mergedInto ?? r.id);
    }
  }

  /** After the 202: the rest of the COPY, the reference check and COMMIT, then the job marked done. */
  private async finish(user: Principal, jobId: string, writer: ImportWriter, file: Express.Multer.File, fileName: string, format: 'csv' | 'xml', title: string, req: Request): Promise<void> {
    // The file is kept beside the import (when an object store is configured) while the transaction ends.
    const [items] = await Promise.all([
      writer.finish(user, title, { title, importJobId: jobId }, req),
      this.ctx.store?.put(`imports/${jobId}/${fileName}`, file.buffer, format === 'csv' ? 'text/csv' : 'application/xml').catch(() => undefined),
    ]);
    await this.ctx.dataSource.query(
      `UPDATE import_jobs SET status = 'succeeded', processed_rows = total_rows, proposal_id = $2, finished_at = now() WHERE id = $1`,
      [jobId, writer.proposalId],
    );
    await recordAudit(this.ctx.dataSource.manager, { action: 'import.finish', actor: user, entityType: 'import_job', entityId: jobId, details: { proposalId: writer.proposalId, items } }, req);
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

/** Consecutive checked parts as one. */
function joinParts(parts: PreparedImport[]): PreparedImport {
  if (parts.length === 1) return parts[0];
  return {
    items: parts.flatMap((p) => p.items),
    columns: parts.flatMap((p) => p.columns),
    problems: parts.flatMap((p) => p.problems),
    counts: { species: 0, phases: 0, values: 0 },
  };
}

function formatOf(fileName: string, mimetype: string): 'csv' | 'xml' | undefined {
  const type = mimetype.split(';')[0].trim().toLowerCase();
  if (/\.csv$/i.test(fileName) || type === 'text/csv' || type === 'application/csv') return 'csv';
  if (/\.xml$/i.test(fileName) || type === 'application/xml' || type === 'text/xml') return 'xml';
  return undefined;
}
