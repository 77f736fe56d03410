import express, { type Express } from 'express';
import helmet from 'helmet';
import cookieParser from 'cookie-parser';
import { existsSync } from 'node:fs';
import path from 'node:path';
import type { AppContext } from './app-context';
import { errorMiddleware, notFoundHandler } from './shared/error-middleware';
import { healthRoutes } from './health/health.routes';
import { authenticate } from './auth/authenticate';
import { authRoutes } from './auth/auth.routes';
import { apiKeysRoutes, usersRoutes } from './accounts/accounts.routes';
import { outboxRoutes } from './mail/outbox.routes';
import { auditRoutes } from './audit/audit.routes';
import { proposalsRoutes } from './proposals/proposals.routes';
import { evidenceRoutes } from './evidence/evidence.routes';
import { releaseEditingRoutes } from './releases/release-editing.routes';
import { sourcesRoutes } from './sources/sources.routes';
import { importsRoutes } from './imports/imports.routes';
import { watchlistRoutes } from './watchlists/watchlists.routes';
import { savedReactionsRoutes } from './saved-reactions/saved-reactions.routes';
import { preferencesRoutes } from './preferences/preferences.routes';
import { speciesRoutes } from './species/species.routes';
import { releasesRoutes } from './releases/releases.routes';
import { reactionComputeRoutes } from './reactions/reaction-compute.routes';
import { exportRoutes } from './exports/export.routes';
import { openApiRoutes } from './openapi/openapi.routes';

/** Builds the Express app: the JSON API under /api/v1 and, when built, the web client. */
export function createApp(ctx: AppContext): Express {
  const app = express();
  app.disable('x-powered-by');
  app.set('trust proxy', 'loopback');
  app.use(
    helmet({
      contentSecurityPolicy: {
        useDefaults: false,
        directives: {
          defaultSrc: ["'self'"],
          scriptSrc: ["'self'"],
          styleSrc: ["'self'", "'unsafe-inline'"],
          imgSrc: ["'self'", 'data:', 'blob:'],
          fontSrc: ["'self'"],
          connectSrc: ["'self'"],
          objectSrc: ["'none'"],
          frameAncestors: ["'none'"],
          baseUri: ["'self'"],
          formAction: ["'self'"],
        },
      },
    }),
  );
  app.use(express.json({ limit: '2mb' }));
  app.use(cookieParser());

  const api = express.Router();
  api.use(healthRoutes(ctx));
  api.use(authenticate(ctx.dataSource, ctx.config.jwtSecret));
  api.use('/auth', authRoutes(ctx));
  api.use('/users', usersRoutes(ctx));
  api.use('/api-keys', apiKeysRoutes(ctx));
  api.use('/dev/outbox', outboxRoutes(ctx));
  api.use('/audit', auditRoutes(ctx));
  api.use('/proposals', proposalsRoutes(ctx));
  api.use('/evidence', evidenceRoutes(ctx));
  api.use('/releases', releaseEditingRoutes(ctx));
  api.use('/sources', sourcesRoutes(ctx));
  api.use('/imports', importsRoutes(ctx));
  api.use('/watchlist', watchlistRoutes(ctx));
  api.use('/saved-reactions', savedReactionsRoutes(ctx));
  api.use('/me', preferencesRoutes(ctx));
  api.use('/species', speciesRoutes(ctx));
  api.use('/releases', releasesRoutes(ctx));
  api.use('/reactions', reactionComputeRoutes(ctx));
  api.use('/export', exportRoutes(ctx));
  api.use(openApiRoutes(ctx));
  api.use(notFoundHandler);
  app.use('/api/v1', api);
  app.use('/api', notFoundHandler);

  serveClient(app, path.resolve(ctx.config.clientDir));
  app.use(errorMiddleware);
  return app;
}

function serveClient(app: Express, clientDir: string): void {
  const index = path.join(clientDir, 'index.html');
  if (!existsSync(index)) return;
  app.use(express.static(clientDir, { index: false, maxAge: '1h' }));
  app.get(/^\/(?!api\/).*/, (_req, res) => {
    res.set('Cache-Control', 'no-cache').sendFile(index);
  });
}
