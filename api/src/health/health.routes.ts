import { Router } from 'express';
import type { AppContext } from '../app-context';
import { checkHealth } from './health.service';

export function healthRoutes(ctx: AppContext): Router {
  const router = Router();
  router.get('/health', async (_req, res) => {
    const report = await checkHealth(ctx.dataSource);
    res.set('Cache-Control', 'no-store').status(report.database === 'up' ? 200 : 503).json(report);
  });
  return router;
}
