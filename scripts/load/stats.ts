import type { KindRecord } from "./recorder";

// Latency and throughput summaries for the printed table and latest.json.

export interface LatencySummary {
  count: number;
  p50: number;
  p99: number;
  max: number;
  mean: number;
}

export interface KindSummary {
  kind: string;
  answers: number;
  ok: number;
  non2xx: number;
  bodyErrors: number;
  statuses: Record<string, number>;
  latencyMs: LatencySummary;
  perSecond: number;
  mbPerSecond: number;
  messages: Record<string, number>;
}

/** Nearest-rank percentile (the smallest sample with at least q of the samples at or below it). */
export function percentile(sorted: number[], q: number): number {
  if (sorted.length === 0) return Number.NaN;
  const rank = Math.max(1, Math.ceil(q * sorted.length));
  return sorted[rank - 1];
}

export function summariseLatency(samples: number[]): LatencySummary {
  const sorted = [...samples].sort((a, b) => a - b);
  const sum = sorted.reduce((s, v) => s + v, 0);
  return {
    count: sorted.length,
    p50: percentile(sorted, 0.5),
    p99: percentile(sorted, 0.99),
    max: sorted.length ? sorted[sorted.length - 1] : Number.NaN,
    mean: sorted.length ? sum / sorted.length : Number.NaN,
  };
}

/** One row of the table; several records merge into a group's row. */
export function summariseKinds(kind: string, records: KindRecord[], seconds: number): KindSummary {
  const statuses: Record<string, number> = {};
  const messages: Record<string, number> = {};
  let ok = 0;
  let answers = 0;
  let bytes = 0;
  let bodyErrors = 0;
  for (const r of records) {
    for (const [status, n] of r.statuses) {
      statuses[status] = (statuses[status] ?? 0) + n;
      answers += n;
      if (status >= 200 && status < 300) ok += n;
    }
    for (const [m, n] of r.messages) messages[m] = (messages[m] ?? 0) + n;
    bytes += r.bytes;
    bodyErrors += r.bodyErrors;
  }
  return {
    kind,
    answers,
    ok,
    non2xx: answers - ok,
    bodyErrors,
    statuses,
    latencyMs: summariseLatency(records.flatMap((r) => r.latenciesMs)),
    perSecond: seconds > 0 ? answers / seconds : Number.NaN,
    mbPerSecond: seconds > 0 ? bytes / 1e6 / seconds : Number.NaN,
    messages,
  };
}
