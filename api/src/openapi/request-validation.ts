import type { NextFunction, Request, RequestHandler, Response } from 'express';
import * as OpenApiValidator from 'express-openapi-validator';
import type { AppContext } from '../app-context';
import { HttpError } from '../shared/errors';
import { openApiDocument, validationDocument } from './openapi-document';

const CODES: Record<number, string> = { 400: 'bad_request', 404: 'not_found', 405: 'method_not_allowed', 406: 'not_acceptable', 413: 'payload_too_large', 415: 'unsupported_media_type' };

/** The validator's error as the API's own, its message naming where each problem is (/query/T, /body/colour). */
function asApiError(error: unknown): unknown {
  const e = error as { status?: number; message?: string; errors?: { path?: string; message?: string }[] };
  if (typeof e?.status !== 'number' || e.status >= 500 || !Array.isArray(e.errors)) return error;
  const where = e.errors.map((x) => x.path).filter(Boolean).join(', ');
  const message = where && !(e.message ?? '').includes(where) ? `${e.message} (${where})` : e.message ?? 'Bad request';
  return new HttpError(e.status, CODES[e.status] ?? 'bad_request', message, e.errors);
}

const perApp = new WeakMap<AppContext, RequestHandler[]>();

function runChain(handlers: RequestHandler[], req: Request, res: Response, done: NextFunction): void {
  let index = 0;
  const step: NextFunction = (error?: unknown) => {
    if (error !== undefined && error !== null && error !== 'route' && error !== 'router') return done(error);
    const handler = handlers[index++];
    if (!handler) return done();
    try {
      const result = handler(req, res, step) as unknown;
      if (result instanceof Promise) result.catch(done);
    } catch (caught) {
      done(caught);
    }
  };
  step();
}

/**
 * Checks a request against the OpenAPI document (express-openapi-validator): unknown query
 * parameters, wrong types and enum values, malformed bodies are a 400 before the handler runs.
 * Under NODE_ENV=test every JSON answer is checked against the document too, so the document
 * cannot drift from the code. Put it after the access guard, so that 401/403 come first.
 *
 * The validator is built on first use, once every router has declared its routes. It coerces
 * query values in place; the handler gets the query string as sent (texts), which the API's own
 * parsing expects.
 */
export function openApiValidation(ctx: AppContext): RequestHandler[] {
  const existing = perApp.get(ctx);
  if (existing) return existing;
  let chain: RequestHandler[] | undefined;
  const build = () =>
    OpenApiValidator.middleware({
      apiSpec: validationDocument(openApiDocument()) as never,
      validateRequests: { allowUnknownQueryParameters: false },
      validateResponses: process.env.NODE_ENV === 'test' ? { removeAdditional: false } : false,
      validateSecurity: false,
      validateApiSpec: true,
      ignoreUndocumented: true,
      fileUploader: false,
    });
  const handler: RequestHandler = (req, res, next) => {
    chain ??= build();
    const sent = structuredClone(req.query);
    runChain(chain, req, res, (error?: unknown) => {
      const own = Object.getOwnPropertyDescriptor(req, 'query');
      if (own?.writable) (req as { query: unknown }).query = sent;
      next(error === undefined ? undefined : asApiError(error));
    });
  };
  const handlers = [handler];
  perApp.set(ctx, handlers);
  return handlers;
}
