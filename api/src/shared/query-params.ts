import type { Request } from 'express';
import { BadRequestError } from './errors';

/** Reads one optional query-string value; a repeated parameter is a 400, not a silent pick. */
export function queryText(req: Request, name: string): string | undefined {
  const value = req.query[name];
  if (value === undefined || value === '') return undefined;
  if (typeof value !== 'string') throw new BadRequestError(`${name} must be given once`);
  // PostgreSQL text cannot hold NUL; say so here rather than fail in the database.
  if (value.includes('\u0000')) throw new BadRequestError(`${name} must not contain a NUL character`);
  return value;
}

export function queryInt(req: Request, name: string, fallback: number, min: number, max: number): number {
  const text = queryText(req, name);
  if (text === undefined) return fallback;
  const n = Number(text);
  if (!Number.isInteger(n) || n < min || n > max) throw new BadRequestError(`${name} must be an integer from ${min} to ${max}, got "${text}"`);
  return n;
}

export function queryDate(req: Request, name: string): Date | undefined {
  const text = queryText(req, name);
  if (text === undefined) return undefined;
  const date = new Date(text);
  if (Number.isNaN(date.getTime())) throw new BadRequestError(`${name} must be a date (ISO 8601), got "${text}"`);
  return date;
}

export function queryEnum<T extends string>(req: Request, name: string, allowed: readonly T[]): T | undefined {
  const text = queryText(req, name);
  if (text === undefined) return undefined;
  if (!allowed.includes(text as T)) throw new BadRequestError(`${name} must be one of ${allowed.join(', ')}, got "${text}"`);
  return text as T;
}
