import { describe, expect, it } from 'vitest';
import { colourBar, doseMapLayout, parseRgb, planeRaster } from '../../../src/plots/doseMapLayout';
import { indexMapper, isodoseLines } from '../../../src/plots/isodose';
import type { PlaneGrid } from '../../../src/plots/planeGrid';
import { profileLayout } from '../../../src/plots/profileLayout';
import { expectAbsClose } from '../../helpers/expectClose';

const frame = { width: 420, height: 220, margin: { top: 10, right: 20, bottom: 30, left: 60 } };

function gridOf(xCm: number[], depthCm: number[], fn: (x: number, z: number) => number): PlaneGrid {
  return { xCm, depthCm, values: depthCm.map((z) => xCm.map((x) => fn(x, z))) };
}
const range = (a: number, b: number, step: number) =>
  Array.from({ length: Math.round((b - a) / step) + 1 }, (_, i) => a + i * step);

describe('doseMapLayout(...)', () => {
  const grid = gridOf([-2, 0, 2], [0, 5, 10, 15, 20], () => 1);
  const layout = doseMapLayout({
    grid,
    maxDepthCm: 20,
    halfWidthCm: 4,
    frame,
    interfacesCm: [0, 5, 20],
  });

  it('doseMapLayout(...) puts depth across on the slab strip’s axis and +x at the top', () => {
    expect(layout.x(0)).toBe(60);
    expect(layout.x(20)).toBe(400);
    expect(layout.y(4)).toBe(10);
    expect(layout.y(-4)).toBe(190);
  });

  it('doseMapLayout(...) extends the raster half a node spacing beyond the outer nodes', () => {
    // depth nodes 0…20 every 5 cm → image from −2.5 to 22.5 cm; x nodes ±2 every 2 cm → ±3 cm
    expect(layout.image.x).toBe(Math.round(layout.x(-2.5) * 10) / 10);
    expect(layout.image.width).toBe(Math.round((layout.x(22.5) - layout.x(-2.5)) * 10) / 10);
    expect(layout.image.y).toBe(Math.round(layout.y(3) * 10) / 10);
    expect(layout.image.height).toBe(Math.round((layout.y(-3) - layout.y(3)) * 10) / 10);
  });

  it('doseMapLayout(...) draws only the interfaces inside the phantom', () => {
    expect(layout.interfaces).toEqual([145]);
  });
});

describe('planeRaster(...)', () => {
  it('planeRaster(...) lays depth along image columns and +x on the top row; NaN is transparent', () => {
    const g: PlaneGrid = {
      xCm: [-1, 1],
      depthCm: [0, 1, 2],
      values: [
        [1, 2],
        [3, NaN],
        [5, 6],
      ],
    };
    const r = planeRaster(g, (v) => [v, 10 * v, 0]);
    expect([r.width, r.height]).toEqual([3, 2]);
    const px = (col: number, row: number) =>
      Array.from(r.rgba.subarray((row * 3 + col) * 4, (row * 3 + col) * 4 + 4));
    expect(px(0, 0)).toEqual([2, 20, 0, 255]); // depth 0, x = +1 (top row)
    expect(px(0, 1)).toEqual([1, 10, 0, 255]); // depth 0, x = −1
    expect(px(1, 0)).toEqual([0, 0, 0, 0]); // NaN → transparent
    expect(px(2, 1)).toEqual([5, 50, 0, 255]);
  });
});

describe('colourBar(...) and parseRgb(...)', () => {
  it('colourBar(...) spans the domain with round ticks and 11 gradient stops', () => {
    const bar = colourBar([0, 110], (t) => `rgb(${Math.round(255 * t)}, 0, 0)`, {
      x: 60,
      y: 200,
      width: 300,
      height: 10,
    });
    expect(bar.stops).toHaveLength(11);
    expect(bar.stops[10]).toEqual({ offset: 1, color: 'rgb(255, 0, 0)' });
    expect(bar.ticks[0]).toMatchObject({ value: 0, px: 60 });
    expect(bar.ticks.map((t) => t.value)).toContain(100);
  });

  it('parseRgb(...) reads both rgb() and #rrggbb colours', () => {
    expect(parseRgb('rgb(12, 34, 56)')).toEqual([12, 34, 56]);
    expect(parseRgb('#440154')).toEqual([0x44, 0x01, 0x54]);
  });
});

