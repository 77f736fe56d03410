import request from 'supertest';
import type { Express } from 'express';
import type { DataSource } from 'typeorm';
import { createApp } from '../app';
import { createDataSource } from '../db/data-source';
import { testApp, type TestApp } from '../testing/test-app';
import { DEMO_PASSWORD } from '../../../seeds-demo/demo-accounts';
import { PostgresRateLimitStore } from './postgres-rate-limit-store';

/**
 * Two API processes behind one load balancer: two apps, each with a connection pool of its own,
 * on the same database. Each spec signs in from an address of its own (documentation range,
 * through the X-Forwarded-For the app trusts from loopback), so its counts meet no other spec's.
 */
describe('sign-in throttle shared by two API processes', () => {
  let first: TestApp;
  let secondDataSource: DataSource;
  let second: Express;
  beforeAll(async () => {
    first = await testApp();
    secondDataSource = createDataSource(first.config.databaseUrl);
    await secondDataSource.initialize();
    second = createApp({ config: first.config, dataSource: secondDataSource, store: first.store, mail: first.mail });
  });
  afterAll(async () => {
    await secondDataSource.destroy();
  });

  const counters = () => ['block', 'delay'].map((kind) => new PostgresRateLimitStore(first.dataSource, `sign-in:${kind}:`));
  const startClean = (client: string, email: string) => Promise.all(counters().map((c) => c.resetKey(`${client}|${email}`)));
  const login = (app: Express, client: string, email: string, password: string) =>
    request(app).post('/api/v1/auth/login').set('X-Forwarded-For', client).send({ email, password });

  it('counts failures on either process: the eleventh across both is refused with 429 by both', async () => {
    const client = '203.0.113.10';
    const email = 'shared-throttle-target@kelvindex.test';
    await startClean(client, email);
    const timings: number[] = [];
    for (let attempt = 1; attempt <= 10; attempt++) {
      const started = Date.now();
      await login(attempt % 2 ? first.app : second, client, email, `guess-${attempt}`).expect(401);
      timings.push(Date.now() - started);
    }
    const blocked = await login(first.app, client, email, 'guess-11').expect(429);
    expect(blocked.body.message).toContain('Too many failed attempts');
    await login(second, client, email, 'guess-12').expect(429);
    // The slow-down is shared too: attempt 6 (on the second process) waits at least 3 × 250 ms.
    expect(timings[5]).toBeGreaterThanOrEqual(700);
  }, 60_000);

  it('does not count a successful sign-in', async () => {
    const client = '203.0.113.11';
    const email = 'reader@kelvindex.test';
    await startClean(client, email);
    for (let attempt = 1; attempt <= 9; attempt++) {
      await login(attempt % 2 ? first.app : second, client, email, `guess-${attempt}`).expect(401);
    }
    await login(first.app, client, email, DEMO_PASSWORD).expect(200);
    // The limiter takes a success back once the answer has gone out; wait until that has landed.
    const ninePerCounter = async () => (await Promise.all(counters().map((c) => c.get(`${client}|${email}`)))).every((h) => h?.totalHits === 9);
    const deadline = Date.now() + 5000;
    while (!(await ninePerCounter()) && Date.now() < deadline) await new Promise((resolve) => setTimeout(resolve, 50));
    expect(await ninePerCounter()).toBeTrue();
    await login(second, client, email, 'guess-10').expect(401);
    await login(first.app, client, email, 'guess-11').expect(429);
    await startClean(client, email);
  }, 60_000);
});
