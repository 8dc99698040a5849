// Monte Carlo dose per MU, written once (src/compute/monteCarloCalibration): with the modelled
// beam the run's own absolute calibration; with a measured table CF_MC × the table's water dose
// per MU, with σ = σ(CF_MC) × that dose; the page's merge and the CLI's run give the same method.
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import {
  assembleReport,
  calculateCase,
  computeCaseParts,
  runMonteCarloForCase,
} from '../../../src/compute/calculateCase';
import { calculateCaseRequest, prepareMonteCarlo } from '../../../src/compute/calculationService';
import { monteCarloCalibration } from '../../../src/compute/monteCarloCalibration';
import { monteCarloRunKey } from '../../../src/compute/monteCarloRunKey';
import { resolveWater } from '../../../src/compute/waterSource';
import { modelledHeadScatter } from '../../../src/engine/beam/headScatter';
import type { LaminaCase } from '../../../src/io/caseSchema';
import { CASE_FORMAT, CASE_VERSION } from '../../../src/io/caseSchema';
import { expectRelClose } from '../../helpers/expectClose';

const table = (name: string) => readFileSync(`public/tables/${name}`, 'utf8');

function caseWith(fieldCm: number, withTable: boolean): LaminaCase {
  const c: LaminaCase = {
    format: CASE_FORMAT,
    version: CASE_VERSION,
    name: 'calibration',
    beam: {
      energy: '6MV',
      setup: { kind: 'SSD', ssdCm: 100 },
      fieldXCm: fieldCm,
      fieldYCm: fieldCm,
    },
    layers: [
      { materialId: 'water', thicknessCm: 3 },
      { materialId: 'lung', thicknessCm: 5 },
      { materialId: 'water', thicknessCm: 6 },
    ],
    points: [
      { id: 'P1', depthCm: 5 },
      { id: 'P2', depthCm: 10 },
    ],
  };
  if (withTable)
    c.waterData = {
      kind: 'tmr',
      fileName: 'demo-6mv-tmr.csv',
      csv: table('demo-6mv-tmr.csv'),
      referenceDosePerMuCGy: 0.8,
      scatterFileName: 'demo-6mv-scatter.csv',
      scatterCsv: table('demo-6mv-scatter.csv'),
    };
  return c;
}

const waterOf = (c: LaminaCase, kind: 'case' | 'modelled') => {
  const r = resolveWater(c, { kind });
  if (!r.ok) throw new Error('water data');
  return r.waterData;
};

describe('monteCarloCalibration', () => {
  it('is absolute with the modelled beam, even with a table in the case', () => {
    const c = caseWith(10, true);
    const cal = monteCarloCalibration(c, waterOf(c, 'modelled'));
    expect(cal.mode).toBe('absolute');
    // Modelled beams are calibrated to 1 cGy/MU (generated modelled-beam data); S_c(10) = 1 by normalisation.
    expect(cal.referenceDosePerMuCGy).toBe(1);
    expect(cal.collimatorScatterFactor).toBe(1);
    expect(cal.source).toMatch(/modelled beam/);
  });

  it('S_c of a 20 × 20 field follows the modelled head-scatter curve', () => {
    const c = caseWith(20, false);
    const cal = monteCarloCalibration(c, waterOf(c, 'case'));
    // 20 cm is a tabulated field of the modelled data, which samples the same curve: only the
    // table's 5-digit rounding separates them.
    expectRelClose(cal.collimatorScatterFactor, modelledHeadScatter('6MV', 20), 1e-4);
  });

  it("is CF × water with the case's measured table", () => {
    const c = caseWith(12, true);
    const cal = monteCarloCalibration(c, waterOf(c, 'case'));
    expect(cal.mode).toBe('cf-times-water');
    expect(cal.source).toContain('demo-6mv-tmr.csv');
  });
});