describe('isodoseLines(...)', () => {
  // A field-like plane: 1 inside |x| < 3 cm, falling linearly to 0 at |x| = 5 cm, everywhere in
  // depth. The 50 % line is then exactly at |x| = 4 cm, and it must not run along the grid edges.
  const xCm = range(-8, 8, 0.5);
  const depthCm = range(0, 10, 0.5);
  const g = gridOf(xCm, depthCm, (x) => Math.max(0, Math.min(1, (5 - Math.abs(x)) / 2)));
  const toCm = indexMapper(g, (x, z) => [z, x]); // px = (depth, lateral) in cm for the test

  it('isodoseLines(...) places the 50 % line where the plane crosses half the normalisation dose', () => {
    const [line] = isodoseLines(g, 1, [50], toCm);
    expect(line?.percent).toBe(50);
    const pts = [...(line?.d ?? '').matchAll(/[ML](-?[\d.]+),(-?[\d.]+)/g)].map((m) => [
      Number(m[1]),
      Number(m[2]),
    ]);
    expect(pts.length).toBeGreaterThan(10);
    // Rounded to 0.1 in the path; the crossing is on a node-spacing boundary (4 cm), so ≤ 0.05 cm.
    for (const [, x] of pts) expectAbsClose(Math.abs(x as number), 4, 0.05);
  });

  it('isodoseLines(...) drops the closing runs d3 adds along the grid edge', () => {
    const [line] = isodoseLines(g, 1, [50], toCm);
    const pts = [...(line?.d ?? '').matchAll(/[ML](-?[\d.]+),(-?[\d.]+)/g)];
    // Without dropping, the ring would close along depth 0 and depth 10 from x = −4 to +4.
    expect(pts.every((m) => Math.abs(Math.abs(Number(m[2])) - 4) < 0.05)).toBe(true);
    expect((line?.d.match(/M/g) ?? []).length).toBe(2); // two separate lines, x = +4 and x = −4
  });

  it('isodoseLines(...) labels each level at most once, without two labels overlapping', () => {
    const lines = isodoseLines(
      g,
      1,
      [20, 50, 80],
      indexMapper(g, (x, z) => [20 * z, 200 - 10 * x]),
    );
    const labels = lines.map((l) => l.label).filter((l) => l !== null);
    expect(labels).toHaveLength(3);
    for (let i = 0; i < labels.length; i++)
      for (let j = i + 1; j < labels.length; j++) {
        const a = labels[i]!;
        const b = labels[j]!;
        expect(Math.abs(a.x - b.x) >= 30 || Math.abs(a.y - b.y) >= 12).toBe(true);
      }
  });

  it('isodoseLines(...) returns nothing for a zero normalisation dose (no NaN paths)', () => {
    expect(isodoseLines(g, 0, [50], toCm)).toEqual([]);
  });
});

describe('profileLayout(...)', () => {
  it('profileLayout(...) centres x = 0 and starts the dose axis at 0', () => {
    const layout = profileLayout({
      series: [
        { id: 'a', label: 'A', color: 'red', dash: '', xCm: [-5, 0, 5], values: [0.1, 1, 0.1] },
        { id: 'b', label: 'B', color: 'blue', dash: '', xCm: [-10, 0, 10], values: [NaN, 0.9, 0] },
      ],
      halfWidthCm: 5,
      frame,
    });
    expect(layout.x(0)).toBe(230);
    expect(layout.y.domain()[0]).toBe(0);
    expect(layout.y.domain()[1]).toBeGreaterThanOrEqual(1);
    expect(layout.curves[0]?.d).toBe(
      `M60,${layout.y(0.1).toFixed(1).replace(/\.0$/, '')}L230,${layout.y(1).toFixed(1).replace(/\.0$/, '')}L400,${layout.y(0.1).toFixed(1).replace(/\.0$/, '')}`,
    );
    // B: NaN and nodes beyond the half-width are left out, leaving a single node (no NaN in d).
    expect(layout.curves[1]?.d).not.toMatch(/NaN/);
    expect(layout.empty).toBe(false);
  });
});
