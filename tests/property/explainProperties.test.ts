// The written-out factors over generated slab phantoms (fast-check), analytic 6 MV-like fixture
// water data (invented): each method's product of factors is its CF, and water gives factors of 1.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { productOfFactors } from '../../src/engine/corrections/correctionExplanation';
import { TYPE_A_METHODS } from '../../src/engine/corrections/typeAMethods';
import { makeF6WaterData } from '../fixtures/f6WaterData';
import { slabs } from '../fixtures/slabPhantoms';

const wd = makeF6WaterData();
const RUNS = { numRuns: 150 };
const side = fc.double({ min: 3, max: 30, noNaN: true });
const variants = fc.constantFrom(
  { ssdCm: 100 },
  { ssdCm: 90, bathoTable: 'tar' as const },
  { ssdCm: 100, etarRhoTilde: 0.4 },
);

describe('written-out factors', () => {
  it('every method: Π factors = CF to 1e-9 in random slab stacks, and the CF is the same without the terms', () => {
    fc.assert(
      fc.property(
        fc.array(
          fc.tuple(
            fc.double({ min: 0.05, max: 2.5, noNaN: true }),
            fc.double({ min: 0.2, max: 8, noNaN: true }),
          ),
          { minLength: 1, maxLength: 5 },
        ),
        fc.double({ min: 0, max: 1, noNaN: true }),
        side,
        variants,
        (spec, u, s, options) => {
          const p = slabs(spec);
          const d = u * p.totalThicknessCm;
          for (const m of TYPE_A_METHODS) {
            const r = m.correct(p, d, s, wd, { ...options, explain: true });
            // The curves' call (no terms asked for) returns the very same CF.
            expect(m.correct(p, d, s, wd, options).cf, m.id).toBe(r.cf);
            // A withheld value (unshifted Batho within d_max below an interface) has its reason in
            // the flags and no product to write out.
            if (r.cf === null) continue;
            expect(r.explanation, m.id).toBeDefined();
            const product = productOfFactors(r.explanation?.factors ?? []);
            expect(Math.abs(product - r.cf) / r.cf, m.id).toBeLessThanOrEqual(1e-9);
          }
        },
      ),
      RUNS,
    );
  });

  it('homogeneous water: every factor of every method is 1 (round-off of the summed depths: 1e-12)', () => {
    fc.assert(
      fc.property(
        fc.array(fc.double({ min: 0.2, max: 10, noNaN: true }), { minLength: 1, maxLength: 4 }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        side,
        (thicknesses, u, s) => {
          const p = slabs(thicknesses.map((t) => [1, t] as const));
          const d = u * p.totalThicknessCm;
          for (const m of TYPE_A_METHODS) {
            const r = m.correct(p, d, s, wd, { ssdCm: 100, explain: true });
            for (const f of r.explanation?.factors ?? [])
              expect(Math.abs(f.value - 1), `${m.id}: ${f.symbol}`).toBeLessThanOrEqual(1e-12);
            for (const l of r.explanation?.bathoLayers ?? []) {
              expect(l.exponent).toBe(0);
              expect(l.factor).toBe(1);
            }
          }
        },
      ),
      RUNS,
    );
  });
});
