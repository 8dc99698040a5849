import { describe, expect, it } from 'vitest';
import { numericDiff } from '../../helpers/numericDiff';

describe('numericDiff (the parity test’s comparison)', () => {
  it('accepts numbers within the relative tolerance and nothing else', () => {
    expect(numericDiff({ a: [1, 2] }, { a: [1, 2 * (1 + 1e-10)] }, 1e-9)).toEqual([]);
    expect(numericDiff({ a: [1, 2] }, { a: [1, 2 * (1 + 1e-8)] }, 1e-9)).toEqual([
      `$.a[1]: 2 ≠ ${2 * (1 + 1e-8)}`,
    ]);
  });

  it('reports different strings, flags, nulls, keys and lengths', () => {
    expect(numericDiff({ f: ['LED (severe)'] }, { f: ['LED (caution)'] }, 1e-9)).toHaveLength(1);
    expect(numericDiff({ v: null }, { v: 0 }, 1e-9)).toEqual(['$.v: null ≠ 0']);
    expect(numericDiff({ a: 1 }, { a: 1, b: 2 }, 1e-9)[0]).toMatch(/keys/);
    expect(numericDiff([1], [1, 2], 1e-9)).toEqual(['$: length 1 ≠ 2']);
  });
});
