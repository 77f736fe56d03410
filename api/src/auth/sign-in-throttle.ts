import type { Request, RequestHandler } from 'express';
import { rateLimit } from 'express-rate-limit';
import { slowDown } from 'express-slow-down';
import type { DataSource } from 'typeorm';
import { TooManyRequestsError } from '../shared/errors';
import { PostgresRateLimitStore } from './postgres-rate-limit-store';

/** Attempts are counted per client address and e-mail, so one attacker cannot lock out everyone. */
function attemptKey(req: Request): string {
  const email = typeof req.body?.email === 'string' ? req.body.email.trim().toLowerCase() : '';
  return `${req.ip ?? 'unknown'}|${email}`;
}

export interface ThrottleSettings {
  /** failed attempts answered at full speed before each further one is delayed */
  freeAttempts: number;
  /** failed attempts in the window after which the address is refused outright */
  maxAttempts: number;
  windowMs: number;
}

export const SIGN_IN_THROTTLE: ThrottleSettings = { freeAttempts: 3, maxAttempts: 10, windowMs: 15 * 60_000 };

/**
 * Progressive delay, then a block: after `freeAttempts` failures each attempt waits 250 ms longer
 * (up to 5 s); after `maxAttempts` failures in the window the answer is 429 until the window ends.
 * The counts live in PostgreSQL, shared by every API process; `name` keeps each throttled route's
 * counts apart. When the database cannot be reached the route answers 503 instead of letting
 * attempts through uncounted.
 */
export function signInThrottle(dataSource: DataSource, name: string, settings: ThrottleSettings = SIGN_IN_THROTTLE): RequestHandler[] {
  const delay = slowDown({
    store: new PostgresRateLimitStore(dataSource, `${name}:delay:`),
    passOnStoreError: false,
    windowMs: settings.windowMs,
    delayAfter: settings.freeAttempts,
    delayMs: (used) => Math.min((used - settings.freeAttempts) * 250, 5000),
    skipSuccessfulRequests: true,
    keyGenerator: attemptKey,
    validate: { keyGeneratorIpFallback: false },
  });
  const block = rateLimit({
    store: new PostgresRateLimitStore(dataSource, `${name}:block:`),
    passOnStoreError: false,
    windowMs: settings.windowMs,
    limit: settings.maxAttempts,
    skipSuccessfulRequests: true,
    keyGenerator: attemptKey,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    validate: { keyGeneratorIpFallback: false },
    handler: (_req, _res, next) => next(new TooManyRequestsError('Too many failed attempts: wait 15 minutes before trying again')),
  });
  return [block, delay];
}
