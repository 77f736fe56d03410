import autocannon from 'autocannon';
import { loadStats, type LoadStats } from './latency-stats';

/** One request of a benchmark's rotation. */
export interface HttpRequestSpec {
  method: 'GET' | 'POST';
  path: string;
  body?: string;
}

/**
 * Drives the API with autocannon at a fixed number of connections for a while, cycling through
 * `requests` (varied parameters, never one cached URL). Latencies are every response's own time,
 * so the percentiles (p95 included, which autocannon's histogram does not print) are exact.
 */
export async function httpLoad(baseUrl: string, requests: HttpRequestSpec[], connections: number, seconds: number): Promise<LoadStats & { statuses: Record<string, number> }> {
  let next = 0;
  const latencies: number[] = [];
  const statuses: Record<string, number> = {};
  let errors = 0;
  let bytes = 0;
  const started = performance.now();
  const options: autocannon.Options = {
    url: baseUrl,
    connections,
    duration: seconds,
    pipelining: 1,
    timeout: 30,
    requests: [
      {
        setupRequest: (request) => {
          const spec = requests[next++ % requests.length];
          return {
            ...request,
            method: spec.method,
            path: spec.path,
            body: spec.body,
            headers: { ...(request.headers ?? {}), ...(spec.body ? { 'content-type': 'application/json' } : {}), accept: '*/*' },
          };
        },
      },
    ],
  };
  const result = await new Promise<autocannon.Result>((resolve, reject) => {
    const instance = autocannon(options, (error, done) => (error ? reject(error) : resolve(done)));
    instance.on('response', (_client: unknown, statusCode: number, resBytes: number, responseTime: number) => {
      latencies.push(responseTime);
      bytes += resBytes;
      statuses[statusCode] = (statuses[statusCode] ?? 0) + 1;
      if (statusCode < 200 || statusCode >= 300) errors++;
    });
  });
  errors += result.errors + result.timeouts;
  const elapsed = Math.min((performance.now() - started) / 1000, result.duration || seconds);
  return { ...loadStats(latencies, connections, elapsed, errors, bytes), statuses };
}
