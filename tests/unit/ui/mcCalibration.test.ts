// Dose per MU of the page's Monte Carlo: reference dose rate and S_c come from the same water
// data as the other methods (the modelled beam, or the measured table in the case).
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { modelledHeadScatter } from '../../../src/engine/beam/headScatter';
import type { LaminaCase } from '../../../src/io/caseSchema';
import { CASE_FORMAT, CASE_VERSION } from '../../../src/io/caseSchema';
import { monteCarloCalibration } from '../../../src/ui/montecarlo/mcCalibration';
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
    layers: [{ materialId: 'water', thicknessCm: 20 }],
    points: [],
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

describe('monteCarloCalibration', () => {
  it('uses the modelled beam when the page uses it, even with a table in the case', () => {
    const cal = monteCarloCalibration(caseWith(10, true), 'modelled');
    // Modelled beams are calibrated to 1 cGy/MU (generated modelled-beam data); S_c(10) = 1 by normalisation.
    expect(cal.referenceDosePerMuCGy).toBe(1);
    expect(cal.collimatorScatterFactor).toBe(1);
    expect(cal.source).toMatch(/^modelled beam/);
  });

  it('S_c of a 20 × 20 field follows the modelled head-scatter curve', () => {
    const cal = monteCarloCalibration(caseWith(20, false), 'modelled');
    // 20 cm is a tabulated field of the modelled data, which samples the same curve: only the
    // table's 5-digit rounding separates them.
    expectRelClose(cal.collimatorScatterFactor, modelledHeadScatter('6MV', 20), 1e-4);
  });

  it("uses the case's table (its reference dose rate and S_c) when the page uses the table", () => {
    const cal = monteCarloCalibration(caseWith(12, true), 'table');
    expect(cal.referenceDosePerMuCGy).toBe(0.8);
    // demo-6mv-scatter.csv: S_c(12 × 12) = 1.0034 (tabulated value; invented demo data).
    expectRelClose(cal.collimatorScatterFactor, 1.0034, 1e-9);
    expect(cal.source).toContain('demo-6mv-tmr.csv');
  });

  it('falls back to the modelled beam when the table is chosen but the case has none', () => {
    expect(monteCarloCalibration(caseWith(10, false), 'table').source).toMatch(/^modelled beam/);
  });
});
