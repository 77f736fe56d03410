import { ConflictError, HttpError, ServiceUnavailableError, UnprocessableError } from './errors';
import { constraintMessage } from '../db/constraint-messages';

interface PgErrorLike {
  code?: string;
  detail?: string;
  constraint?: string;
  message?: string;
  driverError?: PgErrorLike;
}

const CONNECTION_CODES = new Set(['ECONNREFUSED', 'ECONNRESET', 'ETIMEDOUT', 'EPIPE', '57P01', '57P02', '57P03', '08000', '08003', '08006']);

/**
 * Maps PostgreSQL error codes to API errors, so that a constraint the database enforces reaches the
 * caller as a 4xx saying which rule was broken instead of a 500.
 */
export function translateDatabaseError(error: unknown): HttpError | undefined {
  if (typeof error !== 'object' || error === null) return undefined;
  const pg = ((error as PgErrorLike).driverError ?? error) as PgErrorLike;
  const code = pg.code ?? '';
  const known = constraintMessage(pg.constraint);
  const constraint = pg.constraint ? ` (${pg.constraint})` : '';
  const details = { constraint: pg.constraint, field: known?.field, detail: pg.detail };
  if (CONNECTION_CODES.has(code) || /Connection terminated|connect ECONNREFUSED|timeout exceeded when trying to connect/i.test(pg.message ?? '')) {
    return new ServiceUnavailableError('The database is unreachable; try again shortly');
  }
  switch (code) {
    case '23505':
      return new ConflictError(known?.message ?? `A record with these values already exists${constraint}`, details);
    case '23503':
      return new UnprocessableError(known?.message ?? `A referenced record does not exist${constraint}`, details);
    case '23514':
      return new UnprocessableError(known?.message ?? `A value breaks a data rule${constraint}`, details);
    case '23502':
      return new UnprocessableError(known?.message ?? `A required value is missing${constraint}`, details);
    case '22021':
      return new UnprocessableError('A text contains a character the database cannot store (NUL or an invalid byte)');
    case '22P02':
    case '22003':
    case '22007':
    case '22008':
      return new UnprocessableError(`A value has the wrong form: ${pg.message}`);
    case '40001':
    case '40P01':
      return new ConflictError('Another change to the same records happened at the same time; retry');
    case 'P0001':
      return new ConflictError(known?.message ?? pg.message ?? 'The database refused the change', details);
    default:
      return undefined;
  }
}
