// HU at any point of a CT volume by trilinear interpolation between the eight surrounding voxel
// centres; NaN outside the hull of the voxel centres.
import type { CtVolume } from './ctVolume';
import { dot, sub, type Vec3 } from './vec3';

/** Continuous voxel indices (i, j, k) of a patient point. */
export function voxelIndexOf(vol: CtVolume, pMm: Vec3): Vec3 {
  const rel = sub(pMm, vol.originMm);
  return [
    dot(rel, vol.rowCos) / vol.spacingMm[0],
    dot(rel, vol.colCos) / vol.spacingMm[1],
    dot(rel, vol.normal) / vol.spacingMm[2],
  ];
}

/** Trilinear HU at continuous voxel indices; NaN outside [0, n − 1] on any axis. */
export function huAtIndex(vol: CtVolume, fi: number, fj: number, fk: number): number {
  const { columns: ni, rows: nj, slices: nk, hu } = vol;
  const eps = 1e-9;
  if (!(
    fi >= -eps &&
    fj >= -eps &&
    fk >= -eps &&
    fi <= ni - 1 + eps &&
    fj <= nj - 1 + eps &&
    fk <= nk - 1 + eps
  ))
    return NaN;
  const i0 = Math.min(Math.max(Math.floor(fi), 0), Math.max(ni - 2, 0));
  const j0 = Math.min(Math.max(Math.floor(fj), 0), Math.max(nj - 2, 0));
  const k0 = Math.min(Math.max(Math.floor(fk), 0), Math.max(nk - 2, 0));
  const i1 = Math.min(i0 + 1, ni - 1);
  const j1 = Math.min(j0 + 1, nj - 1);
  const k1 = Math.min(k0 + 1, nk - 1);
  const u = Math.min(Math.max(fi - i0, 0), 1);
  const v = Math.min(Math.max(fj - j0, 0), 1);
  const w = Math.min(Math.max(fk - k0, 0), 1);
  const at = (i: number, j: number, k: number) => hu[(k * nj + j) * ni + i] as number;
  const c00 = at(i0, j0, k0) * (1 - u) + at(i1, j0, k0) * u;
  const c10 = at(i0, j1, k0) * (1 - u) + at(i1, j1, k0) * u;
  const c01 = at(i0, j0, k1) * (1 - u) + at(i1, j0, k1) * u;
  const c11 = at(i0, j1, k1) * (1 - u) + at(i1, j1, k1) * u;
  const c0 = c00 * (1 - v) + c10 * v;
  const c1 = c01 * (1 - v) + c11 * v;
  return c0 * (1 - w) + c1 * w;
}

export function huAt(vol: CtVolume, pMm: Vec3): number {
  const [i, j, k] = voxelIndexOf(vol, pMm);
  return huAtIndex(vol, i, j, k);
}
