import { describe, expect, it } from 'vitest';
import { expIntegralE1 } from '../../../src/engine/util/exponentialIntegral';
import { expectRelClose } from '../../helpers/expectClose';

describe('expIntegralE1', () => {
  it('expIntegralE1 matches tabulated E₁ on both sides of the series/continued-fraction switch', () => {
    // Abramowitz & Stegun table 5.1 (from memory): E1(0.5), E1(1), E1(2), E1(5)
    const table: [number, number][] = [
      [0.5, 0.5597735947761608],
      [1, 0.21938393439552029],
      [2, 0.04890051070806112],
      [5, 0.001148295591275326],
    ];
    // series and continued fraction both converge to ~1e-15; 1e-12 leaves room for round-off
    for (const [x, e1] of table) expectRelClose(expIntegralE1(x), e1, 1e-12);
  });

  it('expIntegralE1 is continuous at x = 1 and infinite at 0', () => {
    expectRelClose(expIntegralE1(1 - 1e-12), expIntegralE1(1 + 1e-12), 1e-9);
    expect(expIntegralE1(0)).toBe(Infinity);
  });
});
