// Sweeps of the CF at a point (src/compute/cfSweep.ts): each value is the CF a report of the
// changed case prints, and the curves show the classic behaviour of the corrections in lung.
import { describe, expect, it } from 'vitest';
import { calculateCaseRequest } from '../../../src/compute/calculationService';
import { cfSweepRequest, type SweepRequest } from '../../../src/compute/cfSweep';
import type { SweepResult } from '../../../src/contract/explain';

/** Water 0–5 cm | lung 5–15 cm | water 15–30 cm, 10 × 10 at SSD 100, point 5 cm beyond the lung. */
const lungCase = (energy = '6MV') => ({
  format: 'lamina.case',
  version: 2,
  name: 'sweep test',
  beam: { energy, setup: { kind: 'SSD', ssdCm: 100 }, fieldXCm: 10, fieldYCm: 10 },
  layers: [
    { materialId: 'water', thicknessCm: 5 },
    { materialId: 'lung', thicknessCm: 10 },
    { materialId: 'water', thicknessCm: 15 },
  ],
  points: [{ id: 'P', depthCm: 20 }],
});
const water = { kind: 'case' } as const;
const TYPE_A = ['rtmr', 'epl-pdd', 'batho', 'batho-modified', 'etar'];

function sweep(req: Partial<SweepRequest>, c: unknown = lungCase()): SweepResult {
  const a = cfSweepRequest({ case: c, water, depthCm: 20, variable: 'density', ...req });
  if (!a.ok) throw new Error(JSON.stringify(a.problems));
  return a.result;
}
const cfOf = (r: SweepResult, id: string, energy: string) =>
  r.series.find((s) => s.methodId === id && s.energy === energy)?.cf as Float64Array;

describe('cfSweepRequest', () => {
  const density = sweep({ layerIndex: 1, from: 0.1, to: 1, count: 10, energies: ['6MV', '18MV'] });

  it('a density sweep gives one series per deterministic method and energy, Monte Carlo left out with a note', () => {
    expect(new Set(density.series.map((s) => s.methodId))).toEqual(
      new Set(['water', ...TYPE_A, 'pencil-beam', 'superposition']),
    );
    expect(density.series).toHaveLength(16);
    expect(density.notes.join(' ')).toMatch(/Monte Carlo is not swept/);
    expect(density.xLabel).toBe('Density of layer 2, Lung (g/cm³)');
    for (const s of density.series) for (const v of s.cf) expect(Number.isFinite(v)).toBe(true);
  });

  it('beyond the lung every correction rises as the lung density falls, at 6 and 18 MV (common practice)', () => {
    for (const energy of ['6MV', '18MV'])
      for (const id of [...TYPE_A, 'pencil-beam', 'superposition']) {
        const cf = cfOf(density, id, energy);
        for (let i = 1; i < cf.length; i++)
          expect(cf[i] as number, `${id} ${energy}`).toBeLessThan(cf[i - 1] as number);
        expect(cf[0] as number).toBeGreaterThan(1.15);
      }
  });

  it('CF → 1 as the lung density → 1 g/cm³ (lung at 1 g/cm³ has ρ_e 0.99: within 1 %; common practice)', () => {
    for (const s of density.series) {
      expect(Math.abs((s.cf[s.cf.length - 1] as number) - 1), s.methodId).toBeLessThan(0.01);
      expect(s.cf[s.cf.length - 1] as number).toBeLessThanOrEqual(s.cf[0] as number);
    }
  });

  it('the correction beyond lung is smaller at 18 MV than at 6 MV for every method (more penetrating beam; common practice)', () => {
    for (const id of [...TYPE_A, 'pencil-beam', 'superposition'])
      expect((cfOf(density, id, '18MV')[0] as number) - 1).toBeLessThan(
        (cfOf(density, id, '6MV')[0] as number) - 1,
      );
  });

  it('an energy sweep: Co-60 corrects most, 18 MV least, for the type-A methods (common practice)', () => {
    const r = sweep({ variable: 'energy' });
    expect(Array.from(r.x)).toEqual([1.25, 4, 6, 10, 15, 18]);
    expect(r.xNames).toEqual(['Co-60', '4MV', '6MV', '10MV', '15MV', '18MV']);
    for (const id of TYPE_A) {
      const cf = cfOf(r, id, 'each');
      expect(cf[0] as number).toBeGreaterThan(cf[2] as number);
      expect(cf[2] as number).toBeGreaterThan(cf[5] as number);
    }
  });

  it('each sweep value is the CF a full report of the changed case prints (same functions; 1e-12)', () => {
    const r = sweep({ variable: 'field', from: 4, to: 20, count: 3 });
    const changed = { ...lungCase(), beam: { ...lungCase().beam, fieldXCm: 12, fieldYCm: 12 } };
    const report = calculateCaseRequest({ purpose: 'full', case: changed, water });
    if (!report.ok) throw new Error('valid');
    for (const m of report.report.methods) {
      const reported = m.points[0]?.cf as number;
      const swept = cfOf(r, m.id, '6MV')[1] as number;
      expect(Math.abs(swept / reported - 1), m.id).toBeLessThan(1e-12);
    }
  });

  it('a depth sweep follows the report curve: CF = 1 above the lung, rising through it', () => {
    const r = sweep({ variable: 'depth', from: 2, to: 25, count: 24 });
    const rtmr = cfOf(r, 'rtmr', '6MV');
    expect(Math.abs((rtmr[0] as number) - 1)).toBeLessThan(1e-12);
    expect(rtmr[18] as number).toBeGreaterThan(rtmr[8] as number);
  });

  it('ratio of TMR sees only the total radiological depth: moving the lung leaves it unchanged, Batho changes (common practice)', () => {
    const moved = {
      ...lungCase(),
      layers: [
        { materialId: 'water', thicknessCm: 8 },
        { materialId: 'lung', thicknessCm: 10 },
        { materialId: 'water', thicknessCm: 12 },
      ],
    };
    const a = sweep({ variable: 'field', from: 5, to: 20, count: 2 });
    const b = sweep({ variable: 'field', from: 5, to: 20, count: 2 }, moved);
    for (const k of [0, 1]) {
      expect(cfOf(b, 'rtmr', '6MV')[k]).toBeCloseTo(cfOf(a, 'rtmr', '6MV')[k] as number, 10);
      expect(
        Math.abs((cfOf(b, 'batho', '6MV')[k] as number) - (cfOf(a, 'batho', '6MV')[k] as number)),
      ).toBeGreaterThan(0.005);
    }
  });

  it('names the field and the problem of a bad request', () => {
    const bad = (req: Partial<SweepRequest>) => {
      const a = cfSweepRequest({
        case: lungCase(),
        water,
        depthCm: 20,
        variable: 'density',
        ...req,
      });
      return a.ok ? [] : a.problems.map((p) => p.path);
    };
    expect(bad({ layerIndex: 7, from: 0.1, to: 1, count: 5 })).toEqual(['layerIndex']);
    expect(bad({ layerIndex: 1, from: Number.NaN, to: 9, count: 1 })).toEqual([
      'from',
      'to',
      'count',
    ]);
    expect(bad({ variable: 'field', from: 0.5, to: 10, count: 5 })).toEqual(['from']);
    expect(bad({ variable: 'field', from: 5, to: 10, count: 5, depthCm: 99 })).toEqual(['depthCm']);
    expect(bad({ variable: 'field', from: 5, to: 10, count: 5, energies: ['7MV'] })).toEqual([
      'energies[0]',
    ]);
    expect(bad({ variable: 'nope' as never })).toEqual(['variable']);
  });
});
