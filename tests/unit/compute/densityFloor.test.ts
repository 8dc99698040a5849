// The lowest density a case may hold (0.001 g/cm³, air; src/engine/inputRanges) keeps every
// method finite: below it the schema refuses the layer, at it every number of the report is finite.
import { describe, expect, it } from 'vitest';
import { calculateCase } from '../../../src/compute/calculateCase';
import { MIN_DENSITY_G_PER_CM3 } from '../../../src/engine/inputRanges';
import { validateCase } from '../../../src/io/caseFile';
import { firstNonFinite } from '../../helpers/allFinite';

const caseWith = (densityGPerCm3: number) => ({
  format: 'lamina.case',
  version: 1,
  name: 'air gap at the density floor',
  beam: { energy: '6MV', setup: { kind: 'SSD', ssdCm: 100 }, fieldXCm: 5, fieldYCm: 5 },
  layers: [
    { materialId: 'softTissue', thicknessCm: 3 },
    { materialId: 'air', thicknessCm: 8, densityGPerCm3 },
    { materialId: 'softTissue', thicknessCm: 9 },
  ],
  points: [
    { id: 'in-gap', depthCm: 7 },
    { id: 'beyond', depthCm: 15 },
  ],
});

describe('density floor', () => {
  it('validateCase(...) refuses 5e-324 g/cm³ (it used to give "lateral range Infinity cm")', () => {
    const r = validateCase(caseWith(5e-324));
    expect(r.ok).toBe(false);
    if (!r.ok)
      expect(r.problems).toContainEqual({
        path: 'layers[1].densityGPerCm3',
        message: 'density must be ≥ 0.001 g/cm³',
      });
  });

  it('calculateCase(...) at the floor gives finite numbers for every method, Monte Carlo included', () => {
    const r = validateCase(caseWith(MIN_DENSITY_G_PER_CM3));
    if (!r.ok) throw new Error(JSON.stringify(r.problems));
    const report = calculateCase(r.value, { depthStepCm: 0.5, mc: { histories: 2000, seed: 3 } });
    expect(report.methods.map((m) => m.id)).toEqual([
      'water',
      'rtmr',
      'epl-pdd',
      'batho',
      'batho-modified',
      'etar',
      'pencil-beam',
      'superposition',
      'monte-carlo',
    ]);
    expect(firstNonFinite(report)).toBeNull();
    // Beyond the gap every deterministic method has a dose: nothing withheld for being undefined.
    for (const m of report.methods.filter((x) => x.id !== 'monte-carlo'))
      expect(m.points.find((p) => p.id === 'beyond')?.dosePerMuCGy).toBeGreaterThan(0);
    // The lateral range in the gap is long but finite, and the warning says so in numbers.
    const led = report.warnings.find((w) => w.code === 'LED');
    expect(led?.numbers).toMatch(/lateral range \d+\.\d+ cm/);
    expect(JSON.stringify(report.warnings)).not.toMatch(/Infinity|NaN/);
  });
});
