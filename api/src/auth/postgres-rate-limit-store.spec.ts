import { randomBytes } from 'node:crypto';
import express from 'express';
import request from 'supertest';
import type { Options } from 'express-rate-limit';
import type { DataSource } from 'typeorm';
import { sharedDataSource } from '../db/test-database';
import { errorMiddleware } from '../shared/error-middleware';
import { PostgresRateLimitStore } from './postgres-rate-limit-store';
import { signInThrottle, type ThrottleSettings } from './sign-in-throttle';

const sleep = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

/** A store as a limiter sets it up, under a prefix of this run's own. */
function storeFor(dataSource: DataSource, prefix: string, windowMs: number): PostgresRateLimitStore {
  const store = new PostgresRateLimitStore(dataSource, prefix);
  store.init({ windowMs } as Options);
  return store;
}

/** A throttled route that fails unless the body says `ok`, behind the app's error middleware. */
function throttledApp(dataSource: DataSource, name: string, settings: ThrottleSettings) {
  const app = express();
  app.use(express.json());
  app.post('/attempt', ...signInThrottle(dataSource, name, settings), (req, res) => {
    res.status(req.body.ok ? 200 : 401).json({ message: req.body.ok ? 'welcome' : 'wrong' });
  });
  app.use(errorMiddleware);
  return app;
}

describe('PostgreSQL store of the sign-in throttle', () => {
  let ds: DataSource;
  let run: string;
  beforeAll(async () => {
    ds = await sharedDataSource();
  });
  beforeEach(() => {
    run = `spec-${randomBytes(4).toString('hex')}`;
  });

  it('counts hits per key and prefix, gives the end of the window, and decrements, reads and resets them', async () => {
    const store = storeFor(ds, `${run}:a:`, 60_000);
    const other = storeFor(ds, `${run}:b:`, 60_000);
    const before = Date.now();
    expect((await store.increment('client')).totalHits).toBe(1);
    const second = await store.increment('client');
    expect(second.totalHits).toBe(2);
    expect(second.resetTime!.getTime()).toBeGreaterThan(before + 55_000);
    expect(second.resetTime!.getTime()).toBeLessThan(Date.now() + 65_000);
    expect((await store.increment('another client')).totalHits).toBe(1);
    expect((await other.increment('client')).totalHits).toBe(1);

    await store.decrement('client');
    expect((await store.get('client'))?.totalHits).toBe(1);
    await store.resetKey('client');
    expect(await store.get('client')).toBeUndefined();
    expect((await other.get('client'))?.totalHits).toBe(1);
  });

  it('loses no hit when many arrive at once', async () => {
    const store = storeFor(ds, `${run}:`, 60_000);
    const results = await Promise.all(Array.from({ length: 30 }, () => store.increment('crowd')));
    expect(results.map((r) => r.totalHits).sort((a, b) => a - b)).toEqual(Array.from({ length: 30 }, (_, i) => i + 1));
    expect((await store.get('crowd'))?.totalHits).toBe(30);
  });

  it('starts a window again once it has ended, and deletes the rows of ended windows', async () => {
    const store = storeFor(ds, `${run}:`, 300);
    await store.increment('returning');
    await store.increment('returning');
    await store.increment('gone');
    const rows = async () => (await ds.query(`SELECT count(*)::int AS n FROM rate_limit_counters WHERE key LIKE $1`, [`${run}:%`]))[0].n;
    expect(await rows()).toBe(2);
    await sleep(400);

    expect(await store.get('returning')).toBeUndefined();
    const again = await store.increment('returning');
    expect(again.totalHits).toBe(1);
    expect(again.resetTime!.getTime()).toBeGreaterThan(Date.now());
    // The first increment after a window deleted the ended row of 'gone'.
    expect(await rows()).toBe(1);
  });

  it('blocks through a throttle until the window ends, and then lets attempts through again', async () => {
    const app = throttledApp(ds, run, { freeAttempts: 10, maxAttempts: 2, windowMs: 2000 });
    await request(app).post('/attempt').send({}).expect(401);
    await request(app).post('/attempt').send({}).expect(401);
    const blocked = await request(app).post('/attempt').send({}).expect(429);
    expect(blocked.body.message).toContain('Too many failed attempts');
    await sleep(2100);
    await request(app).post('/attempt').send({}).expect(401);
  });

  it('answers 503 when the database cannot be reached, rather than letting attempts through uncounted', async () => {
    const refused = Object.assign(new Error('connect ECONNREFUSED 127.0.0.1:5432'), { code: 'ECONNREFUSED' });
    const unreachable = { query: () => Promise.reject(refused) } as unknown as DataSource;
    const res = await request(throttledApp(unreachable, run, { freeAttempts: 3, maxAttempts: 10, windowMs: 60_000 }))
      .post('/attempt')
      .send({ ok: true })
      .expect(503);
    expect(res.body.message).toContain('database is unreachable');
  });
});
