import { expect } from 'vitest';

/** |actual − expected| ≤ relTol·|expected|; the reason for the tolerance belongs in the test. */
export function expectRelClose(actual: number, expected: number, relTol: number): void {
  expect(Number.isFinite(actual), `expected a finite number, got ${actual}`).toBe(true);
  const err = Math.abs(actual - expected) / Math.abs(expected);
  expect(
    err,
    `actual ${actual} vs expected ${expected} (relative error ${err.toExponential(2)} > ${relTol})`,
  ).toBeLessThanOrEqual(relTol);
}

/** |actual − expected| ≤ absTol. */
export function expectAbsClose(actual: number, expected: number, absTol: number): void {
  expect(Number.isFinite(actual), `expected a finite number, got ${actual}`).toBe(true);
  expect(
    Math.abs(actual - expected),
    `actual ${actual} vs expected ${expected}`,
  ).toBeLessThanOrEqual(absTol);
}
