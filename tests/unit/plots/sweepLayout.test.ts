// The sweep chart's pure layout: shared scales across the energy panels, gaps for missing values,
// CF = 1 always inside the y range, energy names as x ticks.
import { describe, expect, it } from 'vitest';
import { sweepChartLayout } from '../../../src/plots/sweepLayout';

const frame = { width: 400, height: 200, margin: { top: 10, right: 10, bottom: 30, left: 50 } };
const line = (id: string, values: number[]) => ({ id, label: id, color: '#000', dash: '', values });

describe('sweepChartLayout', () => {
  it('sweepChartLayout(two panels) stacks them with the same y ticks and one path per method', () => {
    const l = sweepChartLayout({
      x: [0.1, 0.5, 1],
      frame,
      panels: [
        { title: '6 MV', lines: [line('rtmr', [1.4, 1.2, 1.0])] },
        { title: '18 MV', lines: [line('rtmr', [1.25, 1.1, 1.0])] },
      ],
    });
    expect(l.height).toBe(400);
    expect(l.panels.map((p) => p.top)).toEqual([0, 200]);
    expect(l.panels[0]?.yTicks).toEqual(l.panels[1]?.yTicks);
    expect(l.panels[0]?.curves[0]?.d).toMatch(/^M50,/);
    expect(l.panels[0]?.curves[0]?.dots).toHaveLength(3);
    expect(l.empty).toBe(false);
  });

  it('a NaN value leaves a gap (two path pieces) and no marker', () => {
    const l = sweepChartLayout({
      x: [1, 2, 3, 4],
      frame,
      panels: [{ title: '', lines: [line('batho', [1.1, Number.NaN, 1.2, 1.3])] }],
    });
    const d = l.panels[0]?.curves[0]?.d ?? '';
    expect(d.match(/M/g)).toHaveLength(2);
    expect(l.panels[0]?.curves[0]?.dots).toHaveLength(3);
  });

  it('keeps CF = 1 inside the y range and labels the x ticks with the energies when given', () => {
    const l = sweepChartLayout({
      x: [1.25, 6, 18],
      xNames: ['Co-60', '6MV', '18MV'],
      frame,
      panels: [{ title: '', lines: [line('rtmr', [1.5, 1.3, 1.2])] }],
    });
    const values = l.panels[0]?.yTicks.map((t) => t.value) ?? [];
    expect(Math.min(...values)).toBeLessThanOrEqual(1);
    expect(l.xTicks.map((t) => t.label)).toEqual(['Co-60', '6MV', '18MV']);
  });

  it('reports an empty chart when no value is finite', () => {
    const l = sweepChartLayout({
      x: [1, 2],
      frame,
      panels: [{ title: '', lines: [line('etar', [Number.NaN, Number.NaN])] }],
    });
    expect(l.empty).toBe(true);
  });
});
