import type { AppContext } from '../app-context';
import { securedRouter } from '../auth/access';
import { BadRequestError } from '../shared/errors';
import { uuidParam } from '../shared/params';
import { queryEnum } from '../shared/query-params';
import { receiveOneFile, requireFile } from '../shared/uploads';
import { ImportsService } from './imports.service';

const STEWARD = { roles: ['steward' as const] };

/**
 * Bulk import (FORMAT.md): `POST /imports?dryRun=true` answers every problem with its line and
 * writes nothing; `dryRun=false` answers 202 with the job, whose progress `GET /imports/{id}` shows
 * until it has created one draft proposal.
 */
export function importsRoutes(ctx: AppContext) {
  const imports = new ImportsService(ctx);
  const r = securedRouter('/imports', ctx.config.publicRead);

  r.get('/', STEWARD, async (req, res) => {
    res.set('Cache-Control', 'no-store').json(await imports.list(req.user!));
  });

  r.post('/', STEWARD, receiveOneFile(ctx.config.uploadLimitBytes), async (req, res) => {
    const dryRun = queryEnum(req, 'dryRun', ['true', 'false'] as const);
    if (dryRun === undefined) throw new BadRequestError('Say dryRun=true (check only) or dryRun=false (create a draft proposal)');
    const file = requireFile(req.file);
    const title = typeof req.body?.title === 'string' ? req.body.title : undefined;
    const { status, body } = await imports.start(req.user!, file, { dryRun: dryRun === 'true', title }, req);
    res.status(status).json(body);
  });

  r.get('/:id', STEWARD, async (req, res) => {
    res.set('Cache-Control', 'no-store').json(await imports.get(req.user!, uuidParam(req.params.id)));
  });

  return r.router;
}
