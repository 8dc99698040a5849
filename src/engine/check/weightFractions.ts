// Each beam's share of a plan's prescribed dose, weight / Σ weights, computed without overflow:
// weights are scaled by the largest first, so weights near the largest double (1e308, whose sum
// is Infinity) give the same shares as 1 and 1.

/** Shares of the total, in order; all 0 when no weight is positive and finite. */
export function weightFractions(weights: readonly number[]): number[] {
  let largest = 0;
  for (const w of weights) if (Number.isFinite(w) && w > largest) largest = w;
  if (!(largest > 0)) return weights.map(() => 0);
  const scaled = weights.map((w) => (Number.isFinite(w) && w > 0 ? w / largest : 0));
  const sum = scaled.reduce((s, w) => s + w, 0);
  return scaled.map((w) => w / sum);
}
