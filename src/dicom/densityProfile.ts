// The density profile along the ray inside the body: one interval per sample between the skin
// entry and the exit (bounded by the midpoints to the neighbouring samples), with its HU and its
// relative electron density from the calibration.
import type { BodyCrossing } from './bodyOutline';
import { rhoEOfHu, type Calibration } from './calibration';
import type { RaySamples } from './rayTrace';

export interface DensityProfile {
  /** Interval edges as depth below the skin along the ray (cm), length n + 1, from 0. */
  edgesCm: Float64Array;
  /** Depth of each sample below the skin (cm), length n. */
  depthCm: Float64Array;
  hu: Float64Array;
  rhoE: Float64Array;
  /** Path length above the calibration's highest HU (cm): held at its end value. */
  aboveCurveCm: number;
}

export function densityProfileOf(
  ray: RaySamples,
  body: BodyCrossing,
  cal: Calibration,
): DensityProfile {
  const { startMm, stepMm, hu } = ray;
  const first = Math.max(0, Math.ceil((body.entryMm - startMm) / stepMm - 1e-9));
  const last = Math.min(hu.length - 1, Math.floor((body.exitMm - startMm) / stepMm + 1e-9));
  const n = Math.max(0, last - first + 1);
  const edgesCm = new Float64Array(n + 1);
  const depthCm = new Float64Array(n);
  const huOut = new Float64Array(n);
  const rhoE = new Float64Array(n);
  const top = (cal.points[cal.points.length - 1] as { hu: number }).hu;
  const totalCm = (body.exitMm - body.entryMm) / 10;
  let aboveCurveCm = 0;
  for (let q = 0; q < n; q++) {
    const m = first + q;
    const tMm = startMm + m * stepMm;
    depthCm[q] = (tMm - body.entryMm) / 10;
    const h = hu[m] as number;
    huOut[q] = h;
    rhoE[q] = rhoEOfHu(cal, h);
    edgesCm[q + 1] = q === n - 1 ? totalCm : (tMm + stepMm / 2 - body.entryMm) / 10;
    if (h > top) aboveCurveCm += (edgesCm[q + 1] as number) - (edgesCm[q] as number);
  }
  return { edgesCm, depthCm, hu: huOut, rhoE, aboveCurveCm };
}
