import type { AppContext } from '../app-context';
import { securedRouter } from '../auth/access';
import { AuditEntry } from './audit-entry.entity';
import { queryDate, queryInt, queryText } from '../shared/query-params';

/** The audit trail for admins, filterable by user, record, action and date, newest first. */
export function auditRoutes(ctx: AppContext) {
  const r = securedRouter('/audit', ctx.config.publicRead);
  r.get('/', { roles: ['admin'] }, async (req, res) => {
    const page = queryInt(req, 'page', 1, 1, 100_000);
    const pageSize = queryInt(req, 'pageSize', 50, 1, 500);
    const qb = ctx.dataSource.getRepository(AuditEntry).createQueryBuilder('a');
    const user = queryText(req, 'user');
    if (user) qb.andWhere('(a.actor_label ILIKE :user OR a.actor_user_id::text = :userExact)', { user: `%${user}%`, userExact: user });
    const action = queryText(req, 'action');
    if (action) qb.andWhere('a.action LIKE :action', { action: `${action}%` });
    const entityType = queryText(req, 'entityType');
    if (entityType) qb.andWhere('a.entity_type = :entityType', { entityType });
    const entityId = queryText(req, 'entityId');
    if (entityId) qb.andWhere('a.entity_id = :entityId', { entityId });
    const from = queryDate(req, 'from');
    if (from) qb.andWhere('a.occurred_at >= :from', { from });
    const to = queryDate(req, 'to');
    if (to) qb.andWhere('a.occurred_at <= :to', { to });
    const [items, total] = await qb.orderBy('a.id', 'DESC').skip((page - 1) * pageSize).take(pageSize).getManyAndCount();
    res.set('Cache-Control', 'no-store').json({ items, total, page, pageSize });
  });
  return r.router;
}
