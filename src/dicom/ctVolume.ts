// Slices of one CT series to a volume: sorted by position along the slice normal (the Image
// Position (Patient) projected on row × column cosines, PS3.3 C.7.6.2.1.1), with the checks that
// keep the geometry honest: same size, spacing and orientation in every slice, an axial
// orientation, no shear (gantry tilt), no duplicate or missing slices, even spacing.
import type { CtSlice } from './ctSlice';
import { cross, dot, formatVec, norm, sub, addScaled, type Vec3 } from './vec3';

export interface CtVolume {
  seriesInstanceUid: string;
  frameOfReferenceUid: string | null;
  patientPosition: string | null;
  columns: number;
  rows: number;
  slices: number;
  /** Centre of voxel (column 0, row 0, slice 0) (mm, patient coordinates). */
  originMm: Vec3;
  rowCos: Vec3;
  colCos: Vec3;
  /** Slice normal rowCos × colCos; slices are stored in increasing position along it. */
  normal: Vec3;
  /** Voxel spacing along column index i, row index j, slice index k (mm). */
  spacingMm: readonly [number, number, number];
  /** HU at (i, j, k), index (k·rows + j)·columns + i. */
  hu: Int16Array;
}

export type CtVolumeResult =
  { ok: true; volume: CtVolume; notes: string[] } | { ok: false; message: string };

const ORIENTATION_TOL = 1e-3;
const SHEAR_TOL_MM = 0.05;

function sameVec(a: Vec3, b: Vec3, tol: number): boolean {
  return (
    Math.abs(a[0] - b[0]) <= tol && Math.abs(a[1] - b[1]) <= tol && Math.abs(a[2] - b[2]) <= tol
  );
}

function median(values: number[]): number {
  const s = [...values].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)] as number;
}

export function assembleCtVolume(input: readonly CtSlice[]): CtVolumeResult {
  const fail = (message: string): CtVolumeResult => ({ ok: false, message });
  const first = input[0];
  if (!first) return fail('no CT slices');
  if (input.length < 2) return fail('only one CT slice: a volume needs at least two');
  const r = first.rowCos;
  const c = first.colCos;
  if (
    Math.abs(norm(r) - 1) > ORIENTATION_TOL ||
    Math.abs(norm(c) - 1) > ORIENTATION_TOL ||
    Math.abs(dot(r, c)) > ORIENTATION_TOL
  )
    return fail(
      `Image Orientation (Patient) ${formatVec(r, 4)} ${formatVec(c, 4)} is not two orthogonal unit vectors`,
    );
  const n = cross(r, c);
  if (Math.abs(n[2]) < 1 - ORIENTATION_TOL)
    return fail(
      `the series is not axial: slice normal ${formatVec(n, 3)} (Lamina reads axial CT only; reformat or rescan without gantry tilt)`,
    );
  for (const s of input) {
    if (s.rows !== first.rows || s.columns !== first.columns)
      return fail(
        `${s.name}: ${s.rows} × ${s.columns} pixels, the series has ${first.rows} × ${first.columns}`,
      );
    if (
      Math.abs(s.pixelSpacingMm[0] - first.pixelSpacingMm[0]) > 1e-4 ||
      Math.abs(s.pixelSpacingMm[1] - first.pixelSpacingMm[1]) > 1e-4
    )
      return fail(`${s.name}: pixel spacing differs from the rest of the series`);
    if (!sameVec(s.rowCos, r, ORIENTATION_TOL) || !sameVec(s.colCos, c, ORIENTATION_TOL))
      return fail(
        `${s.name}: Image Orientation (Patient) differs from the rest of the series (tilted or mixed series)`,
      );
    if (s.patientPosition !== first.patientPosition)
      return fail(
        `${s.name}: Patient Position ${s.patientPosition ?? '(none)'} differs from ${first.patientPosition ?? '(none)'}`,
      );
    if (s.frameOfReferenceUid !== first.frameOfReferenceUid)
      return fail(`${s.name}: Frame of Reference UID differs from the rest of the series`);
  }
  const sorted = [...input]
    .map((s) => ({ s, along: dot(s.positionMm, n) }))
    .sort((a, b) => a.along - b.along);
  // Every slice's origin must lie on the line origin₀ + t·normal: otherwise the series is sheared.
  const base = sorted[0]!;
  for (const { s, along } of sorted) {
    const expected = addScaled(base.s.positionMm, n, along - base.along);
    const off = norm(sub(s.positionMm, expected));
    if (off > SHEAR_TOL_MM)
      return fail(
        `${s.name}: slice origin is ${off.toFixed(2)} mm off the slice normal through the first slice (sheared series, e.g. gantry tilt): not handled`,
      );
  }
  const gaps = sorted.slice(1).map((x, i) => x.along - sorted[i]!.along);
  const dup = gaps.findIndex((g) => g < 1e-3);
  if (dup >= 0)
    return fail(
      `${sorted[dup]!.s.name} and ${sorted[dup + 1]!.s.name} lie at the same position (${sorted[dup]!.along.toFixed(2)} mm): two series mixed, or a duplicate slice`,
    );
  const step = median(gaps);
  const tol = Math.max(0.01, 0.01 * step);
  for (let i = 0; i < gaps.length; i++) {
    const g = gaps[i]!;
    if (Math.abs(g - step) <= tol) continue;
    const at = `${sorted[i]!.along.toFixed(2)} mm and ${sorted[i + 1]!.along.toFixed(2)} mm`;
    const missing = Math.round(g / step) - 1;
    if (missing >= 1 && Math.abs(g - (missing + 1) * step) <= tol)
      return fail(
        `${missing} slice${missing > 1 ? 's' : ''} missing between ${at} (spacing ${step.toFixed(2)} mm)`,
      );
    return fail(
      `uneven slice spacing: ${g.toFixed(3)} mm between ${at}, ${step.toFixed(3)} mm elsewhere`,
    );
  }
  const plane = first.rows * first.columns;
  const hu = new Int16Array(plane * sorted.length);
  sorted.forEach(({ s }, k) => hu.set(s.hu, k * plane));
  const notes: string[] = [];
  if (first.patientPosition === null) notes.push('the CT has no Patient Position (0018,5100)');
  return {
    ok: true,
    volume: {
      seriesInstanceUid: first.seriesInstanceUid,
      frameOfReferenceUid: first.frameOfReferenceUid,
      patientPosition: first.patientPosition,
      columns: first.columns,
      rows: first.rows,
      slices: sorted.length,
      originMm: base.s.positionMm,
      rowCos: r,
      colCos: c,
      normal: n,
      spacingMm: [first.pixelSpacingMm[1], first.pixelSpacingMm[0], step],
      hu,
    },
    notes,
  };
}
