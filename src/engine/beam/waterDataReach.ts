// Where water data end in depth. A TMR read deeper than the deepest tabulated depth would be held
// at the table's last value (the look-ups clamp), while the true TMR keeps falling by a few per cent
// per cm: 90 cm of water read from a 40 cm table overstated the dose about eightfold. Type-A
// values that need such a read are withheld instead (null, with this reason).
import type { WaterData } from './waterData';

/** Allowance for rounding at the table's last depth (cm). */
const EDGE_TOLERANCE_CM = 1e-9;

/** True when a TMR read at this depth (cm) lies beyond the deepest tabulated depth. */
export function isBeyondWaterData(wd: WaterData, depthCm: number): boolean {
  return depthCm > wd.depthRangeCm[1] + EDGE_TOLERANCE_CM;
}

/** The flag of a value withheld because it needs TMR beyond the table. */
export function beyondWaterDataFlag(wd: WaterData, deepestCm: number): string {
  return `beyond the water data: TMR needed at ${deepestCm.toFixed(2)} cm, the table ends at ${wd.depthRangeCm[1]} cm (no value)`;
}

export interface DepthReachWatch {
  /** The same water data, noting every TMR read beyond the deepest tabulated depth. */
  waterData: WaterData;
  /** Forget what was noted (before the next evaluation). */
  reset(): void;
  /** Deepest read beyond the table since the last reset (cm), or null when none was. */
  deepestBeyondCm(): number | null;
}

/** Wrap water data so the reads of one evaluation can be checked against the table's depth. */
export function watchDepthReach(wd: WaterData): DepthReachWatch {
  let deepest: number | null = null;
  const waterData: WaterData = {
    ...wd,
    tmr(depthCm, sideCm, recorder) {
      if (isBeyondWaterData(wd, depthCm)) deepest = Math.max(deepest ?? depthCm, depthCm);
      return wd.tmr(depthCm, sideCm, recorder);
    },
  };
  return {
    waterData,
    reset: () => {
      deepest = null;
    },
    deepestBeyondCm: () => deepest,
  };
}

/**
 * The geometric depth where a method starts to need reads beyond the table, between a depth
 * where it does not (`okCm`) and one where it does (`beyondCm`); the reads grow with depth, so
 * bisection finds it (to 1e-6 cm).
 */
export function depthReachEdgeCm(
  okCm: number,
  beyondCm: number,
  needsBeyond: (depthCm: number) => boolean,
): number {
  let lo = okCm;
  let hi = beyondCm;
  while (hi - lo > 1e-6) {
    const mid = (lo + hi) / 2;
    if (needsBeyond(mid)) hi = mid;
    else lo = mid;
  }
  return hi;
}
