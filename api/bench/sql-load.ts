import { inlineParameters } from '../src/shared/sql-literals';
import { Client } from 'pg';
import { loadStats, type LoadStats } from './latency-stats';

/** An SQL statement the API sent for one request, as captured (statement-capture.ts). */
export interface CapturedStatement {
  /** the prepared statement's name when the API sent it as a named prepared statement */
  name?: string;
  text: string;
  values: unknown[];
  /** read through a cursor (pg-query-stream) by the API */
  stream?: boolean;
}

/** The statements of one API request, in the order the API sent them. */
export type CapturedRequest = CapturedStatement[];

/**
 * PostgreSQL doing the same work as the API, directly: `connections` clients, each replaying
 * captured requests (all statements of one request, in order, on its own connection) in a loop
 * for `seconds`. Same driver (pg), same statements and parameters (prepared where the API
 * prepares them), no HTTP, no JSON, no engine.
 * Returns the stats and the mean time of each statement position (to see which one dominates).
 */
export async function sqlLoad(url: string, captured: CapturedRequest[], connections: number, seconds: number): Promise<LoadStats & { statementMeanMs: number[] }> {
  // A request that sent no SQL (answered from a cache) says nothing about the database's side.
  const requests = captured.filter((r) => r.length > 0);
  if (requests.length === 0) return { ...loadStats([], connections, seconds, 0), statementMeanMs: [] };
  const clients = await Promise.all(Array.from({ length: connections }, async () => {
    const client = new Client({ connectionString: url });
    await client.connect();
    return client;
  }));
  const latencies: number[] = [];
  const statementTotals: number[] = [];
  const statementCounts: number[] = [];
  let errors = 0;
  let next = 0;
  const started = performance.now();
  const deadline = started + seconds * 1000;
  try {
    await Promise.all(clients.map(async (client) => {
      while (performance.now() < deadline) {
        const request = requests[next++ % requests.length];
        const t0 = performance.now();
        try {
          for (let i = 0; i < request.length; i++) {
            const s0 = performance.now();
            const { name, text, values } = request[i];
            await client.query({ name, text, values });
            statementTotals[i] = (statementTotals[i] ?? 0) + performance.now() - s0;
            statementCounts[i] = (statementCounts[i] ?? 0) + 1;
          }
          latencies.push(performance.now() - t0);
        } catch {
          errors++;
          await client.query('ROLLBACK').catch(() => undefined);
        }
      }
    }));
  } finally {
    await Promise.all(clients.map((c) => c.end()));
  }
  const elapsed = (performance.now() - started) / 1000;
  return {
    ...loadStats(latencies, connections, elapsed, errors),
    statementMeanMs: statementTotals.map((t, i) => Math.round((t / statementCounts[i]) * 1000) / 1000),
  };
}

/** The captured statement with its parameters written in as literals (for COPY, which takes no parameters). */
export function inlineStatement(statement: CapturedStatement, escapeLiteral: (text: string) => string): string {
  return inlineParameters(statement.text, statement.values, escapeLiteral);
}
