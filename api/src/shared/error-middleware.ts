import type { ErrorRequestHandler, RequestHandler } from 'express';
import { HttpError, NotFoundError } from './errors';
import { translateDatabaseError } from './database-errors';

interface StatusError {
  status?: number;
  statusCode?: number;
  type?: string;
  message?: string;
  errors?: unknown;
}

export const notFoundHandler: RequestHandler = (req, _res, next) => {
  next(new NotFoundError(`No route for ${req.method} ${req.path}`));
};

/** One place turns every failure into JSON; stack traces stay in the server log. */
export const errorMiddleware: ErrorRequestHandler = (err, _req, res, _next) => {
  const known = err instanceof HttpError ? err : translateDatabaseError(err);
  if (known) {
    res.status(known.status).json({ error: known.code, message: known.message, details: known.details });
    return;
  }
  const candidate = err as StatusError;
  const status = candidate.status ?? candidate.statusCode;
  if (typeof status === 'number' && status >= 400 && status < 500) {
    const message = candidate.type === 'entity.parse.failed' ? 'The request body is not valid JSON' : candidate.message ?? 'Bad request';
    res.status(status).json({ error: 'bad_request', message, details: candidate.errors });
    return;
  }
  console.error(err);
  res.status(500).json({ error: 'internal', message: 'Something went wrong on the server; it has been logged' });
};
