import type { Request, Response } from 'express';
import etag from 'etag';
import { LRUCache } from 'lru-cache';
import type { AppContext } from '../app-context';
import { setReleaseCaching } from './http-cache';

interface CachedAnswer {
  body: string;
  etag: string;
}

/**
 * Answers computed from a published release, kept in memory. A published release never changes
 * (the database refuses to alter its members), so an answer computed once stays true for the life
 * of the process; the cache only bounds how much memory that may take. Answers from a release in
 * preparation are never kept.
 *
 * The key is the release id with the request's method and URL, so "the latest release" moves to
 * new keys as soon as a newer release is published and resolved.
 */
export class ReleaseResponseCache {
  private readonly answers: LRUCache<string, CachedAnswer> | null;

  /**
   * @param maxBytes memory for kept answers; 0 turns the cache off
   * @param publicRead whether answers may sit in shared caches (see setReleaseCaching)
   */
  constructor(maxBytes: number, private readonly publicRead: boolean) {
    this.answers = maxBytes > 0
      ? new LRUCache<string, CachedAnswer>({ maxSize: maxBytes, sizeCalculation: (a, key) => a.body.length * 2 + key.length * 2 + 64 })
      : null;
  }

  get enabled(): boolean {
    return this.answers !== null;
  }

  /**
   * Sends the JSON answer for `req` from release `release`: from memory when it was computed
   * before, otherwise computed by `compute` (and kept when the release is published), with the
   * release's cache headers. The ETag is the hash of the body either way, so a client's
   * If-None-Match gets its 304 from express. When `compute` throws, nothing is kept or sent.
   */
  async sendJson(req: Request, res: Response, release: { id: string; status: string; explicit: boolean }, compute: () => Promise<unknown>): Promise<void> {
    const key = this.answers && release.status === 'published' ? `${release.id} ${req.method} ${req.originalUrl}` : null;
    let answer = key ? this.answers!.get(key) : undefined;
    if (!answer) {
      const body = JSON.stringify(await compute());
      // The weak ETag express itself would give this body.
      answer = { body, etag: etag(body, { weak: true }) };
      if (key) this.answers!.set(key, answer);
    }
    setReleaseCaching(res, release, this.publicRead);
    res.set('ETag', answer.etag);
    res.type('application/json').send(answer.body);
  }
}

const perContext = new WeakMap<AppContext, ReleaseResponseCache>();

/** The one answer cache of an app (its size from RESPONSE_CACHE_MB). */
export function releaseResponses(ctx: AppContext): ReleaseResponseCache {
  let cache = perContext.get(ctx);
  if (!cache) {
    cache = new ReleaseResponseCache(ctx.config.responseCacheMb * 1024 * 1024, ctx.config.publicRead);
    perContext.set(ctx, cache);
  }
  return cache;
}
