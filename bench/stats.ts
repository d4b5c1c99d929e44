// Percentiles and medians from raw samples (autocannon's summary has no p95, so we keep every response time).
export function percentile(samples: number[], p: number): number {
  if (!samples.length) return NaN;
  const sorted = [...samples].sort((a, b) => a - b);
  const rank = Math.min(sorted.length - 1, Math.max(0, Math.ceil((p / 100) * sorted.length) - 1));
  return sorted[rank];
}

export const median = (samples: number[]) => percentile(samples, 50);

export function round(n: number, digits = 1): number {
  const f = 10 ** digits;
  return Math.round(n * f) / f;
}
