import type { Response } from 'express';

/** How long an answer about "the latest release" may be reused: it moves when a release is published. */
export const LATEST_MAX_AGE_SECONDS = 60;

/**
 * Cache headers of an answer computed from one release. A published release never changes, so an
 * answer for a release the caller named is cacheable for a year; an answer for "the latest
 * release" only briefly; a release in preparation not at all. Express adds the ETag (a hash of
 * the body) and answers 304 to a matching If-None-Match.
 *
 * @param publicRead when false, answers need credentials and must stay out of shared caches
 */
export function setReleaseCaching(res: Response, release: { status: string; explicit: boolean }, publicRead: boolean): void {
  if (release.status !== 'published') {
    res.set('Cache-Control', 'private, no-store');
    return;
  }
  const scope = publicRead ? 'public' : 'private';
  res.set('Cache-Control', release.explicit ? `${scope}, max-age=31536000, immutable` : `${scope}, max-age=${LATEST_MAX_AGE_SECONDS}`);
}
