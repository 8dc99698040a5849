// HU along a ray from the source: the part of the ray inside the CT volume, sampled at a fixed
// step (at most 1 mm) by trilinear interpolation.
import type { CtVolume } from './ctVolume';
import { huAtIndex, voxelIndexOf } from './trilinear';
import { addScaled, type Vec3 } from './vec3';

export const MAX_RAY_STEP_MM = 1;
export const DEFAULT_RAY_STEP_MM = 0.5;

export interface RaySamples {
  /** Distance from the source of sample 0 (mm). */
  startMm: number;
  stepMm: number;
  /** HU at startMm + m·stepMm from the source. */
  hu: Float32Array;
}

/**
 * The interval of distances t from the source (along the unit direction) where the ray lies in
 * the hull of the voxel centres, or null when it misses the volume.
 */
export function rayInterval(vol: CtVolume, sourceMm: Vec3, dir: Vec3): [number, number] | null {
  const a = voxelIndexOf(vol, sourceMm);
  const b = voxelIndexOf(vol, addScaled(sourceMm, dir, 1));
  const sizes = [vol.columns, vol.rows, vol.slices];
  let lo = -Infinity;
  let hi = Infinity;
  for (let axis = 0; axis < 3; axis++) {
    const p = a[axis] as number;
    const q = (b[axis] as number) - p; // index change per mm
    const max = (sizes[axis] as number) - 1;
    if (Math.abs(q) < 1e-12) {
      if (p < 0 || p > max) return null;
      continue;
    }
    const t1 = (0 - p) / q;
    const t2 = (max - p) / q;
    lo = Math.max(lo, Math.min(t1, t2));
    hi = Math.min(hi, Math.max(t1, t2));
  }
  return lo <= hi ? [lo, hi] : null;
}

export function sampleRay(
  vol: CtVolume,
  sourceMm: Vec3,
  dir: Vec3,
  stepMm: number = DEFAULT_RAY_STEP_MM,
): RaySamples | null {
  if (!(stepMm > 0 && stepMm <= MAX_RAY_STEP_MM))
    throw new Error(`ray step must lie in (0, ${MAX_RAY_STEP_MM}] mm, got ${stepMm}`);
  const span = rayInterval(vol, sourceMm, dir);
  if (!span) return null;
  const [t0, t1] = span;
  const count = Math.floor((t1 - t0) / stepMm + 1e-9) + 1;
  const hu = new Float32Array(count);
  const a = voxelIndexOf(vol, sourceMm);
  const b = voxelIndexOf(vol, addScaled(sourceMm, dir, 1));
  const d = [b[0] - a[0], b[1] - a[1], b[2] - a[2]] as const;
  for (let m = 0; m < count; m++) {
    const t = t0 + m * stepMm;
    hu[m] = huAtIndex(vol, a[0] + d[0] * t, a[1] + d[1] * t, a[2] + d[2] * t);
  }
  return { startMm: t0, stepMm, hu };
}
