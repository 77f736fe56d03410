import type { Request } from 'express';
import type { EntityManager } from 'typeorm';
import type { AppContext } from '../app-context';
import type { Principal } from '../auth/principal';
import { recordAudit } from '../audit/audit.service';
import { BadRequestError, ConflictError, NotFoundError, UnprocessableError } from '../shared/errors';
import { BibliographyError, detectFormat, parseBibliography, type BibliographyFormat } from './bibliography-formats';
import { normalizeDoi } from './doi';

/** CSL-JSON item types a source may have (CSL 1.0.2). */
export const CSL_TYPES = [
  'article', 'article-journal', 'article-magazine', 'article-newspaper', 'bill', 'book', 'broadcast', 'chapter', 'classic', 'collection',
  'dataset', 'document', 'entry', 'entry-dictionary', 'entry-encyclopedia', 'event', 'figure', 'graphic', 'hearing', 'interview',
  'legal_case', 'legislation', 'manuscript', 'map', 'motion_picture', 'musical_score', 'pamphlet', 'paper-conference', 'patent',
  'performance', 'periodical', 'personal_communication', 'post', 'post-weblog', 'regulation', 'report', 'review', 'review-book',
  'software', 'song', 'speech', 'standard', 'thesis', 'treaty', 'webpage',
] as const;

/** CSL variables accepted by hand (names as in the CSL 1.0.2 specification). */
const CSL_TEXT_FIELDS = [
  'title', 'title-short', 'container-title', 'container-title-short', 'collection-title', 'collection-number', 'volume', 'issue', 'page',
  'number', 'edition', 'publisher', 'publisher-place', 'event-title', 'genre', 'note', 'abstract', 'language', 'URL', 'ISBN', 'ISSN',
  'PMID', 'PMCID', 'source', 'archive', 'medium', 'version', 'status', 'call-number', 'number-of-pages', 'chapter-number',
];
const CSL_NAME_FIELDS = ['author', 'editor', 'translator', 'collection-editor', 'container-author', 'contributor'];
const CSL_DATE_FIELDS = ['issued', 'accessed', 'original-date', 'event-date'];
const OWN_FIELDS = ['shortKey', 'notes', 'doi', 'DOI', 'type'];

export interface SourceView {
  id: string;
  shortKey: string;
  title: string;
  year: number | null;
  doi: string | null;
  csl: Record<string, unknown>;
  notes: string | null;
  mergedIntoId: string | null;
  createdAt: Date;
  updatedAt: Date;
  version: number;
}

const SOURCE_COLUMNS = `s.id, s.short_key AS "shortKey", s.title, s.year, s.doi, s.csl, s.notes, s.merged_into_id AS "mergedIntoId",
  s.created_at AS "createdAt", s.updated_at AS "updatedAt", s.version`;

/** A new source: its record as CSL-JSON with the columns the table keeps beside it. */
interface NewSource {
  csl: Record<string, unknown>;
  title: string;
  year: number | null;
  doi: string | null;
  shortKey?: string;
  /** citation key of an imported entry, a candidate short key */
  citationKey?: string;
  notes: string | null;
}

const SHORT_KEY = /^[A-Za-z0-9][A-Za-z0-9_.:-]{1,63}$/;
const OFFLINE_NOTE = 'Created from the DOI alone: Kelvindex makes no network lookups, so title, authors and year are still to be entered from the publication.';

/**
 * Sources: found by text, created by hand (CSL-JSON fields), from a DOI, or by importing BibTeX
 * or RIS; exported as CSL-JSON or BibTeX; duplicates are caught by DOI and merged by editors.
 */
export class SourcesService {
  constructor(private readonly ctx: AppContext) {}

