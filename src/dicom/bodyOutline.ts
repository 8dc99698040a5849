// Where the ray enters and leaves the body: the first and last crossings of a HU threshold along
// the sampled ray, placed between samples by linear interpolation. A threshold between air
// (−1000 HU) and fat (about −100 HU) separates the body from the air around it (common practice;
// −400 HU by default, editable). Everything between the two crossings — lung and air cavities
// included — is the path through the patient.
import type { RaySamples } from './rayTrace';

export const DEFAULT_BODY_THRESHOLD_HU = -400;

export interface BodyCrossing {
  /** Distance from the source to the skin entry (mm). */
  entryMm: number;
  /** Distance from the source to the last exit from the body (mm). */
  exitMm: number;
  /** The body continues past the end of the scanned volume (the exit is the volume's edge). */
  exitAtVolumeEdge: boolean;
}

export type BodyCrossingResult = { ok: true; value: BodyCrossing } | { ok: false; message: string };

export function findBodyCrossing(ray: RaySamples, thresholdHu: number): BodyCrossingResult {
  const { hu, startMm, stepMm } = ray;
  const inside = (m: number) => (hu[m] as number) >= thresholdHu; // NaN compares false: outside
  let first = -1;
  for (let m = 0; m < hu.length; m++)
    if (inside(m)) {
      first = m;
      break;
    }
  if (first < 0)
    return {
      ok: false,
      message: `the ray crosses nothing at or above the body threshold (${thresholdHu} HU)`,
    };
  if (first === 0)
    return {
      ok: false,
      message:
        'the ray enters the CT volume already inside the body: the scan does not cover the beam path up to the skin',
    };
  let last = first;
  for (let m = hu.length - 1; m > first; m--)
    if (inside(m)) {
      last = m;
      break;
    }
  const cross = (a: number, b: number) => {
    const ha = hu[a] as number;
    const hb = hu[b] as number;
    const f = hb === ha ? 0.5 : (thresholdHu - ha) / (hb - ha);
    return startMm + stepMm * (a + f * (b - a));
  };
  const entryMm = cross(first - 1, first);
  const exitAtVolumeEdge = last === hu.length - 1;
  const exitMm = exitAtVolumeEdge ? startMm + stepMm * last : cross(last, last + 1);
  return { ok: true, value: { entryMm, exitMm, exitAtVolumeEdge } };
}
