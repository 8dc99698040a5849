// Type-A methods inside a whole case calculation: curves on the report's grid, points, flags,
// the inline case water data and the "needs water data" path.
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { calculateCase } from '../../../src/compute/calculateCase';
import { NEEDS_WATER_DATA } from '../../../src/contract/reports';
import { TYPE_A_METHOD_IDS } from '../../../src/engine/corrections/typeAMethods';
import { buildMeasuredWaterData } from '../../../src/engine/beam/measuredTable';
import { dosePerMuFactors } from '../../../src/engine/check/dosePerMu';
import { parseCaseText, validateCase } from '../../../src/io/caseFile';
import type { LaminaCase } from '../../../src/io/caseSchema';
import { makeF6WaterData } from '../../fixtures/f6WaterData';
import { expectRelClose } from '../../helpers/expectClose';

function demoCase(): LaminaCase {
  const r = parseCaseText(readFileSync('public/cases/lung-slab-6mv.json', 'utf8'));
  if (!r.ok) throw new Error('demo case invalid');
  return r.value;
}

const TMR_CSV = readFileSync('public/tables/demo-6mv-tmr.csv', 'utf8');

describe('calculateCase with type-A methods', () => {
  it('without a measured table the type-A methods use the modelled beam and say so', () => {
    const r = calculateCase(demoCase(), { methods: ['batho', 'etar'] });
    expect(r.methods.map((m) => m.id)).toEqual(['batho', 'etar']);
    for (const m of r.methods) expect(m.waterData).toMatch(/^modelled beam \(6MV/);
    expect(r.unavailable.map((u) => u.reason)).not.toContain(NEEDS_WATER_DATA);
  });

  it('with water data gives each method a finite curve on the report grid and its points', () => {
    const r = calculateCase(demoCase(), {
      waterData: makeF6WaterData(),
      methods: TYPE_A_METHOD_IDS,
    });
    expect(r.methods.map((m) => m.id)).toEqual([
      'water',
      'rtmr',
      'epl-pdd',
      'batho',
      'batho-modified',
      'etar',
    ]);
    for (const m of r.methods) {
      expect(m.curve.depthCm).toEqual(r.depthCm);
      for (const v of [...m.curve.cf, ...m.curve.dosePerMuCGy])
        expect(v === null || (Number.isFinite(v) && v > 0)).toBe(true);
      expect(m.points.map((p) => p.id)).toEqual(['P1', 'in-lung']);
      expect(m.variant.length).toBeGreaterThan(0);
      expect(m.waterData).toBe('analytic test fixture F6 (invented)');
    }
  });

  it('a point’s dose per MU is the TG-71 chain times the method’s CF', () => {
    const c = demoCase();
    const r = calculateCase(c, { waterData: makeF6WaterData(), methods: ['rtmr'] });
    const p = r.methods[0]?.points[0];
    const f = dosePerMuFactors({
      waterData: makeF6WaterData(),
      ssdCm: 100,
      depthCm: 15,
      fieldXCm: 10,
      fieldYCm: 10,
      cf: p?.cf as number,
    });
    expectRelClose(p?.dosePerMuCGy as number, f.dosePerMuCGy, 1e-14); // same arithmetic
    // water method: CF exactly 1, dose = reference × S_c × S_p × TMR × inverse square
    const w = calculateCase(c, { waterData: makeF6WaterData(), methods: ['water'] }).methods[0];
    expect(w?.points[0]?.cf).toBe(1);
  });

  it('uses the case’s inline water data and validates it with row/column messages', () => {
    const raw = JSON.parse(readFileSync('public/cases/lung-slab-6mv.json', 'utf8')) as Record<
      string,
      unknown
    >;
    const ok = validateCase({
      ...raw,
      waterData: { kind: 'tmr', fileName: 't.csv', csv: TMR_CSV, dMaxCm: 1.5 },
    });
    expect(ok.ok).toBe(true);
    if (!ok.ok) return;
    const r = calculateCase(ok.value, { methods: ['batho-modified'] });
    expect(r.methods[0]?.waterData).toMatch(/^measured table: t\.csv \(sha-256 [0-9a-f]{12}\)/);
    const bad = validateCase({
      ...raw,
      waterData: { kind: 'tmr', fileName: 't.csv', csv: TMR_CSV.replace('0.7845', 'n/a') },
    });
    expect(bad.ok).toBe(false);
    if (bad.ok) return;
    expect(bad.problems[0]?.path).toBe('waterData.csv');
    expect(bad.problems[0]?.message).toMatch(
      /^t\.csv: row \d+, column \d+ \([A-Z]+\): "n\/a" is not a number/,
    );
    const pddNoSsd = validateCase({
      ...raw,
      waterData: { kind: 'pdd', fileName: 'p.csv', csv: 'x' },
    });
    expect(!pddNoSsd.ok && pddNoSsd.problems[0]?.path).toBe('waterData.ssdCm');
  });

  it('an SAD set-up uses SSD = SAD − isocentre depth in the factor chain', () => {
    const c: LaminaCase = {
      ...demoCase(),
      beam: { ...demoCase().beam, setup: { kind: 'SAD', sadCm: 100, isocentreDepthCm: 10 } },
    };
    const r = calculateCase(c, { waterData: makeF6WaterData(), methods: ['water'] });
    const p = r.methods[0]?.points.find((q) => q.id === 'P1');
    const f = dosePerMuFactors({
      waterData: makeF6WaterData(),
      ssdCm: 90,
      depthCm: 15,
      fieldXCm: 10,
      fieldYCm: 10,
      cf: 1,
    });
    expectRelClose(p?.dosePerMuCGy as number, f.dosePerMuCGy, 1e-14); // same arithmetic
    expectRelClose(f.inverseSquare, (101.5 / 105) ** 2, 1e-14);
  });
});

describe('type-A results beyond the table', () => {
  it('points near the table’s deep edge are finite; deeper ones are withheld, never NaN', () => {
    const tmr = 'd,5,10,20\n0,0.5,0.5,0.5\n1.5,1,1,1\n10,0.76,0.78,0.8\n20,0.52,0.53,0.55\n';
    const raw = JSON.parse(readFileSync('public/cases/lung-slab-6mv.json', 'utf8')) as Record<
      string,
      unknown
    >;
    const v = validateCase({
      ...raw,
      points: [{ id: 'deep', depthCm: 19.5 }],
      layers: [{ materialId: 'water', thicknessCm: 20 }],
      waterData: { kind: 'tmr', fileName: 'short.csv', csv: tmr, dMaxCm: 1.5 },
    });
    if (!v.ok) throw new Error(JSON.stringify(v.problems));
    const r = calculateCase(v.value, { methods: TYPE_A_METHOD_IDS });
    for (const m of r.methods) {
      const p = m.points[0];
      // a coarse 4-depth table near its deep edge: whatever the look-ups, a number or null
      expect(p?.cf === null || Number.isFinite(p?.cf)).toBe(true);
      for (const x of m.curve.dosePerMuCGy) expect(x === null || Number.isFinite(x)).toBe(true);
    }
    // a 30 cm deep point in the same water: beyond the table's 20 cm → withheld with the reason
    const deeper = validateCase({
      ...raw,
      points: [{ id: 'deeper', depthCm: 30 }],
      layers: [{ materialId: 'water', thicknessCm: 30 }],
      waterData: { kind: 'tmr', fileName: 'short.csv', csv: tmr, dMaxCm: 1.5 },
    });
    if (!deeper.ok) throw new Error(JSON.stringify(deeper.problems));
    const w = calculateCase(deeper.value, { methods: ['water'] }).methods[0];
    expect(w?.points[0]?.flags).toContain(
      'beyond the water data: TMR needed at 30.00 cm, the table ends at 20 cm (no value)',
    );
    expect(w?.points[0]?.dosePerMuCGy).toBeNull();
  });
});

describe('PSF approximation in the variant', () => {
  it('ETAR and TAR-Batho name the PSF approximation when the table has no PSF column', () => {
    const c = demoCase();
    const r = calculateCase(c, {
      waterData: (() => {
        const b = buildMeasuredWaterData({ kind: 'tmr', fileName: 't.csv', csv: TMR_CSV });
        if (!b.ok) throw new Error('table');
        return b.waterData;
      })(),
      methods: ['rtmr', 'batho', 'etar'],
      typeA: { bathoTable: 'tar' },
    });
    const variant = (id: string) => r.methods.find((m) => m.id === id)?.variant ?? '';
    expect(variant('etar')).toContain('PSF not supplied: PSF(s) ≈ S_p(s)');
    expect(variant('batho')).toContain('PSF not supplied');
    expect(variant('rtmr')).not.toContain('PSF');
  });
});
