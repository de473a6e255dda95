// Statistics for `npm run load`, from every response's own latency (autocannon's summary has no p95).

export interface LoadRow {
  endpoint: string;
  requests: number;
  requestsPerSecond: number;
  p50Ms: number;
  p95Ms: number;
  p99Ms: number;
  maxMs: number;
  errors: number;
  non2xx: number;
}

/** The nearest-rank percentile (the smallest value with at least p % of the values at or below it). */
export function percentile(sorted: readonly number[], p: number): number {
  if (sorted.length === 0) return Number.NaN;
  return sorted[Math.min(sorted.length - 1, Math.max(0, Math.ceil((p / 100) * sorted.length) - 1))];
}

export function loadRow(endpoint: string, latenciesMs: number[], seconds: number, failures: { errors: number; non2xx: number }): LoadRow {
  const sorted = [...latenciesMs].sort((a, b) => a - b);
  const round = (ms: number) => Math.round(ms * 10) / 10;
  return {
    endpoint,
    requests: sorted.length,
    requestsPerSecond: Math.round((sorted.length / seconds) * 10) / 10,
    p50Ms: round(percentile(sorted, 50)),
    p95Ms: round(percentile(sorted, 95)),
    p99Ms: round(percentile(sorted, 99)),
    maxMs: round(sorted[sorted.length - 1] ?? Number.NaN),
    ...failures,
  };
}

export interface TargetCheck {
  target: string;
  measured: string;
  verdict: 'PASS' | 'MISSED';
}

export function check(target: string, measured: string, met: boolean): TargetCheck {
  return { target, measured, verdict: met ? 'PASS' : 'MISSED' };
}

/** A latency as the README's figures table writes it: milliseconds below a second, else seconds. */
function readableMs(ms: number): string {
  return ms < 1000 ? `${Math.round(ms)} ms` : `${(ms / 1000).toFixed(2)} s`;
}

/**
 * The rows of the README's load-test table (endpoint, requests/s with its share of health's, p50, p95, p99, errors),
 * ready to paste. `failures` counts errors, time-outs and non-2xx answers together.
 */
export function readmeTableRows(rows: readonly LoadRow[], health: LoadRow): string[] {
  return rows.map((row) => {
    const share = row === health ? '' : ` (${Math.round((100 * row.requestsPerSecond) / health.requestsPerSecond)} % of health)`;
    const failures = row.errors + row.non2xx;
    return `| ${row.endpoint} | ${row.requestsPerSecond}${share} | ${readableMs(row.p50Ms)} | ${readableMs(row.p95Ms)} | ${readableMs(row.p99Ms)} | ${failures} |`;
  });
}
