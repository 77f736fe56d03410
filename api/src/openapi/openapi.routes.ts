import type { AppContext } from '../app-context';
import { securedRouter } from '../auth/access';
import { openApiDocument } from './openapi-document';
import { REFERENCE_PAGE_HTML, REFERENCE_PAGE_SCRIPT } from './reference-page';

/**
 * The OpenAPI document and an interactive reference page built from it. The page is plain HTML
 * with its script served as a separate file from this origin, as the Content-Security-Policy
 * requires (no inline script, nothing from a CDN).
 */
export function openApiRoutes(ctx: AppContext) {
  const r = securedRouter('', ctx.config.publicRead);
  r.get('/openapi.json', 'public', (_req, res) => {
    res.set('Cache-Control', 'public, max-age=300').json(openApiDocument());
  });
  r.get('/docs', 'public', (_req, res) => {
    res.set('Cache-Control', 'public, max-age=300').type('html').send(REFERENCE_PAGE_HTML);
  });
  r.get('/docs/reference.js', 'public', (_req, res) => {
    res.set('Cache-Control', 'public, max-age=300').type('text/javascript').send(REFERENCE_PAGE_SCRIPT);
  });
  return r.router;
}