  async search(q: string | undefined, limit: number, offset: number) {
    const params: unknown[] = [];
    let where = 's.merged_into_id IS NULL';
    let order = 's.short_key';
    if (q) {
      const doi = normalizeDoi(q);
      params.push(q, `%${q.replace(/[\\%_]/g, (c) => `\\${c}`)}%`, doi ?? null);
      where += ` AND (s.title ILIKE $2 OR s.short_key ILIKE $2 OR s.doi = $3 OR s.title % $1 OR s.csl::text ILIKE $2)`;
      order = `(s.doi IS NOT DISTINCT FROM $3) DESC, similarity(s.title, $1) DESC, s.short_key`;
    }
    const [{ total }] = await this.ctx.dataSource.query(`SELECT count(*)::int AS total FROM sources s WHERE ${where}`, params);
    params.push(limit, offset);
    const items = await this.ctx.dataSource.query(
      `SELECT ${SOURCE_COLUMNS} FROM sources s WHERE ${where} ORDER BY ${order} LIMIT $${params.length - 1} OFFSET $${params.length}`,
      params,
    );
    return { items, total, limit, offset };
  }

  async get(id: string, manager: EntityManager = this.ctx.dataSource.manager): Promise<SourceView> {
    const [row] = await manager.query(`SELECT ${SOURCE_COLUMNS} FROM sources s WHERE s.id = $1`, [id]);
    if (!row) throw new NotFoundError(`No source ${id}`);
    return row;
  }

  /** By hand (CSL-JSON fields, `title` required) or from `{doi}` alone. */
  async create(user: Principal, body: Record<string, unknown>, req: Request): Promise<SourceView & { notice?: string }> {
    if (typeof body !== 'object' || body === null || Array.isArray(body)) throw new BadRequestError('The request body must be a JSON object');
    const keys = Object.keys(body);
    const doiOnly = keys.length > 0 && keys.every((k) => k === 'doi' || k === 'DOI' || k === 'shortKey' || k === 'notes') && !('title' in body);
    const record = doiOnly ? this.fromDoi(body) : this.fromFields(body);
    const [created] = await this.insertAll(user, [record], req, doiOnly ? 'source.create_from_doi' : 'source.create');
    return doiOnly ? { ...created, notice: OFFLINE_NOTE } : created;
  }

  /** BibTeX or RIS text with one or more entries; all are created, or none. */
  async import(user: Principal, body: { text: string; format?: BibliographyFormat }, req: Request): Promise<{ format: BibliographyFormat; items: SourceView[] }> {
    const format = body.format ?? detectFormat(body.text);
    if (!format) throw new UnprocessableError('The text is neither BibTeX (an entry starting with @type{) nor RIS (a line starting with "TY  - "); say which with format');
    let entries: Record<string, unknown>[];
    try {
      entries = parseBibliography(body.text, format);
    } catch (error) {
      if (error instanceof BibliographyError) throw new UnprocessableError(error.message);
      throw error;
    }
    if (entries.length === 0) throw new UnprocessableError(`No ${format === 'bibtex' ? 'BibTeX' : 'RIS'} entries found in the text`);
    if (entries.length > 500) throw new UnprocessableError(`Import at most 500 entries at a time (got ${entries.length})`);
    const records = entries.map((csl, index) => {
      const problems: string[] = [];
      const record = this.recordFromCsl(csl, problems);
      if (problems.length > 0) throw new UnprocessableError(`Entry ${index + 1}${csl['citation-key'] ? ` (${csl['citation-key']})` : ''}: ${problems.join('; ')}`, { entry: index + 1, problems });
      return { ...record, citationKey: typeof csl['citation-key'] === 'string' ? csl['citation-key'] : undefined };
    });
    const items = await this.insertAll(user, records, req, 'source.import', { format });
    return { format, items };
  }

  private fromDoi(body: Record<string, unknown>): NewSource {
    const raw = body.doi ?? body.DOI;
    const doi = typeof raw === 'string' ? normalizeDoi(raw) : undefined;
    if (!doi) throw new UnprocessableError(`doi must be a DOI such as 10.1000/xyz123 (bare, doi: or https://doi.org/ form), got ${JSON.stringify(raw ?? null)}`, { fields: [{ field: 'doi', message: 'not a DOI' }] });
    return {
      csl: { type: 'article', DOI: doi, title: `DOI ${doi}`, note: OFFLINE_NOTE },
      title: `DOI ${doi}`,
      year: null,
      doi,
      shortKey: this.optionalShortKey(body.shortKey),
      notes: [typeof body.notes === 'string' ? body.notes.trim() : '', OFFLINE_NOTE].filter(Boolean).join(' '),
    };
  }

