import { describe, expect, it } from 'vitest';
import {
  curveChartLayout,
  nearestIndex,
  spikeLimit,
  yDomainOf,
} from '../../../src/plots/curveLayout';
import { depthScale, depthTicks } from '../../../src/plots/depthAxis';

const frame = { width: 420, height: 220, margin: { top: 10, right: 20, bottom: 30, left: 60 } };

describe('depth axis', () => {
  it('depthScale(...) maps 0 to the left margin and the bottom of the phantom to the right edge', () => {
    const x = depthScale(20, frame);
    expect(x(0)).toBe(60);
    expect(x(20)).toBe(400);
    expect(x(10)).toBe(230);
  });

  it('depthTicks(...) gives round depths with labels, about one per 70 px', () => {
    const ticks = depthTicks(depthScale(20, frame));
    expect(ticks.map((t) => t.label)).toEqual(['0', '5', '10', '15', '20']);
    expect(ticks.map((t) => t.px)).toEqual([60, 145, 230, 315, 400]);
  });
});

describe('curveChartLayout(...)', () => {
  const depthCm = [0, 5, 10, 15, 20];
  const layout = curveChartLayout({
    depthCm,
    maxDepthCm: 20,
    frame,
    interfacesCm: [5],
    bands: [{ key: 'b', fromCm: 4, toCm: 6, severity: 'caution' }],
    series: [
      { id: 'water', label: 'Water', color: 'black', dash: '', values: [0.5, 1, 0.8, 0.6, 0.4] },
      {
        id: 'mc',
        label: 'MC',
        color: 'blue',
        dash: '4 4',
        values: [0.5, null, 0.9, 0.7, 0.5],
        sigma: [0.01, 0.01, 0.01, 0.01, 0.01],
      },
    ],
  });

  it('draws a gap where a value is null and rounds coordinates to 0.1 px', () => {
    expect(layout.curves.map((c) => c.d)).toMatchInlineSnapshot(`
      [
        "M60,115L145,40L230,70L315,100L400,130",
        "M60,115ZM230,55L315,85L400,115",
      ]
    `);
    expect(layout.curves[1]?.d.match(/M/g)).toHaveLength(2); // two pieces around the null
  });

  it('puts warning bands and interfaces on the shared depth scale', () => {
    expect(layout.bands).toEqual([{ key: 'b', severity: 'caution', x: 128, width: 34 }]);
    expect(layout.interfaces).toEqual([145]);
  });

  it('includes zero in the dose axis and draws a σ band for series that carry one', () => {
    expect(layout.y.domain()[0]).toBe(0);
    expect(layout.yTicks.map((t) => t.label)).toMatchInlineSnapshot(`
      [
        "0.0",
        "0.5",
        "1.0",
      ]
    `);
    expect(layout.sigmaBands.map((b) => b.id)).toEqual(['mc']);
    expect(layout.empty).toBe(false);
  });

  it('reports an empty chart when no series has a finite value', () => {
    const empty = curveChartLayout({
      depthCm,
      maxDepthCm: 20,
      frame,
      series: [
        { id: 'a', label: 'A', color: 'red', dash: '', values: [null, null, null, null, null] },
      ],
    });
    expect(empty.empty).toBe(true);
    expect(empty.curves[0]?.d).toBe('');
  });
});

describe('helpers', () => {
  it('yDomainOf(...) keeps values of correction factors near 1 off zero and pads by 5 %', () => {
    const [lo, hi] = yDomainOf([{ id: 'a', label: 'a', color: '', dash: '', values: [0.9, 1.1] }]);
    expect(lo).toBeCloseTo(0.89, 9);
    expect(hi).toBeCloseTo(1.11, 9);
  });

  it('nearestIndex(...) finds the grid depth nearest a pointer depth', () => {
    const grid = [0, 0.5, 1, 1.5, 2];
    expect(nearestIndex(grid, 0.74)).toBe(1);
    expect(nearestIndex(grid, 0.76)).toBe(2);
    expect(nearestIndex(grid, -3)).toBe(0);
    expect(nearestIndex(grid, 9)).toBe(4);
  });
});

describe('spikeLimit(...)', () => {
  const smooth = Array.from({ length: 100 }, (_, i) => 1 - i / 200); // 1 … 0.505
  const spiky = smooth.map((v, i) => (i === 30 || i === 31 ? 4.5 : v));

  it('cuts the axis above a narrow spike and names the clipped series in the layout', () => {
    const series = [
      { id: 'water', label: 'Water', color: '', dash: '', values: smooth },
      { id: 'batho', label: 'Batho', color: '', dash: '', values: spiky },
    ];
    // 95th percentile of the spiky set: sorted index 94 of 100 is smooth[3] = 0.985 (the two
    // spikes sit at the top); 1.15 × 0.985 = 1.13275.
    expect(spikeLimit(series)).toBeCloseTo(1.13275, 9);
    const l = curveChartLayout({
      depthCm: smooth.map((_, i) => i / 10),
      maxDepthCm: 9.9,
      series,
      frame,
      yInclude: [0],
    });
    expect(l.y.domain()[1]).toBeLessThan(1.5);
    expect(l.clipped).toEqual([{ id: 'batho', label: 'Batho', maxValue: 4.5 }]);
  });

  it('leaves smooth curves alone', () => {
    expect(spikeLimit([{ id: 'a', label: 'a', color: '', dash: '', values: smooth }])).toBeNull();
  });
});