describe('Monte Carlo with a measured table', () => {
  const c = caseWith(10, true);
  const report = calculateCase(c, {
    methods: ['water', 'monte-carlo'],
    mc: { histories: 4000, seed: 3 },
  });
  const water = report.methods.find((m) => m.id === 'water')!;
  const mc = report.methods.find((m) => m.id === 'monte-carlo')!;

  it('gives dose per MU = CF_MC × the table water dose per MU at every point (derived)', () => {
    mc.points.forEach((p, i) => {
      const w = water.points[i]!;
      expect(p.dosePerMuCGy).not.toBeNull();
      // Exact product: one multiplication of the same two numbers.
      expect(p.dosePerMuCGy).toBe((p.cf as number) * (w.dosePerMuCGy as number));
    });
    expect(mc.waterData).toMatch(/^measured table: demo-6mv-tmr\.csv.*CF × its water dose per MU/);
  });

  it('carries σ(dose) = σ(CF) × water dose on the curve', () => {
    const i = mc.curve.depthCm.findIndex((d) => d >= 10);
    const wd = water.curve.dosePerMuCGy[i] as number;
    expect(mc.curve.sigmaDosePerMuCGy![i]).toBe((mc.curve.sigmaCf![i] as number) * wd);
    expect(mc.curve.dosePerMuCGy[i]).toBe((mc.curve.cf[i] as number) * wd);
  });

  it('in a water phantom is the table water dose within the CF statistics (invariant: CF = 1 in water)', () => {
    const w: LaminaCase = { ...c, layers: [{ materialId: 'water', thicknessCm: 14 }] };
    const r = calculateCase(w, {
      methods: ['water', 'monte-carlo'],
      mc: { histories: 2000, seed: 5 },
    });
    const m = r.methods.find((x) => x.id === 'monte-carlo')!;
    const wat = r.methods.find((x) => x.id === 'water')!;
    // The case and its water run are the same scenario: CF is exactly 1, σ(CF) 0.
    m.points.forEach((p, i) => expect(p.dosePerMuCGy).toBe(wat.points[i]!.dosePerMuCGy));
  });

  it("the page's merged run (worker, purpose 'full') equals the CLI's run of the same case", () => {
    const setup = prepareMonteCarlo({
      purpose: 'monte-carlo',
      case: c,
      water: { kind: 'case' },
      run: { histories: 4000, seed: 3 },
    });
    if (!setup.ok) throw new Error('setup');
    // No convention asked for and none in the case: dose to water, as for the CLI.
    expect(setup.doseTo).toBe('water');
    expect(setup.key).toBe(monteCarloRunKey(c, { kind: 'case' }, 'water'));
    const parts = computeCaseParts(c, { methods: ['water', 'monte-carlo'] });
    const run = runMonteCarloForCase(parts, { histories: 4000, seed: 3 }, 'water');
    const page = calculateCaseRequest({
      purpose: 'full',
      case: c,
      water: { kind: 'case' },
      options: { methods: ['water', 'monte-carlo'] },
      mcRun: { key: setup.key, run, note: null },
    });
    expect(page.ok && page.report).toEqual(report);
    expect(assembleReport(parts, { run }, 'water')).toEqual(report);
    // A run of another case is not merged.
    const other = calculateCaseRequest({
      purpose: 'full',
      case: c,
      water: { kind: 'modelled' },
      options: { methods: ['water', 'monte-carlo'] },
      mcRun: { key: setup.key, run, note: null },
    });
    expect(other.ok && other.report.methods.map((m) => m.id)).toEqual(['water']);
    // Nor a run made in the other dose convention: its key is another.
    const medium = calculateCaseRequest({
      purpose: 'full',
      case: c,
      water: { kind: 'case' },
      options: { methods: ['water', 'monte-carlo'], doseTo: 'medium' },
      mcRun: { key: setup.key, run, note: null },
    });
    expect(medium.ok && medium.report.methods.map((m) => m.id)).toEqual(['water']);
    expect(medium.ok && medium.report.doseTo).toBe('medium');
  });

  it('a run in dose to medium differs from dose to water by s_w,m in the lung and not in water (derived)', () => {
    const parts = computeCaseParts(c, { methods: ['water', 'monte-carlo'] });
    const opts = { histories: 4000, seed: 3 };
    const w = assembleReport(parts, { run: runMonteCarloForCase(parts, opts, 'water') }, 'water');
    const m = assembleReport(parts, { run: runMonteCarloForCase(parts, opts, 'medium') }, 'medium');
    const at = (r: typeof w, id: string) =>
      r.methods.find((x) => x.id === 'monte-carlo')!.points.find((p) => p.id === id)!;
    // P1 (5 cm) lies in the lung layer (3–8 cm): D_w = s_w,lung × D_m with the same seed, so the
    // ratio is the conversion factor itself, > 1 (stopping-power ratio water/lung at 6 MV ≈ 1.004).
    const ratio = (at(w, 'P1').dosePerMuCGy as number) / (at(m, 'P1').dosePerMuCGy as number);
    expect(ratio).toBeGreaterThan(1);
    expect(ratio).toBeLessThan(1.02);
    // P2 (10 cm) lies in water: the same number in both conventions.
    expect(at(w, 'P2').dosePerMuCGy).toBeCloseTo(at(m, 'P2').dosePerMuCGy as number, 12);
    expect(w.methods.find((x) => x.id === 'monte-carlo')!.dose?.quantity).toBe('water');
    expect(m.methods.find((x) => x.id === 'monte-carlo')!.dose?.quantity).toBe('medium');
    // A run in the other convention is not drawn as if it were this one's.
    const mixed = assembleReport(
      parts,
      { run: runMonteCarloForCase(parts, opts, 'medium') },
      'water',
    );
    expect(mixed.methods.map((x) => x.id)).toEqual(['water']);
    expect(mixed.unavailable.find((u) => u.id === 'monte-carlo')?.reason).toMatch(
      /dose to medium, not dose to water/,
    );
  });
});
