// The calibration run's dose at d_max (10 × 10 cm², SSD 100), which ties the Monte Carlo's dose
// per fluence to dose per MU. Estimated without selection bias: a least-squares parabola over
// depth bins chosen BEFORE looking at the scores (a window around the nominal d_max), evaluated at
// the nominal d_max. Picking the highest noisy bin, or centring the fit on it, favours upward
// fluctuations: with 5 × 10⁴ histories that read the maximum 1.4–1.7 % high (16–24 runs of 6 MV
// against a 2 × 10⁶-history run), so every dose per MU came out that much low.
import type { McDepthDose } from './depthDose';

export interface CalibrationMaximum {
  depthCm: number;
  value: number;
  /**
   * ∂value/∂(bin score) for every bin (zero outside the window): at the depth used the fitted
   * value is linear in the scores, so the caller can take its batch-to-batch σ (which, unlike
   * propagating each bin's σ, counts the correlation between neighbouring bins).
   */
  weights: Float64Array;
}

/** Fewest bins the fit uses (a parabola needs three; five keep it stable). */
const MIN_BINS = 5;

/**
 * Window of the fit (first and last bin): from 0.6 × to 1.6 × the nominal d_max (the build-up side
 * is steeper), widened symmetrically to at least MIN_BINS bins. Fixed before any score is seen.
 */
export function calibrationWindowBins(
  centres: readonly number[],
  nominalCm: number,
): [number, number] {
  let lo = centres.findIndex((x) => x >= 0.6 * nominalCm);
  if (lo < 0) lo = Math.max(0, centres.length - MIN_BINS);
  let hi = lo;
  while (hi + 1 < centres.length && (centres[hi + 1] as number) <= 1.6 * nominalCm) hi++;
  while (hi - lo + 1 < MIN_BINS && (lo > 0 || hi < centres.length - 1)) {
    if (lo > 0) lo--;
    if (hi - lo + 1 < MIN_BINS && hi < centres.length - 1) hi++;
  }
  return [lo, hi];
}

/** Solves the 3 × 3 system m · p = r (Cramer's rule); null when singular. */
function solve3(m: number[][], r: number[]): [number, number, number] | null {
  const det = (a: number[][]) =>
    a[0]![0]! * (a[1]![1]! * a[2]![2]! - a[1]![2]! * a[2]![1]!) -
    a[0]![1]! * (a[1]![0]! * a[2]![2]! - a[1]![2]! * a[2]![0]!) +
    a[0]![2]! * (a[1]![0]! * a[2]![1]! - a[1]![1]! * a[2]![0]!);
  const d = det(m);
  if (!(Math.abs(d) > 0)) return null;
  const col = (k: number) => m.map((row, i) => row.map((v, j) => (j === k ? r[i]! : v)));
  return [det(col(0)) / d, det(col(1)) / d, det(col(2)) / d];
}

/**
 * The maximum of the calibration depth dose by a parabola fitted (unweighted least squares, t =
 * depth − nominal) over a window fixed by `nominalDMaxCm`, evaluated at the nominal depth.
 */
export function calibrationMaximum(dd: McDepthDose, nominalDMaxCm: number): CalibrationMaximum {
  const e = dd.edgesCm;
  const centres = dd.dosePerFluenceGyCm2.map(
    (_, i) => ((e[i] as number) + (e[i + 1] as number)) / 2,
  );
  const [lo, hi] = calibrationWindowBins(centres, nominalDMaxCm);
  const s = [0, 0, 0, 0, 0];
  const r = [0, 0, 0];
  for (let i = lo; i <= hi; i++) {
    const t = (centres[i] as number) - nominalDMaxCm;
    const y = dd.dosePerFluenceGyCm2[i] as number;
    for (let k = 0; k < 5; k++) s[k]! += t ** k;
    for (let k = 0; k < 3; k++) r[k]! += t ** k * y;
  }
  const m = [
    [s[0]!, s[1]!, s[2]!],
    [s[1]!, s[2]!, s[3]!],
    [s[2]!, s[3]!, s[4]!],
  ];
  const p = solve3(m, r);
  if (!p) throw new RangeError('calibration depth dose: too few bins around the nominal d_max');
  const [a, b, c] = p;
  // Evaluated at the nominal depth, not at the fitted vertex: any maximum taken of noisy data
  // (the highest bin, or the vertex of a noisy parabola) reads high; a value at a fixed depth is
  // linear in the scores and so unbiased. The price is the curvature between the nominal depth
  // and the run's own maximum, small on the flat top of the curve: on the 4 × 10⁶-history water
  // references the value at the modelled beam's d_max is 0.21 % (6 MV, 1.59 cm against a vertex
  // at 1.28 cm) and 0.03 % (18 MV) below the fitted vertex.
  const t0 = 0;
  const at = (t: number) => a + b * t + c * t * t;
  // ∂value/∂y_i at fixed t0: value = [1, t0, t0²] · M⁻¹ · [Σ y, Σ t y, Σ t² y].
  const g = solve3(m, [1, t0, t0 * t0]) as [number, number, number];
  const weights = new Float64Array(centres.length);
  for (let i = lo; i <= hi; i++) {
    const t = (centres[i] as number) - nominalDMaxCm;
    weights[i] = g[0] + g[1] * t + g[2] * t * t;
  }
  return { depthCm: nominalDMaxCm + t0, value: at(t0), weights };
}
