import { replicaReads } from '../db/replica-reads';
import type { Response } from 'express';
import type { AppContext } from '../app-context';
import { securedRouter } from '../auth/access';
import { openApiValidation } from '../openapi/request-validation';
import { BadRequestError } from '../shared/errors';
import { LATEST_MAX_AGE_SECONDS, setReleaseCaching } from '../shared/http-cache';
import { seesPreparingReleases } from './release-resolution';
import { ReleasesService } from './releases.service';

const LABEL = /^[0-9]{4}\.[1-9][0-9]*$/;

function labelParam(value: string | string[] | undefined, name: string): string {
  const text = Array.isArray(value) ? value[0] : value;
  if (!text || !LABEL.test(text)) throw new BadRequestError(`${name} must be a release label such as 2026.2, got "${text ?? ''}"`, { parameter: name });
  return text;
}

/** The release listing, one release with its change log, and the changes between two releases. */
export function releasesRoutes(ctx: AppContext) {
  const r = securedRouter('/releases', ctx.config.publicRead);
  const reads = replicaReads(ctx.dataSource);
  const releases = new ReleasesService(reads);
  const validate = openApiValidation(ctx);
  const cacheFor = (res: Response, published: boolean, explicit: boolean) =>
    setReleaseCaching(res, { status: published ? 'published' : 'preparing', explicit }, ctx.config.publicRead);

  r.get('/', 'read', ...validate, async (req, res) => {
    const withPreparing = seesPreparingReleases(req);
    const items = await releases.list(withPreparing);
    if (withPreparing) res.set('Cache-Control', 'private, no-store');
    else res.set('Cache-Control', `${ctx.config.publicRead ? 'public' : 'private'}, max-age=${LATEST_MAX_AGE_SECONDS}`);
    res.json({ items });
  });

  r.get('/:label', 'read', ...validate, async (req, res) => {
    const label = labelParam(req.params.label, 'label');
    const detail = await releases.detail(label, seesPreparingReleases(req));
    // "latest" in the answer moves when a newer release is published: cache briefly only.
    cacheFor(res, detail.status === 'published', false);
    res.json(detail);
  });

  r.get('/:a/diff/:b', 'read', ...validate, async (req, res) => {
    const from = labelParam(req.params.a, 'a');
    const to = labelParam(req.params.b, 'b');
    const diff = await releases.diff(from, to, seesPreparingReleases(req));
    cacheFor(res, await releases.allPublished([from, to]), true);
    res.json(diff);
  });

  return r.router;
}