  private optionalShortKey(value: unknown): string | undefined {
    if (value === undefined || value === null || value === '') return undefined;
    if (typeof value !== 'string' || !SHORT_KEY.test(value)) {
      throw new BadRequestError('shortKey must be 2 to 64 letters, digits or _ . : - and start with a letter or digit', { fields: [{ field: 'shortKey', message: 'invalid short key' }] });
    }
    return value;
  }

  private fromFields(body: Record<string, unknown>): NewSource {
    const unknown = Object.keys(body).filter((k) => !OWN_FIELDS.includes(k) && !CSL_TEXT_FIELDS.includes(k) && !CSL_NAME_FIELDS.includes(k) && !CSL_DATE_FIELDS.includes(k));
    if (unknown.length > 0) throw new BadRequestError(`Unknown field${unknown.length > 1 ? 's' : ''}: ${unknown.join(', ')} (send CSL-JSON variables, shortKey and notes)`, { fields: unknown.map((f) => ({ field: f, message: 'unknown field' })) });
    const { shortKey, notes, doi, ...csl } = body;
    if (doi !== undefined) csl.DOI = doi;
    const problems: string[] = [];
    const record = this.recordFromCsl(csl, problems);
    if (notes !== undefined && notes !== null && typeof notes !== 'string') problems.push('notes must be text');
    if (problems.length > 0) throw new BadRequestError(`Invalid source: ${problems.join('; ')}`, { fields: problems.map((message) => ({ message })) });
    return { ...record, shortKey: this.optionalShortKey(shortKey), notes: typeof notes === 'string' && notes.trim() ? notes.trim() : null };
  }

  /** Checks a CSL-JSON item and reads the columns kept beside it. */
  private recordFromCsl(input: Record<string, unknown>, problems: string[]): NewSource {
    const csl: Record<string, unknown> = { ...input };
    if (csl.type === undefined) csl.type = 'article-journal';
    if (typeof csl.type !== 'string' || !(CSL_TYPES as readonly string[]).includes(csl.type)) problems.push(`type must be a CSL item type such as article-journal, book, report (got ${JSON.stringify(csl.type)})`);
    const title = typeof csl.title === 'string' ? csl.title.replace(/\s+/g, ' ').trim() : '';
    if (!title) problems.push('title is required');
    else if (title.length > 2000) problems.push('title must be at most 2000 characters');
    for (const field of CSL_TEXT_FIELDS) {
      if (csl[field] !== undefined && typeof csl[field] !== 'string' && typeof csl[field] !== 'number') problems.push(`${field} must be text`);
    }
    for (const field of CSL_NAME_FIELDS) {
      const names = csl[field];
      if (names === undefined) continue;
      if (!Array.isArray(names) || !names.every((n) => typeof n === 'object' && n !== null && ['family', 'given', 'literal', 'suffix', 'non-dropping-particle', 'dropping-particle'].some((k) => typeof (n as Record<string, unknown>)[k] === 'string'))) {
        problems.push(`${field} must be a list of names such as {"family": "Cox", "given": "J. D."} or {"literal": "CODATA"}`);
      }
    }
    let year: number | null = null;
    for (const field of CSL_DATE_FIELDS) {
      const date = csl[field] as { 'date-parts'?: unknown; literal?: unknown; raw?: unknown } | undefined;
      if (date === undefined) continue;
      const parts = date?.['date-parts'];
      const valid = typeof date === 'object' && date !== null && (
        (Array.isArray(parts) && parts.length >= 1 && parts.every((p) => Array.isArray(p) && p.length >= 1 && p.length <= 3 && p.every((n) => Number.isInteger(Number(n)))))
        || typeof date.literal === 'string' || typeof date.raw === 'string');
      if (!valid) problems.push(`${field} must be a CSL date such as {"date-parts": [[1998, 3]]}`);
      else if (field === 'issued' && Array.isArray(parts)) year = Number((parts as unknown[][])[0][0]);
    }
    if (year !== null && !(year >= 1500 && year <= 2200)) problems.push(`the year issued must be between 1500 and 2200 (got ${year})`);
    let doi: string | null = null;
    if (csl.DOI !== undefined && csl.DOI !== null && csl.DOI !== '') {
      const normalized = typeof csl.DOI === 'string' ? normalizeDoi(csl.DOI) : undefined;
      if (!normalized) problems.push(`DOI must look like 10.1000/xyz123 (got ${JSON.stringify(csl.DOI)})`);
      else {
        doi = normalized;
        csl.DOI = normalized;
      }
    }
    if (title) csl.title = title;
    return { csl, title, year, doi, notes: null };
  }

