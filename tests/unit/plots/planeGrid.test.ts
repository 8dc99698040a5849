import { describe, expect, it } from 'vitest';
import {
  bilinearAt,
  centralAxisMax,
  isDrawable,
  planeDifferencePercent,
  resampleOnto,
  rowAtDepth,
  type PlaneGrid,
} from '../../../src/plots/planeGrid';
import { expectAbsClose, expectRelClose } from '../../helpers/expectClose';

// A plane f(x, z) = 2 + 0.5 x − 0.25 z + 0.1 x z is bilinear, so bilinear interpolation must
// reproduce it exactly (to rounding) anywhere inside the grid.
const f = (x: number, z: number) => 2 + 0.5 * x - 0.25 * z + 0.1 * x * z;
function gridOf(xCm: number[], depthCm: number[], fn = f): PlaneGrid {
  return { xCm, depthCm, values: depthCm.map((z) => xCm.map((x) => fn(x, z))) };
}
const coarse = gridOf([-4, -2, 0, 2, 4], [0, 1, 3, 6]);

describe('bilinearAt(...)', () => {
  it('bilinearAt(...) reproduces a bilinear function between uneven nodes', () => {
    for (const [x, z] of [
      [-3.3, 0.4],
      [0.7, 2.2],
      [3.9, 5.5],
      [-1, 3],
    ] as const)
      expectRelClose(bilinearAt(coarse, x, z), f(x, z), 1e-12); // rounding only
  });

  it('bilinearAt(...) returns the node value exactly on a node', () => {
    expect(bilinearAt(coarse, 2, 3)).toBe(f(2, 3));
  });

  it('bilinearAt(...) clamps outside the grid to the nearest edge value', () => {
    expect(bilinearAt(coarse, 10, 0)).toBe(f(4, 0));
    expect(bilinearAt(coarse, 0, -5)).toBe(f(0, 0));
  });
});

describe('rowAtDepth(...) and centralAxisMax(...)', () => {
  it('rowAtDepth(...) interpolates linearly between the two nearest rows', () => {
    const row = rowAtDepth(coarse, 2);
    row.forEach((v, i) => expectRelClose(v, f(coarse.xCm[i] as number, 2), 1e-12)); // rounding
  });

  it('centralAxisMax(...) finds the largest central-axis value, not the largest anywhere', () => {
    // Peak on axis 1.0 at z = 1; off-axis values larger (2.0) must not count.
    const g = gridOf([-1, 0, 1], [0, 1, 2], (x, z) => (x === 0 ? 1 - Math.abs(z - 1) * 0.2 : 2));
    expect(centralAxisMax(g)).toBe(1);
  });
});

describe('resampleOnto(...) and planeDifferencePercent(...)', () => {
  const fine = gridOf(
    [-5, -2.5, 0, 2.5, 5],
    [0, 0.5, 1, 1.5, 2, 2.5, 3, 3.5, 4, 4.5, 5, 5.5, 6, 6.5, 7],
  );

  it('resampleOnto(...) keeps only the target nodes inside the source extent', () => {
    const r = resampleOnto(coarse, fine);
    expect(r.xCm).toEqual([-2.5, 0, 2.5]);
    expect(r.depthCm[r.depthCm.length - 1]).toBe(6);
    expect(r.depthCm[0]).toBe(0);
    // Absolute: f crosses zero on this grid; rounding only.
    r.values.forEach((row, iz) =>
      row.forEach((v, ix) =>
        expectAbsClose(v, f(r.xCm[ix] as number, r.depthCm[iz] as number), 1e-12),
      ),
    );
  });

  it('planeDifferencePercent(...) of a plane with itself on another grid is zero', () => {
    const d = planeDifferencePercent(coarse, fine, 2);
    expect(d.values.length).toBeGreaterThan(0);
    for (const row of d.values) for (const v of row) expect(Math.abs(v)).toBeLessThan(1e-10);
  });

  it('planeDifferencePercent(...) gives (a − b) in % of the reference dose on b’s nodes', () => {
    const b = gridOf([-1, 0, 1], [0, 1, 2], () => 2);
    const a = gridOf([-2, -1, 0, 1, 2], [0, 0.5, 1, 1.5, 2], () => 2.1);
    const d = planeDifferencePercent(a, b, 2);
    expect(d.xCm).toEqual([-1, 0, 1]);
    for (const row of d.values) for (const v of row) expectRelClose(v, 5, 1e-12); // (2.1 − 2)/2 = 5 %
  });
});

describe('isDrawable(...)', () => {
  it('isDrawable(...) rejects a plane with a NaN or a ragged row', () => {
    expect(isDrawable(coarse)).toBe(true);
    expect(
      isDrawable({
        ...coarse,
        values: coarse.values.map((r, i) => (i === 1 ? [...r.slice(0, 2), NaN, ...r.slice(3)] : r)),
      }),
    ).toBe(false);
    expect(isDrawable({ ...coarse, values: coarse.values.map((r) => r.slice(1)) })).toBe(false);
  });
});
