// Summary statistics for repeated timings: median, percentiles (linear between order statistics)
// and the spread (min–max).

export function percentile(samples: readonly number[], p: number): number {
  if (samples.length === 0) return NaN;
  const sorted = [...samples].sort((a, b) => a - b);
  const pos = (sorted.length - 1) * Math.min(Math.max(p, 0), 1);
  const lo = Math.floor(pos);
  const hi = Math.ceil(pos);
  const a = sorted[lo] as number;
  const b = sorted[hi] as number;
  return a + (b - a) * (pos - lo);
}

export function median(samples: readonly number[]): number {
  return percentile(samples, 0.5);
}

export function spread(samples: readonly number[]): { min: number; max: number } {
  return { min: Math.min(...samples), max: Math.max(...samples) };
}

/** Milliseconds elapsed while running `fn` (high-resolution clock). */
export async function timeMs(fn: () => unknown): Promise<number> {
  const t0 = performance.now();
  await fn();
  return performance.now() - t0;
}
