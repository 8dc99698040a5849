// The hand-written curve path (src/plots/polylinePath.ts) writes exactly the text of d3's line
// generator with the linear curve and .digits(1) for the same points (derived: d3-shape's
// definition of the path, gaps at missing values, a lone point closed with Z). The chart's curves
// therefore look as they did when d3 drew them.
import fc from 'fast-check';
import { line } from 'd3-shape';
import { describe, expect, it } from 'vitest';
import { polylinePath } from '../../src/plots/polylinePath';

const value = fc.oneof(
  { weight: 6, arbitrary: fc.double({ min: -5, max: 5, noNaN: true }) },
  { weight: 1, arbitrary: fc.constant(null) },
  { weight: 1, arbitrary: fc.constantFrom(NaN, Infinity, -Infinity) },
);

function d3Path(
  xPx: readonly number[],
  values: readonly (number | null)[],
  y: (v: number) => number,
) {
  const isNum = (v: number | null | undefined): v is number =>
    typeof v === 'number' && Number.isFinite(v);
  return (
    line<number>()
      .defined((i) => isNum(values[i]))
      .x((i) => xPx[i] ?? 0)
      .y((i) => y(values[i] ?? 0))
      .digits(1)(xPx.map((_, i) => i)) ?? ''
  );
}

describe('polylinePath(...)', () => {
  it('writes the same text as d3 line().digits(1) for any values with gaps', () => {
    fc.assert(
      fc.property(
        fc.array(value, { maxLength: 60 }),
        fc.double({ min: 0.1, max: 300, noNaN: true }),
        fc.double({ min: -500, max: 500, noNaN: true }),
        (values, pxPerUnit, offset) => {
          const xPx = values.map((_, i) => 60 + i * 2.37);
          const y = (v: number) => offset - pxPerUnit * v;
          expect(polylinePath(xPx, values, y)).toBe(d3Path(xPx, values, y));
        },
      ),
      { numRuns: 500 },
    );
  });

  it('rounds any coordinate to 0.1 as d3-path does, far off the chart included', () => {
    fc.assert(
      fc.property(
        fc.array(fc.double({ min: -1e13, max: 1e13, noNaN: true }), { maxLength: 20 }),
        (ys) => {
          const xPx = ys.map((_, i) => -3.25 + i * 0.05);
          const y = (v: number) => v;
          expect(polylinePath(xPx, ys, y)).toBe(d3Path(xPx, ys, y));
        },
      ),
      { numRuns: 500 },
    );
  });

  it('starts a new run after a gap and closes a lone point (derived)', () => {
    const y = (v: number) => 100 - 10 * v;
    expect(polylinePath([0, 10, 20, 30, 40], [1, 2, null, 3, null], y)).toBe('M0,90L10,80M30,70Z');
    expect(polylinePath([0, 10], [null, null], y)).toBe('');
  });

  it('draws only as many samples as there are x positions', () => {
    const y = (v: number) => v;
    expect(polylinePath([0, 1], [5, 6, 7], y)).toBe('M0,5L1,6');
    expect(polylinePath([0, 1, 2], [5], y)).toBe('M0,5Z');
  });
});
