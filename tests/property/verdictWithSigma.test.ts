// The verdict of a difference that carries a statistical 1σ: invariants over generated differences,
// σ and tolerances.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { verdictWithSigma } from '../../src/engine/check/checkUncertainty';
import { verdictOf } from '../../src/engine/check/tolerance';

const diff = fc.double({ min: -50, max: 50, noNaN: true });
const sigma = fc.double({ min: 0, max: 20, noNaN: true });
const tol = fc.double({ min: 0.5, max: 20, noNaN: true });

describe('verdictWithSigma (properties)', () => {
  it('with σ = 0 or no σ it is the plain verdict', () => {
    fc.assert(
      fc.property(diff, tol, (d, t) => {
        expect(verdictWithSigma(d, 0, t)).toBe(verdictOf(d, t));
        expect(verdictWithSigma(d, null, t)).toBe(verdictOf(d, t));
      }),
    );
  });

  it('never passes what the plain rule fails, never fails what it passes', () => {
    fc.assert(
      fc.property(diff, sigma, tol, (d, s, t) => {
        const v = verdictWithSigma(d, s, t);
        const plain = verdictOf(d, t);
        if (v === 'pass') expect(plain).toBe('pass');
        if (v === 'fail') expect(plain).toBe('fail');
      }),
    );
  });

  it('a larger σ can only move a decided verdict to uncertain, never flip it', () => {
    fc.assert(
      fc.property(diff, sigma, sigma, tol, (d, s1, s2, t) => {
        const [lo, hi] = s1 <= s2 ? [s1, s2] : [s2, s1];
        const a = verdictWithSigma(d, lo, t);
        const b = verdictWithSigma(d, hi, t);
        if (b !== 'uncertain') expect(b).toBe(a);
      }),
    );
  });

  it('is symmetric in the sign of the difference', () => {
    fc.assert(
      fc.property(diff, sigma, tol, (d, s, t) => {
        expect(verdictWithSigma(-d, s, t)).toBe(verdictWithSigma(d, s, t));
      }),
    );
  });
});