  /** Inserts new sources in one transaction; a DOI already present (or twice in the batch) is a 409 naming the source. */
  private async insertAll(user: Principal, records: NewSource[], req: Request, action: string, details: Record<string, unknown> = {}): Promise<SourceView[]> {
    return this.ctx.dataSource.transaction(async (m) => {
      // Serialises source creation, so two imports of the same DOI cannot both pass the check.
      await m.query(`SELECT pg_advisory_xact_lock(hashtext('kelvindex-sources'))`);
      const dois = records.map((r) => r.doi).filter((d): d is string => d !== null);
      const repeated = dois.find((d, i) => dois.indexOf(d) !== i);
      if (repeated) throw new ConflictError(`DOI ${repeated} appears twice in what you sent`, { doi: repeated });
      if (dois.length > 0) {
        const existing: { id: string; shortKey: string; title: string; doi: string }[] = await m.query(
          `SELECT id, short_key AS "shortKey", title, doi FROM sources WHERE doi = ANY($1::text[])`, [dois]);
        if (existing.length > 0) {
          const e = existing[0];
          throw new ConflictError(`A source with DOI ${e.doi} already exists: ${e.shortKey} (“${e.title}”, id ${e.id})`, { existing });
        }
      }
      const created: SourceView[] = [];
      for (const record of records) {
        if (record.shortKey) {
          const [taken] = await m.query(`SELECT id FROM sources WHERE short_key = $1`, [record.shortKey]);
          if (taken) throw new ConflictError(`The short key ${record.shortKey} is taken (source ${taken.id})`, { field: 'shortKey' });
        }
        const shortKey = record.shortKey ?? (await this.freeShortKey(m, record));
        const [row] = await m.query(
          `INSERT INTO sources (short_key, title, year, doi, csl, notes, created_by) VALUES ($1, $2, $3, $4, $5, $6, $7) RETURNING id`,
          [shortKey, record.title, record.year, record.doi, JSON.stringify(record.csl), record.notes, user.userId],
        );
        await recordAudit(m, { action, actor: user, entityType: 'source', entityId: row.id, details: { shortKey, doi: record.doi, title: record.title, ...details } }, req);
        created.push(await this.get(row.id, m));
      }
      return created;
    });
  }

  /** "family-year" from the first author, else the citation key or the title's first word; a, b, c… when taken. */
  private async freeShortKey(m: EntityManager, record: NewSource): Promise<string> {
    const first = (record.csl.author as { family?: string; literal?: string }[] | undefined)?.[0];
    const ascii = (s: string) => s.normalize('NFKD').replace(/[^\x20-\x7e]/g, '').toLowerCase().replace(/[^a-z0-9]+/g, '-').replace(/^-+|-+$/g, '');
    const citationKey = record.citationKey && SHORT_KEY.test(record.citationKey) ? record.citationKey : undefined;
    const author = ascii(first?.family ?? first?.literal ?? '').slice(0, 50);
    const titleWords = ascii(record.title.split(/\s+/).slice(0, 2).join(' ')).slice(0, 50);
    const withYear = (stem: string) => (record.year ? `${stem}-${record.year}` : stem);
    const base = (author ? withYear(author) : citationKey ?? (titleWords ? withYear(titleWords) : 'source')).replace(/^[^A-Za-z0-9]+/, '') || 'source';
    const taken = new Set<string>((await m.query(`SELECT short_key FROM sources WHERE short_key LIKE $1`, [`${base}%`])).map((r: { short_key: string }) => r.short_key));
    if (!taken.has(base) && SHORT_KEY.test(base)) return base;
    for (let i = 0; i < 26 * 26; i++) {
      const suffix = i < 26 ? String.fromCharCode(97 + i) : `${String.fromCharCode(97 + Math.floor(i / 26) - 1)}${String.fromCharCode(97 + (i % 26))}`;
      const candidate = `${base}${suffix}`;
      if (!taken.has(candidate) && SHORT_KEY.test(candidate)) return candidate;
    }
    return `${base}-${Date.now().toString(36)}`;
  }

