import { readdir, readFile } from 'node:fs/promises';
import path from 'node:path';
import type { AppContext } from '../app-context';
import { securedRouter } from '../auth/access';

/**
 * The development outbox: e-mails captured by the local SMTP server, for admins to read (and for
 * the end-to-end tests to follow links). In production there is no capture folder and it is empty.
 */
export function outboxRoutes(ctx: AppContext) {
  const r = securedRouter('/dev/outbox', ctx.config.publicRead);
  r.get('/', { roles: ['admin'] }, async (req, res) => {
    const to = typeof req.query.to === 'string' ? req.query.to.toLowerCase() : undefined;
    const dir = path.resolve(ctx.config.mailOutboxDir);
    const names = await readdir(dir).catch(() => [] as string[]);
    const mails = await Promise.all(
      names
        .filter((n) => n.endsWith('.json'))
        .sort()
        .reverse()
        .slice(0, 200)
        .map(async (n) => JSON.parse(await readFile(path.join(dir, n), 'utf8'))),
    );
    res.set('Cache-Control', 'no-store').json({ items: to ? mails.filter((m) => m.to.some((t: string) => t.toLowerCase() === to)) : mails });
  });
  return r.router;
}
