// Interpolation in a rectangular TMR table (depth × field side) and in 1-D factor tables.
// TMR is interpolated on log(TMR) in depth where both bracketing depths are at or beyond d_max
// (near-exponential there), linearly in the build-up region, and linearly in field side.
// Look-ups outside the table are clamped to its edge and reported to the recorder, never
// extrapolated silently.
import { bracketIndex, lerp } from '../units';
import type { LookupRecorder } from './waterData';

export interface TmrGrid {
  /** Ascending depths (cm). */
  depthsCm: Float64Array;
  /** Ascending field sides at depth (cm). */
  sidesCm: Float64Array;
  /** TMR values, row-major: values[i·sides + j] = TMR(depthsCm[i], sidesCm[j]). */
  values: Float64Array;
  dMaxCm: number;
}

/** Clamp a look-up coordinate to [lo, hi], reporting to the recorder when clamped. */
export function clampLookup(
  x: number,
  lo: number,
  hi: number,
  quantity: 'depth' | 'field',
  recorder?: LookupRecorder,
): number {
  if (x < lo) {
    recorder?.flag({ quantity, requested: x, clampedTo: lo });
    return lo;
  }
  if (x > hi) {
    recorder?.flag({ quantity, requested: x, clampedTo: hi });
    return hi;
  }
  return x;
}

function tmrAtDepthInColumn(g: TmrGrid, i: number, j: number, depthCm: number): number {
  const ns = g.sidesCm.length;
  const d0 = g.depthsCm[i] as number;
  const d1 = g.depthsCm[i + 1] as number;
  const t0 = g.values[i * ns + j] as number;
  const t1 = g.values[(i + 1) * ns + j] as number;
  if (d0 >= g.dMaxCm - 1e-9 && t0 > 0 && t1 > 0) {
    return Math.exp(lerp(depthCm, d0, d1, Math.log(t0), Math.log(t1)));
  }
  return lerp(depthCm, d0, d1, t0, t1);
}

/** TMR(d, s) from a grid; a factory so the search arrays are set up once. */
export function makeTmrLookup(
  g: TmrGrid,
): (depthCm: number, sideCm: number, recorder?: LookupRecorder) => number {
  const nd = g.depthsCm.length;
  const ns = g.sidesCm.length;
  const dLo = g.depthsCm[0] as number;
  const dHi = g.depthsCm[nd - 1] as number;
  const sLo = g.sidesCm[0] as number;
  const sHi = g.sidesCm[ns - 1] as number;
  return (depthCm, sideCm, recorder) => {
    const d = clampLookup(depthCm, dLo, dHi, 'depth', recorder);
    const s = clampLookup(sideCm, sLo, sHi, 'field', recorder);
    const i = bracketIndex(g.depthsCm, d);
    const j = bracketIndex(g.sidesCm, s);
    const a = tmrAtDepthInColumn(g, i, j, d);
    const b = tmrAtDepthInColumn(g, i, j + 1, d);
    return lerp(s, g.sidesCm[j] as number, g.sidesCm[j + 1] as number, a, b);
  };
}

/** Linear interpolation in a 1-D table of factors against field side, clamped and reported. */
export function makeFactorLookup(
  sidesCm: Float64Array,
  values: Float64Array,
): (sideCm: number, recorder?: LookupRecorder) => number {
  const lo = sidesCm[0] as number;
  const hi = sidesCm[sidesCm.length - 1] as number;
  return (sideCm, recorder) => {
    if (sidesCm.length === 1) return values[0] as number;
    const s = clampLookup(sideCm, lo, hi, 'field', recorder);
    const j = bracketIndex(sidesCm, s);
    return lerp(
      s,
      sidesCm[j] as number,
      sidesCm[j + 1] as number,
      values[j] as number,
      values[j + 1] as number,
    );
  };
}
