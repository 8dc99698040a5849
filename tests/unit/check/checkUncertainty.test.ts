import { describe, expect, it } from 'vitest';
import {
  quadratureSum,
  sigmaOfDoseCGy,
  sigmaOfMu,
  sigmaOfPercentDifference,
  verdictWithSigma,
} from '../../../src/engine/check/checkUncertainty';
import { verdictOf, worstVerdict } from '../../../src/engine/check/tolerance';
import { expectRelClose } from '../../helpers/expectClose';

// All expected values below are exact arithmetic of first-order error propagation
// (σ_f/f = σ_x/x for f = c/x or f = c·x); 1e-12 relative allows round-off only.
describe('check uncertainty', () => {
  it('sigmaOfMu(...) gives the MU the same relative σ as the dose per MU', () => {
    // MU = 100 cGy / 0.8 cGy/MU = 125; σ_(D/MU) = 0.008 (1 %) → σ_MU = 1.25 MU (1 %).
    expectRelClose(sigmaOfMu(125, 0.8, 0.008) as number, 1.25, 1e-12);
    expect(sigmaOfMu(null, 0.8, 0.008)).toBeNull();
    expect(sigmaOfMu(125, null, 0.008)).toBeNull();
    expect(sigmaOfMu(125, 0, 0.008)).toBeNull();
  });

  it('sigmaOfDoseCGy(mu, σ) is MU times the σ of the dose per MU', () => {
    // 128 MU × 0.004 cGy/MU = 0.512 cGy.
    expectRelClose(sigmaOfDoseCGy(128, 0.004) as number, 0.512, 1e-12);
    expect(sigmaOfDoseCGy(null, 0.004)).toBeNull();
  });

  it('sigmaOfPercentDifference(σ, planning) is 100·σ/|planning|', () => {
    // σ 1.25 MU against 128 planning MU: 0.9765625 percent points.
    expectRelClose(sigmaOfPercentDifference(1.25, 128) as number, 0.9765625, 1e-12);
    expect(sigmaOfPercentDifference(1.25, 0)).toBeNull();
    expect(sigmaOfPercentDifference(null, 128)).toBeNull();
    expect(sigmaOfPercentDifference(1.25, undefined)).toBeNull();
  });

  it('quadratureSum(...) adds independent σ in quadrature and is null when one is missing', () => {
    // √(3² + 4²) = 5.
    expectRelClose(quadratureSum([3, 4]) as number, 5, 1e-12);
    expect(quadratureSum([3, null])).toBeNull();
    expect(quadratureSum([])).toBeNull();
  });

  it('verdictWithSigma(...) passes only when |Δ| + 2σ is within the tolerance', () => {
    // Tolerance 2 %: Δ 1.0 ± 0.4 → 1.8 ≤ 2 pass; Δ 1.5 ± 0.4 → 2.3 > 2, 0.7 ≤ 2 uncertain.
    expect(verdictWithSigma(1.0, 0.4, 2)).toBe('pass');
    expect(verdictWithSigma(-1.0, 0.4, 2)).toBe('pass');
    expect(verdictWithSigma(1.5, 0.4, 2)).toBe('uncertain');
    expect(verdictWithSigma(-1.5, 0.4, 2)).toBe('uncertain');
  });

  it('verdictWithSigma(...) fails only when |Δ| − 2σ is beyond the tolerance', () => {
    // Δ 2.5 ± 0.4 → 1.7 ≤ 2: uncertain; Δ 3.0 ± 0.4 → 2.2 > 2: fail.
    expect(verdictWithSigma(2.5, 0.4, 2)).toBe('uncertain');
    expect(verdictWithSigma(3.0, 0.4, 2)).toBe('fail');
    expect(verdictWithSigma(-3.0, 0.4, 2)).toBe('fail');
    expect(verdictWithSigma(null, 0.4, 2)).toBe('none');
  });

  it('verdictWithSigma(...) without σ is the plain tolerance verdict', () => {
    for (const d of [-2.01, -2, -1, 0, 1.99, 2, 2.01, 7])
      expect(verdictWithSigma(d, null, 2)).toBe(verdictOf(d, 2));
    expect(verdictWithSigma(2.5, undefined, 2)).toBe('fail');
  });

  it('worstVerdict(...) ranks fail over uncertain over pass over none', () => {
    expect(worstVerdict(['pass', 'uncertain'])).toBe('uncertain');
    expect(worstVerdict(['uncertain', 'pass', 'none'])).toBe('uncertain');
    expect(worstVerdict(['uncertain', 'fail'])).toBe('fail');
    expect(worstVerdict(['none', 'uncertain'])).toBe('uncertain');
  });
});
