import { describe, expect, it } from 'vitest';
import { checkPlan } from '../../../../src/engine/check/planCheck';
import { DEFAULT_TOLERANCES } from '../../../../src/engine/check/tolerance';
import type { CalcReport } from '../../../../src/compute/calculateCase';
import { monteCarloRecordLines, monteCarloRunOf } from '../../../../src/io/report/monteCarloNote';
import { pointTableRows, totalTableRows } from '../../../../src/io/report/reportTables';

const VARIANT =
  '0.250 cm depth bins; dose to medium; 200000 histories in 7 of 10 batches, seed 42; published spectrum';

describe('the record of a Monte Carlo result in the check', () => {
  it('monteCarloRunOf(variant) reads the histories, batches and seed the engine writes', () => {
    expect(monteCarloRunOf(VARIANT)).toEqual({
      histories: 200000,
      batchesDone: 7,
      batches: 10,
      seed: 42,
    });
    expect(monteCarloRunOf('TMR, no shift')).toBeNull();
  });

  it('monteCarloRecordLines(...) names the run per beam and explains ± σ and "uncertain"', () => {
    const report = {
      methods: [
        { id: 'water', label: 'Water', variant: 'x', points: [] },
        { id: 'monte-carlo', label: 'Monte Carlo', variant: VARIANT, points: [] },
      ],
    } as unknown as CalcReport;
    const lines = monteCarloRecordLines([{ id: 'AP', report }]);
    expect(lines[0]).toBe(
      'Monte Carlo, beam AP: 200000 histories per run in 7 of 10 batches, seed 42 (partial run).',
    );
    expect(lines[1]).toMatch(/1σ.*tolerance ± 2σ.*run more histories/);
    expect(
      monteCarloRecordLines([{ id: 'AP', report: { methods: [] } as unknown as CalcReport }]),
    ).toEqual([]);
  });

  it('pointTableRows(...) writes "value ± σ" for a method with σ only', () => {
    // D/MU 0.8 ± 0.008, 125 MU ± 1.25, dose 128 × 0.8 = 102.4 ± 1.024 cGy (exact arithmetic).
    const check = checkPlan(
      [
        {
          id: 'AP',
          label: 'AP',
          weight: 1,
          planningMu: 128,
          layers: [{ topCm: 0, bottomCm: 30, relativeElectronDensity: 1 }],
          points: [{ id: 'P', depthCm: 10, planningDoseCGy: 100 }],
          methods: [
            { id: 'water', label: 'Water', points: [{ id: 'P', dosePerMuCGy: 0.8 }] },
            {
              id: 'monte-carlo',
              label: 'Monte Carlo',
              points: [{ id: 'P', dosePerMuCGy: 0.8, sigmaDosePerMuCGy: 0.008 }],
            },
          ],
        },
      ],
      { tolerances: DEFAULT_TOLERANCES, prescription: { pointId: 'P', doseCGy: 100 } },
    );
    const [water, mc] = pointTableRows(check);
    expect(water?.slice(4, 11)).toEqual([
      '0.8000',
      '125.0',
      '128.0',
      '-2.34',
      '102.4',
      '100.0',
      '+2.40',
    ]);
    expect(mc?.slice(4, 11)).toEqual([
      '0.8000 ± 0.0080',
      '125.0 ± 1.3',
      '128.0',
      '-2.34 ± 0.98',
      '102.4 ± 1.0',
      '100.0',
      '+2.40 ± 1.02',
    ]);
    // |Δ| 2.4 against 2 %: outside, but by less than 2σ → uncertain; water fails outright.
    expect(water?.[12]).toBe('fail');
    expect(mc?.[12]).toBe('uncertain');
    expect(totalTableRows(check)[1]?.[2]).toBe('102.4 ± 1.0');
  });
});
