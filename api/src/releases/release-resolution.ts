import type { Request } from 'express';
import type { DataSource } from 'typeorm';
import { BadRequestError, NotFoundError } from '../shared/errors';
import { queryText } from '../shared/query-params';
import type { ReleaseStatus } from './release.entity';

/** The release a read request is answered from. */
export interface ResolvedRelease {
  id: string;
  label: string;
  status: ReleaseStatus;
  publishedAt: Date | null;
  /** true when the caller named the release; false when it defaulted to the latest published one */
  explicit: boolean;
}

const LABEL = /^[0-9]{4}\.[1-9][0-9]*$/;
/** "latest" moves when a release is published; a few seconds of staleness is harmless. */
const LATEST_TTL_MS = 5_000;

interface ReleaseRow {
  id: string;
  label: string;
  status: ReleaseStatus;
  publishedAt: Date | null;
}

/** Editors and admins see releases in preparation; everyone else sees published releases only. */
export function seesPreparingReleases(req: Request): boolean {
  const roles = req.user?.roles ?? [];
  return roles.includes('editor') || roles.includes('admin');
}

/**
 * Finds the release a request names (`release=<label>` in the query, or a label from the body),
 * defaulting to the latest published one. A published release never changes, so it is cached for
 * the life of the process; releases in preparation are always read fresh.
 */
export class ReleaseResolver {
  private readonly published = new Map<string, ReleaseRow>();
  private latest: { row: ReleaseRow | undefined; until: number } | undefined;

  constructor(private readonly dataSource: DataSource) {}

  /** The release named by the `release` query parameter, or the latest published one. */
  fromQuery(req: Request): Promise<ResolvedRelease> {
    return this.resolve(req, queryText(req, 'release'));
  }

  /**
   * @param label a release label such as 2026.2, or undefined for the latest published release
   * @throws BadRequestError for a malformed label, NotFoundError for an unknown one (or one in
   *         preparation that the caller may not see)
   */
  async resolve(req: Request, label: string | undefined): Promise<ResolvedRelease> {
    if (label === undefined) {
      const row = await this.latestPublished();
      if (!row) throw new NotFoundError('No release has been published yet');
      return { ...row, explicit: false };
    }
    if (!LABEL.test(label)) throw new BadRequestError(`release must be a release label such as 2026.2, got "${label}"`, { parameter: 'release' });
    const row = await this.byLabel(label);
    if (!row || (row.status !== 'published' && !seesPreparingReleases(req))) throw new NotFoundError(`No release ${label}`);
    return { ...row, explicit: true };
  }

  private async byLabel(label: string): Promise<ReleaseRow | undefined> {
    const cached = this.published.get(label);
    if (cached) return cached;
    const [row]: ReleaseRow[] = await this.dataSource.query(
      `SELECT id, label, status, published_at AS "publishedAt" FROM releases WHERE label = $1`,
      [label],
    );
    if (row?.status === 'published') this.published.set(label, row);
    return row;
  }

  private async latestPublished(): Promise<ReleaseRow | undefined> {
    const now = Date.now();
    if (this.latest && this.latest.until > now) return this.latest.row;
    const [row]: ReleaseRow[] = await this.dataSource.query(
      `SELECT id, label, status, published_at AS "publishedAt" FROM releases
        WHERE status = 'published'
        ORDER BY split_part(label, '.', 1)::int DESC, split_part(label, '.', 2)::int DESC
        LIMIT 1`,
    );
    this.latest = { row, until: now + LATEST_TTL_MS };
    return row;
  }
}

const resolvers = new WeakMap<DataSource, ReleaseResolver>();

/** One resolver (and so one cache) per database. */
export function releaseResolver(dataSource: DataSource): ReleaseResolver {
  let resolver = resolvers.get(dataSource);
  if (!resolver) {
    resolver = new ReleaseResolver(dataSource);
    resolvers.set(dataSource, resolver);
  }
  return resolver;
}

/** Compares release labels (2026.10 after 2026.9). */
export function compareReleaseLabels(a: string, b: string): number {
  const [ay, an] = a.split('.').map(Number);
  const [by, bn] = b.split('.').map(Number);
  return ay - by || an - bn;
}
