import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { validateCase } from '../../src/io/caseFile';
import { calculateCase } from '../../src/compute/calculateCase';
import { malformedCase, validCase } from './generators/caseArbitraries';

/** Every number anywhere in a value is finite (null allowed). */
function allFinite(value: unknown, path = ''): string | null {
  if (typeof value === 'number') return Number.isFinite(value) ? null : path || '(root)';
  if (Array.isArray(value)) {
    for (let i = 0; i < value.length; i++) {
      const bad = allFinite(value[i], `${path}[${i}]`);
      if (bad) return bad;
    }
    return null;
  }
  if (value && typeof value === 'object') {
    for (const [k, v] of Object.entries(value)) {
      const bad = allFinite(v, path ? `${path}.${k}` : k);
      if (bad) return bad;
    }
  }
  return null;
}

describe('case pipeline under generated input (parse → engine → report)', () => {
  it('either computes a report with no NaN/Infinity or rejects with a named field (10 000 inputs)', () => {
    let valid = 0;
    let rejected = 0;
    fc.assert(
      fc.property(fc.oneof(validCase, malformedCase), (raw) => {
        const r = validateCase(raw);
        if (!r.ok) {
          rejected++;
          expect(r.problems.length).toBeGreaterThan(0);
          for (const p of r.problems) {
            expect(p.path.length).toBeGreaterThan(0);
            expect(p.message.length).toBeGreaterThan(0);
          }
          return;
        }
        valid++;
        const report = calculateCase(r.value, { depthStepCm: 1 });
        expect(allFinite(report)).toBeNull();
      }),
      { numRuns: 10_000, seed: 20261201 },
    );
    // Both branches must really be exercised.
    expect(valid).toBeGreaterThan(1000);
    expect(rejected).toBeGreaterThan(1000);
  });

  it('accepts every generated valid case', () => {
    fc.assert(
      fc.property(validCase, (raw) => {
        const r = validateCase(raw);
        if (!r.ok) throw new Error(JSON.stringify(r.problems));
      }),
      { numRuns: 500, seed: 7 },
    );
  });
});
