import type { MethodId } from '../../../src/engine/methodRegistry';
import { describe, expect, it } from 'vitest';
import type { MethodResult } from '../../../src/engine/methodResult';
import { normaliseMethods } from '../../../src/plots/normalise';
import { seriesStyles } from '../../../src/plots/palette';
import { densityShade, slabLayout } from '../../../src/plots/slabLayout';

const frame = { width: 420, height: 60, margin: { top: 0, right: 20, bottom: 0, left: 60 } };

function method(id: MethodId, dose: (number | null)[], sigma?: number[]): MethodResult {
  return {
    id,
    label: id,
    variant: '',
    methodClass: 'type A',
    waterData: 'test',
    curve: {
      depthCm: dose.map((_, i) => i),
      dosePerMuCGy: dose,
      cf: dose.map(() => 1),
      sigmaDosePerMuCGy: sigma,
    },
    points: [],
  };
}

describe('slabLayout(...)', () => {
  it('draws each layer to scale with a handle at every boundary below the surface', () => {
    const l = slabLayout(
      [
        { key: 'a', label: 'Soft tissue', thicknessCm: 3, relativeElectronDensity: 1.04 },
        { key: 'b', label: 'Lung', thicknessCm: 8, relativeElectronDensity: 0.26 },
        { key: 'c', label: 'Soft tissue', thicknessCm: 9, relativeElectronDensity: 1.04 },
      ],
      frame,
    );
    expect(l.rects.map((r) => [r.x, r.width, r.showLabel])).toEqual([
      [60, 51, false], // "Soft tissue" needs ≈ 80 px
      [111, 136, true],
      [247, 153, true],
    ]);
    expect(l.handles.map((h) => [h.k, h.x, h.depthCm])).toEqual([
      [1, 111, 3],
      [2, 247, 11],
      [3, 400, 20],
    ]);
  });

  it('slabLayout(..., scaleDepthCm) keeps the axis at the depth where a drag began', () => {
    const l = slabLayout(
      [{ key: 'a', label: 'Water', thicknessCm: 18, relativeElectronDensity: 1 }],
      frame,
      20,
    );
    expect(l.handles[0]).toEqual({ k: 1, x: 366, depthCm: 18 }); // 60 + 18/20 × 340
    expect(l.x(20)).toBe(400);
  });

  it('densityShade(...) is lighter for lower electron density and labels dark slabs in white', () => {
    const air = densityShade(0.001);
    const lung = densityShade(0.26);
    const bone = densityShade(1.78);
    const level = (s: string) => Number(/rgb\((\d+)/.exec(s)?.[1]);
    expect(level(air.fill)).toBeGreaterThan(level(lung.fill));
    expect(level(lung.fill)).toBeGreaterThan(level(densityShade(1).fill));
    expect(level(densityShade(1).fill)).toBeGreaterThan(level(bone.fill));
    expect(bone.dark).toBe(true);
    expect(lung.dark).toBe(false);
  });
});

describe('normaliseMethods(...)', () => {
  const water = method('water', [0.8, 1.0, 0.5]);
  const het = method('rtmr', [0.8, 1.1, null], [0.01, 0.02, 0.03]);

  it('gives percent of the water maximum, scaling σ alike', () => {
    const r = normaliseMethods([water, het], 'percentWaterDmax');
    expect(
      r.ok && r.series[1]?.values.map((v) => (v === null ? null : Math.round(v * 1e9) / 1e9)),
    ).toEqual([80, 110, null]);
    expect(r.ok && r.series[1]?.sigma?.map((s) => Math.round(s * 1e9) / 1e9)).toEqual([1, 2, 3]);
  });

  it('gives the ratio to water at the same depth', () => {
    const r = normaliseMethods([water, het], 'relativeToWater');
    expect(
      r.ok && r.series[1]?.values.map((v) => (v === null ? null : Math.round(v * 1e9) / 1e9)),
    ).toEqual([1, 1.1, null]);
  });

  it('says why when the water curve needed for a normalisation is missing', () => {
    const r = normaliseMethods([het], 'relativeToWater');
    expect(r.ok).toBe(false);
    expect(!r.ok && r.reason).toMatch(/water/);
  });
});

describe('seriesStyles(...)', () => {
  it('gives every method a distinct colour-and-dash pair, stable for known ids', () => {
    const ids = ['monte-carlo', 'water', 'rtmr', 'batho', 'etar', 'unknown-a', 'unknown-b'];
    const styles = seriesStyles(ids);
    const pairs = ids.map((id) => `${styles.get(id)?.color}|${styles.get(id)?.dash}`);
    expect(new Set(pairs).size).toBe(ids.length);
    expect(seriesStyles(['rtmr']).get('rtmr')).toEqual(styles.get('rtmr'));
  });
});
