import type { MigrationInterface, QueryRunner } from 'typeorm';

/**
 * Counters of the sign-in throttle (api/src/auth/postgres-rate-limit-store.ts), kept in PostgreSQL
 * so that every API process behind a load balancer counts the same attempts. A row is one client's
 * count in the current window; rows whose window has ended are deleted as the throttle goes.
 */
export class RateLimitCounters1764801100000 implements MigrationInterface {
  name = 'RateLimitCounters1764801100000';

  async up(q: QueryRunner): Promise<void> {
    await q.query(`
      CREATE TABLE rate_limit_counters (
        key text PRIMARY KEY,
        hits integer NOT NULL,
        reset_at timestamptz NOT NULL
      )`);
  }

  async down(q: QueryRunner): Promise<void> {
    await q.query(`DROP TABLE rate_limit_counters`);
  }
}
