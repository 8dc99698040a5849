// A CT series to a volume: sorting along the slice normal and the geometry checks (PS3.3
// C.7.6.2.1.1 Image Position/Orientation), HU by rescale slope and intercept (PS3.3 C.11.1.1.2).
import { describe, expect, it } from 'vitest';
import { assembleCtVolume, type CtVolume } from '../../../src/dicom/ctVolume';
import { readCtSlice, type CtSlice } from '../../../src/dicom/ctSlice';
import { readDicomFile } from '../../../src/dicom/readPart10';
import { huAt } from '../../../src/dicom/trilinear';
import {
  gridCovering,
  writeCtSeries,
  type CtSeriesSpec,
  type Vec3,
} from '../../helpers/dicomPhantom';

/** HU that identify the voxel: 10·x + y (mm) + z, integers on a 1 mm grid. */
const ramp = (p: Vec3) => Math.round(p[0]) * 10 + Math.round(p[1]) + Math.round(p[2]) * 3;
const grid = gridCovering([-8, -6, -10], [8, 6, 10], { rowMm: 2, colMm: 2, sliceMm: 2 });

function slices(spec: Partial<CtSeriesSpec> = {}): CtSlice[] {
  return writeCtSeries({ grid, huAt: ramp, patientPosition: 'HFS', ...spec }).map((f) => {
    const r = readDicomFile(f.name, f.bytes);
    if (!r.ok) throw new Error(r.message);
    const s = readCtSlice(r.file);
    if (!s.ok) throw new Error(s.message);
    return s.slice;
  });
}

function volume(spec: Partial<CtSeriesSpec> = {}): CtVolume {
  const r = assembleCtVolume(slices(spec));
  if (!r.ok) throw new Error(r.message);
  return r.volume;
}

const message = (spec: Partial<CtSeriesSpec>) => {
  const r = assembleCtVolume(slices(spec));
  return r.ok ? 'accepted' : r.message;
};

describe('assembleCtVolume', () => {
  it('sorts scrambled slices by position and gives each voxel its HU', () => {
    const v = volume({ shuffle: true });
    expect(v.slices).toBe(grid.slices);
    expect(v.spacingMm).toEqual([2, 2, 2]);
    for (const p of [
      [-8, -6, -10],
      [4, 2, 6],
      [8, 6, 10],
    ] as Vec3[])
      expect(huAt(v, p)).toBe(ramp(p));
  });

  it.each([
    ['signed pixels, intercept 0', { signedPixels: true }],
    ['unsigned pixels, intercept −1024', { signedPixels: false }],
    ['implicit VR', { syntax: 'implicit' as const }],
  ])('reads HU with %s', (_, spec) => {
    const v = volume(spec);
    expect(huAt(v, [6, -4, 2])).toBe(ramp([6, -4, 2]));
  });

  it('applies a rescale slope of 0.5 (HU to within half a unit)', () => {
    const v = volume({ rescaleSlope: 0.5 });
    expect(Math.abs(huAt(v, [6, -4, 2]) - ramp([6, -4, 2]))).toBeLessThanOrEqual(0.5);
  });

  it('reads a series stored with rows and columns reversed (orientation −1, 0, 0 / 0, −1, 0)', () => {
    const g = gridCovering(
      [-8, -6, -10],
      [8, 6, 10],
      { rowMm: 2, colMm: 2, sliceMm: 2 },
      [-1, 0, 0],
      [0, -1, 0],
    );
    const r = assembleCtVolume(
      writeCtSeries({ grid: g, huAt: ramp, patientPosition: 'HFP' }).map((f) => {
        const d = readDicomFile(f.name, f.bytes);
        if (!d.ok) throw new Error(d.message);
        const s = readCtSlice(d.file);
        if (!s.ok) throw new Error(s.message);
        return s.slice;
      }),
    );
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.volume.normal).toEqual([0, 0, 1]);
    expect(huAt(r.volume, [6, -4, 2])).toBe(ramp([6, -4, 2]));
  });

  it('refuses a series with a missing slice, naming where', () => {
    expect(message({ omitSlice: 4 })).toMatch(
      /1 slice missing between -4\.00 mm and 0\.00 mm \(spacing 2\.00 mm\)/,
    );
  });

  it('refuses a non-axial (sagittal) series', () => {
    expect(message({ orientationOf: () => [0, 1, 0, 0, 0, -1] })).toMatch(
      /not axial: slice normal/,
    );
  });

  it('refuses a sheared series (in-plane origin moving with the slice: gantry tilt)', () => {
    expect(message({ originShiftMm: (k) => [0, 0.5 * k, 0] })).toMatch(/sheared series/);
  });

  it('refuses slices whose orientation differs', () => {
    expect(
      message({
        orientationOf: (k) => (k === 3 ? [1, 0, 0, 0, 0.999, 0.0447] : [1, 0, 0, 0, 1, 0]),
      }),
    ).toMatch(/Image Orientation \(Patient\) differs/);
  });

  it('refuses two slices at the same position', () => {
    const s = slices();
    const r = assembleCtVolume([...s, { ...s[2]!, name: 'copy.dcm' }]);
    expect(r.ok ? '' : r.message).toMatch(/lie at the same position/);
  });

  it('refuses uneven spacing that is not a missing slice', () => {
    const s = slices();
    const moved = {
      ...s[3]!,
      positionMm: [s[3]!.positionMm[0], s[3]!.positionMm[1], s[3]!.positionMm[2] + 0.7] as const,
    };
    const r = assembleCtVolume([...s.slice(0, 3), moved, ...s.slice(4)]);
    expect(r.ok ? '' : r.message).toMatch(/uneven slice spacing/);
  });
});
