import express from 'express';
import request from 'supertest';
import * as OpenApiValidator from 'express-openapi-validator';
import { declaredRoutes } from '../auth/access';
import type { AppContext } from '../app-context';
import { errorMiddleware } from '../shared/error-middleware';
import { testApp, type TestApp } from '../testing/test-app';
import { VALIDATED_OPERATIONS } from './openapi-document';
import { openApiValidation } from './request-validation';

type Document = { openapi: string; paths: Record<string, Record<string, Record<string, unknown>>>; components: Record<string, unknown> };

describe('OpenAPI document and reference page', () => {
  let t: TestApp;
  let doc: Document;
  beforeAll(async () => {
    t = await testApp();
    doc = (await request(t.app).get('/api/v1/openapi.json').expect(200)).body;
  });

  it('is a valid OpenAPI 3.1 document', async () => {
    expect(doc.openapi).toBe('3.1.0');
    // The validator checks the document against the OpenAPI 3.1 schema when it loads it.
    const app = express();
    app.use(OpenApiValidator.middleware({ apiSpec: structuredClone(doc) as never, validateApiSpec: true, validateRequests: true, validateSecurity: false, ignoreUndocumented: true }));
    app.get('/api/v1/health', (_req, res) => res.json({ status: 'ok', database: 'up', version: '0' }));
    app.use(errorMiddleware);
    await request(app).get('/api/v1/health').expect(200);
  });

  it('describes every route the API declares, with the access it declares', () => {
    const missing = declaredRoutes
      .map((r) => ({ ...r, path: r.path.replace(/:(\w+)/g, '{$1}') }))
      .filter((r) => !doc.paths[r.path]?.[r.method]);
    expect(missing).toEqual([]);
    // …and describes nothing the API does not serve (health is served outside the declared routers).
    const declared = new Set(declaredRoutes.map((r) => `${r.method} ${r.path.replace(/:(\w+)/g, '{$1}')}`).concat('get /health'));
    const documented = Object.entries(doc.paths).flatMap(([path, operations]) => Object.keys(operations).map((method) => `${method} ${path}`));
    expect(documented.filter((key) => !declared.has(key))).toEqual([]);
    expect(documented.filter((key) => doc.paths[key.split(' ')[1]][key.split(' ')[0]]['x-kelvindex-undocumented'])).withContext('routes still without a description').toEqual([]);
    const evaluate = doc.paths['/reactions/evaluate'].post;
    expect(evaluate['x-kelvindex-access']).toBe('read');
    expect(doc.paths['/users'].get['x-kelvindex-access']).toEqual(['admin']);
    expect(doc.paths['/auth/login'].post['x-kelvindex-access']).toBe('public');
  });

  it('describes the read, compute, export, account, audit and outbox routes by hand (no placeholders)', () => {
    const handWritten = [...VALIDATED_OPERATIONS, 'get /openapi.json', 'get /docs', 'get /docs/reference.js', 'get /health', 'post /auth/login', 'post /auth/refresh',
      'post /auth/logout', 'get /auth/me', 'post /auth/password-reset/request', 'post /auth/password-reset/confirm', 'post /auth/invitations/accept',
      'post /auth/change-password', 'post /auth/verify-email/request', 'post /auth/verify-email/confirm', 'get /users', 'post /users/invitations',
      'put /users/{id}/roles', 'post /users/{id}/deactivate', 'post /users/{id}/reactivate', 'get /api-keys', 'post /api-keys', 'get /api-keys/all',
      'delete /api-keys/{id}', 'get /audit', 'get /dev/outbox'];
    for (const key of handWritten) {
      const [method, path] = key.split(' ');
      expect(doc.paths[path]?.[method]).withContext(key).toBeDefined();
      expect(doc.paths[path]?.[method]?.['x-kelvindex-undocumented']).withContext(key).toBeUndefined();
    }
    for (const key of VALIDATED_OPERATIONS) {
      const [method, path] = key.split(' ');
      expect(doc.paths[path]?.[method]).withContext(key).toBeDefined();
    }
  });

  it('validates requests and, in tests, responses against the document', async () => {
    // A handler whose answer drifts from the document is caught (500), not shipped.
    const ctx = {} as AppContext;
    const app = express();
    app.get('/api/v1/releases', ...openApiValidation(ctx), (_req, res) => {
      res.json({ items: [{ label: 2026 }] });
    });
    app.use(errorMiddleware);
    const quiet = spyOn(console, 'error');
    await request(app).get('/api/v1/releases').expect(500);
    expect(quiet).toHaveBeenCalled();
    const unknown = await request(app).get('/api/v1/releases?colour=blue').expect(400);
    expect(unknown.body.message).toContain("Unknown query parameter 'colour'");
  });

  it('serves an interactive reference page whose script comes from this origin (CSP: no inline script)', async () => {
    const page = await request(t.app).get('/api/v1/docs').expect(200);
    expect(page.headers['content-type']).toContain('text/html');
    const csp = page.headers['content-security-policy'];
    expect(csp).toContain("script-src 'self'");
    expect(csp).not.toContain('unsafe-inline\' \'self\'; script');
    const scripts = [...page.text.matchAll(/<script([^>]*)>([\s\S]*?)<\/script>/g)];
    expect(scripts.length).toBe(1);
    expect(scripts[0][1]).toContain('src="/api/v1/docs/reference.js"');
    expect(scripts[0][2].trim()).toBe('');
    expect(page.text).not.toMatch(/\son[a-z]+=/i);
    expect(page.text).not.toMatch(/https?:\/\//);
    const script = await request(t.app).get('/api/v1/docs/reference.js').expect(200);
    expect(script.headers['content-type']).toContain('text/javascript');
    expect(() => new Function(script.text)).not.toThrow();
    expect(script.text).toContain('/openapi.json');
  });
});