  /**
   * Merges a duplicate into the source kept: open proposal items and evidence files move over;
   * values and fits keep citing the duplicate's row (they are never changed in place) and the
   * duplicate points at the source kept. The DOI moves over when the kept source has none.
   */
  async merge(user: Principal, id: string, intoId: string, req: Request) {
    if (id === intoId) throw new UnprocessableError('A source cannot be merged into itself', { fields: [{ field: 'intoId', message: 'same source' }] });
    return this.ctx.dataSource.transaction(async (m) => {
      const rows: { id: string; merged_into_id: string | null; doi: string | null; short_key: string }[] = await m.query(
        `SELECT id, merged_into_id, doi, short_key FROM sources WHERE id = ANY($1::uuid[]) ORDER BY id FOR UPDATE`, [[id, intoId]]);
      const duplicate = rows.find((r) => r.id === id);
      const kept = rows.find((r) => r.id === intoId);
      if (!duplicate) throw new NotFoundError(`No source ${id}`);
      if (!kept) throw new NotFoundError(`No source ${intoId} to merge into`);
      if (duplicate.merged_into_id) throw new ConflictError(`Source ${duplicate.short_key} is already merged into ${duplicate.merged_into_id}`);
      if (kept.merged_into_id) throw new ConflictError(`Source ${kept.short_key} is itself merged into ${kept.merged_into_id}; merge into that one`);
      if (duplicate.doi && kept.doi && duplicate.doi !== kept.doi) {
        throw new ConflictError(`The sources have different DOIs (${duplicate.doi}, ${kept.doi}): they are different publications`);
      }
      const [items] = await m.query(
        `WITH moved AS (UPDATE proposal_items i SET source_id = $2 FROM proposals p
                         WHERE p.id = i.proposal_id AND i.source_id = $1 AND p.state IN ('draft', 'submitted', 'in_review', 'changes_requested', 'resubmitted')
                        RETURNING 1)
         SELECT count(*)::int AS n FROM moved`, [id, intoId]);
      const [evidence] = await m.query(`WITH moved AS (UPDATE evidence_files SET source_id = $2 WHERE source_id = $1 RETURNING 1) SELECT count(*)::int AS n FROM moved`, [id, intoId]);
      const [kept_values] = await m.query(
        `SELECT (SELECT count(*) FROM thermo_values WHERE source_id = $1)::int + (SELECT count(*) FROM heat_capacity_fits WHERE source_id = $1)::int AS n`, [id]);
      const doi = duplicate.doi;
      await m.query(`UPDATE sources SET merged_into_id = $2, doi = NULL, notes = concat_ws(' ', notes, $3::text) WHERE id = $1`,
        [id, intoId, `Merged into ${kept.short_key}${doi ? ` (DOI ${doi} moved there)` : ''}.`]);
      if (doi && !kept.doi) await m.query(`UPDATE sources SET doi = $2, csl = csl || jsonb_build_object('DOI', $2::text) WHERE id = $1`, [intoId, doi]);
      const summary = { repointedItems: items.n, repointedEvidence: evidence.n, valuesStillCitingDuplicate: kept_values.n, doiMoved: Boolean(doi && !kept.doi) };
      await recordAudit(m, { action: 'source.merge', actor: user, entityType: 'source', entityId: id, details: { intoId, ...summary } }, req);
      return { merged: await this.get(id, m), into: await this.get(intoId, m), ...summary };
    });
  }
}
