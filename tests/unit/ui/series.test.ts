import type { MethodId } from '../../../src/engine/methodRegistry';
import { describe, expect, it } from 'vitest';
import type { CalcReport } from '../../../src/compute/calculateCase';
import type { MethodResult } from '../../../src/engine/methodResult';
import { cfSeries, doseSeries } from '../../../src/ui/series';

function method(id: MethodId, dose: (number | null)[]): MethodResult {
  return {
    id,
    label: id,
    variant: '',
    methodClass: id === 'water' ? 'none' : 'type A',
    waterData: 'test',
    curve: { depthCm: dose.map((_, i) => i), dosePerMuCGy: dose, cf: dose.map(() => 1) },
    points: [],
  };
}

// Only `methods` is read by the series builders.
const report = {
  methods: [method('water', [0.5, 1, 0.8]), method('rtmr', [0.5, 1.2, 0.9])],
} as unknown as CalcReport;

describe('doseSeries(...)', () => {
  it('normalises to the water curve even when water is hidden from the chart', () => {
    const r = doseSeries(report, ['water'], 'percentWaterDmax');
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.series.map((s) => s.id)).toEqual(['rtmr']);
    expect(r.series[0]?.values.map((v) => (v === null ? null : Math.round(v * 1e6) / 1e6))).toEqual(
      [50, 120, 90],
    );
  });

  it('cfSeries(...) leaves hidden methods out', () => {
    expect(cfSeries(report, ['rtmr']).map((s) => s.id)).toEqual(['water']);
  });
});
