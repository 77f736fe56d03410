/** Throughput and latency of one measured run, the same shape for HTTP and for direct SQL. */
export interface LoadStats {
  connections: number;
  seconds: number;
  requests: number;
  /** completed requests per second */
  requestsPerSecond: number;
  /** latency / ms */
  p50: number;
  p95: number;
  p99: number;
  max: number;
  /** answers that were not 2xx (HTTP) or statements that failed (SQL) */
  errors: number;
  /** bytes received per second (HTTP) */
  bytesPerSecond?: number;
}

/** Exact percentiles of the recorded latencies (nearest rank). */
export function loadStats(latencies: number[], connections: number, seconds: number, errors: number, bytes?: number): LoadStats {
  const sorted = Float64Array.from(latencies).sort();
  const at = (p: number) => (sorted.length ? sorted[Math.min(sorted.length - 1, Math.max(0, Math.ceil(p * sorted.length) - 1))] : Number.NaN);
  return {
    connections,
    seconds: round(seconds, 2),
    requests: latencies.length,
    requestsPerSecond: round(latencies.length / seconds, 1),
    p50: round(at(0.5), 2),
    p95: round(at(0.95), 2),
    p99: round(at(0.99), 2),
    max: round(sorted.length ? sorted[sorted.length - 1] : Number.NaN, 2),
    errors,
    ...(bytes === undefined ? {} : { bytesPerSecond: Math.round(bytes / seconds) }),
  };
}

export function round(value: number, digits: number): number {
  const f = 10 ** digits;
  return Math.round(value * f) / f;
}
