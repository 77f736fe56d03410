import { createHash } from 'node:crypto';
import type { ClientRateLimitInfo, Options, Store } from 'express-rate-limit';
import type { DataSource } from 'typeorm';

interface CounterRow {
  hits: number;
  reset_at: Date;
}

// One statement, so that concurrent attempts from any process never lose a count: the first hit
// of a window inserts, later ones add one, and a hit after the window has ended starts it again.
const INCREMENT = `
  INSERT INTO rate_limit_counters AS c (key, hits, reset_at)
  VALUES ($1, 1, now() + $2::double precision * interval '1 millisecond')
  ON CONFLICT (key) DO UPDATE SET
    hits = CASE WHEN c.reset_at <= now() THEN 1 ELSE c.hits + 1 END,
    reset_at = CASE WHEN c.reset_at <= now() THEN excluded.reset_at ELSE c.reset_at END
  RETURNING hits, reset_at`;

/**
 * A store for express-rate-limit and express-slow-down that keeps the counts in PostgreSQL
 * (rate_limit_counters), so every API process behind a load balancer counts the same attempts.
 * Windows run on the database's clock, so processes whose clocks disagree still share them.
 * A database that cannot be reached rejects the call; the limiter passes the error on to the
 * error middleware (503), so a throttled route fails rather than goes unthrottled.
 */
export class PostgresRateLimitStore implements Store {
  /** a hit counted here counts in every process */
  readonly localKeys = false;
  private windowMs = 60_000;
  /** when this process next deletes the rows of ended windows (ms since the epoch) */
  private nextSweepAt = 0;

  /** @param prefix keeps this limiter's counts apart from another's that sees the same keys */
  constructor(
    private readonly dataSource: DataSource,
    readonly prefix: string,
  ) {}

  init(options: Options): void {
    this.windowMs = options.windowMs;
  }

  async get(key: string): Promise<ClientRateLimitInfo | undefined> {
    const [row]: CounterRow[] = await this.dataSource.query(`SELECT hits, reset_at FROM rate_limit_counters WHERE key = $1 AND reset_at > now()`, [
      this.rowKey(key),
    ]);
    return row && { totalHits: row.hits, resetTime: row.reset_at };
  }

  async increment(key: string): Promise<ClientRateLimitInfo> {
    await this.sweepWhenDue();
    const [row]: CounterRow[] = await this.dataSource.query(INCREMENT, [this.rowKey(key), this.windowMs]);
    return { totalHits: row.hits, resetTime: row.reset_at };
  }

  async decrement(key: string): Promise<void> {
    await this.dataSource.query(`UPDATE rate_limit_counters SET hits = hits - 1 WHERE key = $1 AND hits > 0 AND reset_at > now()`, [this.rowKey(key)]);
  }

  async resetKey(key: string): Promise<void> {
    await this.dataSource.query(`DELETE FROM rate_limit_counters WHERE key = $1`, [this.rowKey(key)]);
  }

  /** Once a window per process, rows whose window has ended go, so that one-off keys do not pile up. */
  private async sweepWhenDue(): Promise<void> {
    if (Date.now() < this.nextSweepAt) return;
    this.nextSweepAt = Date.now() + this.windowMs;
    await this.dataSource.query(`DELETE FROM rate_limit_counters WHERE reset_at <= now()`);
  }

  /**
   * Keys come from the request before it is validated (an address and an e-mail): hashed, any text
   * fits the primary key's index, and the table holds no e-mail addresses.
   */
  private rowKey(key: string): string {
    return this.prefix + createHash('sha256').update(key).digest('base64url');
  }
}
