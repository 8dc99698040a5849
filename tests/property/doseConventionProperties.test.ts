// In a water phantom dose to water and dose to medium are the same quantity: every method must
// give identical numbers in both conventions (fast-check over water phantoms and points).
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { calculateCase } from '../../src/compute/calculateCase';
import type { LaminaCase } from '../../src/io/caseSchema';

const RUNS = { numRuns: 8 };

describe('dose convention invariants', () => {
  it('calculateCase(...) in water gives the same dose per MU and CF for water and medium', () => {
    fc.assert(
      fc.property(
        fc.array(fc.double({ min: 1, max: 8, noNaN: true }), { minLength: 1, maxLength: 3 }),
        fc.double({ min: 0.05, max: 0.95, noNaN: true }),
        fc.constantFrom('Co-60', '6MV', '18MV'),
        (thicknesses, u, energy) => {
          const total = thicknesses.reduce((s, t) => s + t, 0);
          const c: LaminaCase = {
            format: 'lamina.case',
            version: 2,
            name: 'water',
            beam: { energy, setup: { kind: 'SSD', ssdCm: 100 }, fieldXCm: 10, fieldYCm: 10 },
            layers: thicknesses.map((t) => ({ materialId: 'water', thicknessCm: t })),
            points: [{ id: 'P', depthCm: u * total }],
          };
          const o = { depthStepCm: 1, methods: ['water', 'rtmr', 'batho', 'pencil-beam'] };
          const w = calculateCase(c, { ...o, doseTo: 'water' });
          const m = calculateCase(c, { ...o, doseTo: 'medium' });
          w.methods.forEach((wm, k) => {
            const mm = m.methods[k]!;
            expect(mm.points).toEqual(wm.points);
            expect(mm.curve.dosePerMuCGy).toEqual(wm.curve.dosePerMuCGy);
            expect(mm.curve.cf).toEqual(wm.curve.cf);
          });
        },
      ),
      RUNS,
    );
  });
});
