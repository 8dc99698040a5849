// Type-A values that need TMR deeper than the water data reach are withheld (null, with the
// reason), and one severe EXTRAPOLATION band starts where the data end, not at the first point.
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { calculateCase } from '../../../src/compute/calculateCase';
import { calculatePlan } from '../../../src/compute/calculatePlan';
import { buildMeasuredWaterData } from '../../../src/engine/beam/measuredTable';
import { TYPE_A_METHOD_IDS } from '../../../src/engine/corrections/typeAMethods';
import { depthAtRadiologicalDepthCm } from '../../../src/engine/equilibrium/depthBands';
import { makeSlabPhantom } from '../../../src/engine/phantom/slabPhantom';
import { planOfCase } from '../../../src/io/planFile';
import { validateCase } from '../../../src/io/caseFile';

// The demo table (invented data) ends at 40 cm.
const tableInput = {
  kind: 'tmr' as const,
  fileName: 'demo-6mv-tmr.csv',
  csv: readFileSync('public/tables/demo-6mv-tmr.csv', 'utf8'),
  dMaxCm: 1.5,
};
const table = buildMeasuredWaterData(tableInput);
if (!table.ok) throw new Error(table.problems.join('\n'));
const waterData = table.waterData;

function caseOf(layers: { materialId: string; thicknessCm: number }[], points: number[]) {
  const r = validateCase({
    format: 'lamina.case',
    version: 1,
    name: 'deep',
    beam: { energy: '6MV', setup: { kind: 'SSD', ssdCm: 100 }, fieldXCm: 10, fieldYCm: 10 },
    layers,
    points: points.map((depthCm, i) => ({ id: `P${i + 1}`, depthCm, planningMu: 100 })),
  });
  if (!r.ok) throw new Error(JSON.stringify(r.problems));
  return r.value;
}

describe('type-A methods beyond the deepest depth of the water data', () => {
  it('100 cm of water: no type-A value below 40 cm, kernel methods unaffected, band from 40 cm', () => {
    // Before: TMR clamped at 40 cm gave 0.0654 cGy/MU at 90 cm against 0.0102 from the
    // superposition, flagged "caution" over a band starting at the point (90 cm).
    const c = caseOf([{ materialId: 'water', thicknessCm: 100 }], [90, 10]);
    const r = calculateCase(c, {
      waterData,
      depthStepCm: 1,
      methods: [...TYPE_A_METHOD_IDS, 'superposition'],
    });
    for (const m of r.methods.filter((x) => TYPE_A_METHOD_IDS.includes(x.id))) {
      const deep = m.points.find((p) => p.id === 'P1')!;
      expect(deep.dosePerMuCGy).toBeNull();
      expect(deep.cf).toBeNull();
      expect(deep.flags[0]).toBe(
        'beyond the water data: TMR needed at 90.00 cm, the table ends at 40 cm (no value)',
      );
      expect(deep.flags.some((f) => f.includes('clamped'))).toBe(false);
      expect(m.points.find((p) => p.id === 'P2')!.dosePerMuCGy).toBeGreaterThan(0);
      r.depthCm.forEach((d, i) => expect(m.curve.dosePerMuCGy[i] === null).toBe(d > 40 + 1e-9));
      expect(m.beyondWaterDataFromCm).toBeCloseTo(40, 5);
    }
    expect(
      r.methods.find((m) => m.id === 'superposition')!.points[0]!.dosePerMuCGy,
    ).toBeGreaterThan(0);
    const w = r.warnings.filter((x) => x.code === 'EXTRAPOLATION');
    expect(w).toHaveLength(1);
    expect(w[0]!.severity).toBe('severe');
    expect(w[0]!.depthRangeCm.fromCm).toBeCloseTo(40, 5);
    expect(w[0]!.depthRangeCm.toCm).toBe(100);
    expect(w[0]!.pointIds).toEqual(['P1']);
    expect(w[0]!.methods.concerned).toEqual(TYPE_A_METHOD_IDS);
    expect(w[0]!.methods.unaffected).toContain('superposition');
  });

  it('dense bone brings the edge up to where the radiological depth reaches 40 cm', () => {
    // Cortical bone (ρ_e ≈ 1.78): the effective-depth read TMR(d′) passes 40 cm long before d does.
    const layers = [
      { materialId: 'water', thicknessCm: 5 },
      { materialId: 'corticalBone', thicknessCm: 30 },
      { materialId: 'water', thicknessCm: 15 },
    ];
    const c = caseOf(layers, [20, 30]);
    const r = calculateCase(c, { waterData, depthStepCm: 0.5, methods: ['water', 'rtmr'] });
    const edge = depthAtRadiologicalDepthCm(makeSlabPhantom(c.layers), 40); // derived
    const rtmr = r.methods.find((m) => m.id === 'rtmr')!;
    expect(rtmr.beyondWaterDataFromCm).toBeCloseTo(edge, 5);
    expect(edge).toBeLessThan(30);
    expect(rtmr.points.map((p) => p.dosePerMuCGy === null)).toEqual([false, true]);
    // The water method reads TMR only at the geometric depth: it stops at 40 cm.
    expect(r.methods.find((m) => m.id === 'water')!.beyondWaterDataFromCm).toBeCloseTo(40, 5);
    const w = r.warnings.find((x) => x.id === 'EXTRAPOLATION@water-data-depth')!;
    expect(w.depthRangeCm.fromCm).toBeCloseTo(edge, 5);
    expect(w.numbers).toBe(
      `water data end at 40.00 cm depth; no value: water from 40.00 cm; rtmr from ${edge.toFixed(2)} cm`,
    );
  });

  it('a table covering the phantom withholds nothing and raises no such warning', () => {
    const c = caseOf([{ materialId: 'water', thicknessCm: 30 }], [10]);
    const r = calculateCase(c, { waterData, depthStepCm: 1, methods: TYPE_A_METHOD_IDS });
    for (const m of r.methods) expect(m.beyondWaterDataFromCm).toBeUndefined();
    expect(r.warnings.some((w) => w.id.startsWith('EXTRAPOLATION@water-data-depth'))).toBe(false);
  });

  it('the point check gives no verdict there and the record prints no water chain for the point', () => {
    const c = caseOf([{ materialId: 'water', thicknessCm: 100 }], [90, 10]);
    const plan = calculatePlan(planOfCase(c), {
      water: { kind: 'table', table: tableInput },
      methods: ['water', 'rtmr'],
    });
    const deep = plan.check.beams[0]!.points.find((p) => p.pointId === 'P1')!;
    expect(deep.methods.map((m) => m.verdict)).toEqual(['none', 'none']);
    expect(Object.keys(plan.beams[0]!.waterChains)).toEqual(['P2']);
  });
});
