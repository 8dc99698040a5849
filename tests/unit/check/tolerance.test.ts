import { describe, expect, it } from 'vitest';
import {
  DEFAULT_TOLERANCES,
  percentDifference,
  toleranceFor,
  toleranceProblems,
  verdictOf,
  worstVerdict,
} from '../../../src/engine/check/tolerance';
import { doseForMu, muForDose } from '../../../src/engine/check/monitorUnits';
import { isHeterogeneousPath } from '../../../src/engine/check/heterogeneousPath';
import { expectRelClose } from '../../helpers/expectClose';

describe('check arithmetic', () => {
  it('percentDifference(check, planning) is 100·(check − planning)/planning', () => {
    // Exact decimal arithmetic up to round-off: 1e-12 relative.
    expectRelClose(percentDifference(102, 100) as number, 2, 1e-12);
    expectRelClose(percentDifference(95, 100) as number, -5, 1e-12);
    expect(percentDifference(1, 0)).toBeNull();
    expect(percentDifference(null, 100)).toBeNull();
    expect(percentDifference(100, undefined)).toBeNull();
  });

  it('verdictOf(diff, tol) passes on the tolerance edge and fails just beyond it', () => {
    expect(verdictOf(2, 2)).toBe('pass');
    expect(verdictOf(-2, 2)).toBe('pass');
    expect(verdictOf(2.01, 2)).toBe('fail');
    expect(verdictOf(-2.01, 2)).toBe('fail');
    expect(verdictOf(null, 2)).toBe('none');
  });

  it('worstVerdict(...) lets any fail win and keeps none only when nothing was compared', () => {
    expect(worstVerdict(['pass', 'fail', 'none'])).toBe('fail');
    expect(worstVerdict(['none', 'pass'])).toBe('pass');
    expect(worstVerdict(['none', 'none'])).toBe('none');
    expect(worstVerdict([])).toBe('none');
  });

  it('toleranceFor(...) picks the heterogeneous action level for a heterogeneous path', () => {
    // Defaults inside AAPM TG-114's range of action levels (from memory): 2 % and 5 %.
    expect(toleranceFor(false, DEFAULT_TOLERANCES)).toBe(2);
    expect(toleranceFor(true, DEFAULT_TOLERANCES)).toBe(5);
    expect(
      toleranceProblems({ homogeneousPercent: 0, heterogeneousPercent: Number.NaN }),
    ).toHaveLength(2);
    expect(toleranceProblems(DEFAULT_TOLERANCES)).toEqual([]);
  });

  it('muForDose(D, dpm) = D/dpm and doseForMu inverts it', () => {
    // TG-71 (Gibbons et al. 2014): MU = D / (dose per MU). 200 cGy at 0.8 cGy/MU → 250 MU.
    expectRelClose(muForDose(200, 0.8) as number, 250, 1e-12);
    expectRelClose(doseForMu(250, 0.8) as number, 200, 1e-12);
    expect(muForDose(200, null)).toBeNull();
    expect(muForDose(200, 0)).toBeNull();
    expect(doseForMu(100, null)).toBeNull();
  });

  it('isHeterogeneousPath(...) looks only at layers from the surface to the point', () => {
    const layers = [
      { topCm: 0, bottomCm: 3, relativeElectronDensity: 1.05 },
      { topCm: 3, bottomCm: 11, relativeElectronDensity: 0.258 },
      { topCm: 11, bottomCm: 20, relativeElectronDensity: 1.05 },
    ];
    expect(isHeterogeneousPath(layers, 2)).toBe(false);
    // A point on the interface belongs to the upstream layer: the lung below does not count.
    expect(isHeterogeneousPath(layers, 3)).toBe(false);
    expect(isHeterogeneousPath(layers, 3.5)).toBe(true);
    expect(isHeterogeneousPath(layers, 15)).toBe(true);
    expect(isHeterogeneousPath([{ topCm: 0, bottomCm: 5, relativeElectronDensity: 0.25 }], 0)).toBe(
      true,
    );
  });
});
