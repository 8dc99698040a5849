import { describe, expect, it } from 'vitest';
import {
  DEFAULT_CALIBRATION_LABEL,
  defaultCalibration,
  parseCalibrationCsv,
  rhoEOfHu,
} from '../../../src/dicom/calibration';

describe('HU → ρe calibration', () => {
  it('the default curve is labelled generic, from memory, to be replaced', () => {
    expect(defaultCalibration().label).toBe("generic, from memory — replace with your scanner's");
    expect(DEFAULT_CALIBRATION_LABEL).toContain('from memory');
  });

  it('the default curve gives water 1 at 0 HU and near-zero for air (common practice)', () => {
    const c = defaultCalibration();
    expect(rhoEOfHu(c, 0)).toBe(1);
    expect(rhoEOfHu(c, -1000)).toBeCloseTo(0.001, 6);
    // Inflated lung at about −740 HU has ρe ≈ 0.26 (ICRU-44 lung at 0.26 g/cm³; from memory, ±0.03).
    expect(Math.abs(rhoEOfHu(c, -740) - 0.26)).toBeLessThan(0.03);
  });

  it('interpolates linearly between points and holds the end values outside', () => {
    const r = parseCalibrationCsv('hu;rho\n-1000;0\n0;1\n1000;1.5\n', 'test');
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(rhoEOfHu(r.value, -500)).toBeCloseTo(0.5, 12);
    expect(rhoEOfHu(r.value, 500)).toBeCloseTo(1.25, 12);
    expect(rhoEOfHu(r.value, -3000)).toBe(0);
    expect(rhoEOfHu(r.value, 3000)).toBe(1.5);
  });

  it('names row and column of every problem', () => {
    const r = parseCalibrationCsv('HU,rho\n-1000,0\nabc,1\n0,-2\n-50,1\n5\n', 'x');
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.problems).toEqual([
      'calibration row 3, column 1 (HU): "abc" is not a number',
      'calibration row 4, column 2 (relative electron density): -2 lies outside 0…6',
      'calibration row 5, column 1 (HU): -50 must be greater than the row before (0)',
      'calibration row 6: needs two columns, HU and relative electron density',
    ]);
  });

  it('needs at least two rows', () => {
    const r = parseCalibrationCsv('# one row\n0,1\n', 'x');
    expect(r).toEqual({
      ok: false,
      problems: ['calibration: at least two rows (HU, relative electron density) are needed'],
    });
  });
});
