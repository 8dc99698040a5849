// Trilinear interpolation reproduces any linear HU field exactly (derived); the ray is sampled
// inside the volume only, at the requested step.
import { describe, expect, it } from 'vitest';
import type { CtVolume } from '../../../src/dicom/ctVolume';
import { rayInterval, sampleRay } from '../../../src/dicom/rayTrace';
import { huAt } from '../../../src/dicom/trilinear';

function linearVolume(): CtVolume {
  const [ni, nj, nk] = [6, 5, 4];
  const hu = new Int16Array(ni * nj * nk);
  const origin = [-10, 20, 5] as const;
  const spacing = [2, 3, 4] as const;
  for (let k = 0; k < nk; k++)
    for (let j = 0; j < nj; j++)
      for (let i = 0; i < ni; i++) {
        // Rows along −x (rowCos −1, 0, 0): x = origin − 2i.
        const x = origin[0] - spacing[0] * i;
        const y = origin[1] + spacing[1] * j;
        // Slices along the normal (0, 0, −1): z = origin − 4k.
        const z = origin[2] - spacing[2] * k;
        hu[(k * nj + j) * ni + i] = 3 * x + 2 * y - z;
      }
  return {
    seriesInstanceUid: 's',
    frameOfReferenceUid: null,
    patientPosition: 'HFS',
    columns: ni,
    rows: nj,
    slices: nk,
    originMm: origin,
    rowCos: [-1, 0, 0],
    colCos: [0, 1, 0],
    normal: [0, 0, -1],
    spacingMm: spacing,
    hu,
  };
}

describe('trilinear HU', () => {
  const v = linearVolume();
  const field = (p: readonly number[]) => 3 * p[0]! + 2 * p[1]! - p[2]!;
  it('is exact for a linear field anywhere inside', () => {
    for (const p of [
      [-12.3, 24.1, 1.7],
      [-10, 20, 5],
      [-20, 32, -7],
    ] as const)
      expect(huAt(v, p)).toBeCloseTo(field(p), 9);
  });

  it('is NaN outside the voxel centres', () => {
    expect(huAt(v, [-9, 20, 5])).toBeNaN();
    expect(huAt(v, [-12, 20, 6])).toBeNaN();
  });

  it('samples a ray only inside the volume, at the step asked for', () => {
    const source = [-15, 26, 100] as const;
    const dir = [0, 0, -1] as const;
    const span = rayInterval(v, source, dir);
    expect(span).toEqual([95, 107]);
    const r = sampleRay(v, source, dir, 0.5);
    expect(r?.startMm).toBe(95);
    expect(r?.hu.length).toBe(25);
    expect(() => sampleRay(v, source, dir, 1.5)).toThrow(/ray step must lie in \(0, 1\] mm/);
    expect(sampleRay(v, [100, 100, 100], [1, 0, 0])).toBeNull();
  });
});
