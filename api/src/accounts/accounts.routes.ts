import type { AppContext } from '../app-context';
import { securedRouter } from '../auth/access';
import { validateBody } from '../shared/validate-body';
import { uuidParam } from '../shared/params';
import { CreateApiKeyDto, InvitationDto, RolesDto } from './accounts.dto';
import { UsersService } from './users.service';
import { ApiKeysService } from './api-keys.service';

const ADMIN = { roles: ['admin' as const] };

export function usersRoutes(ctx: AppContext) {
  const users = new UsersService(ctx);
  const r = securedRouter('/users', ctx.config.publicRead);

  r.get('/', ADMIN, async (_req, res) => {
    res.json({ items: await users.list() });
  });
  r.post('/invitations', ADMIN, async (req, res) => {
    const body = await validateBody(InvitationDto, req.body);
    res.status(201).json(await users.invite(req.user!, body.email, body.roles, req));
  });
  r.put('/:id/roles', ADMIN, async (req, res) => {
    const body = await validateBody(RolesDto, req.body);
    res.json(await users.setRoles(req.user!, uuidParam(req.params.id), body.roles, req));
  });
  r.post('/:id/deactivate', ADMIN, async (req, res) => {
    res.json(await users.setActive(req.user!, uuidParam(req.params.id), false, req));
  });
  r.post('/:id/reactivate', ADMIN, async (req, res) => {
    res.json(await users.setActive(req.user!, uuidParam(req.params.id), true, req));
  });
  return r.router;
}

export function apiKeysRoutes(ctx: AppContext) {
  const keys = new ApiKeysService(ctx.dataSource);
  const r = securedRouter('/api-keys', ctx.config.publicRead);

  r.get('/', 'signed-in', async (req, res) => {
    res.json({ items: await keys.listOwn(req.user!) });
  });
  r.get('/all', ADMIN, async (_req, res) => {
    res.json({ items: await keys.listAll() });
  });
  r.post('/', 'signed-in', async (req, res) => {
    const body = await validateBody(CreateApiKeyDto, req.body);
    res.status(201).set('Cache-Control', 'no-store').json(await keys.create(req.user!, body.name, body.scope ?? 'read', req));
  });
  r.delete('/:id', 'signed-in', async (req, res) => {
    await keys.revoke(req.user!, uuidParam(req.params.id), req);
    res.status(204).end();
  });
  return r.router;
}
