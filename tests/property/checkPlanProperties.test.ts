// Properties of the point check for random beams: the total at a point is the sum of the
// single-beam doses, the MU deliver each beam's weighted share, and a verdict fails exactly
// when some difference exceeds its tolerance.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { checkPlan, type CheckBeamInput } from '../../src/engine/check/planCheck';
import { DEFAULT_TOLERANCES } from '../../src/engine/check/tolerance';

const beamArb = fc.record({
  weight: fc.double({ min: 0.05, max: 5, noNaN: true }),
  dosePerMuCGy: fc.double({ min: 0.2, max: 1.5, noNaN: true }),
  planningMu: fc.double({ min: 10, max: 999, noNaN: true }),
  planningDoseCGy: fc.double({ min: 10, max: 300, noNaN: true }),
});

type BeamDraw = {
  weight: number;
  dosePerMuCGy: number;
  planningMu: number;
  planningDoseCGy: number;
};

function inputOf(b: BeamDraw, i: number): CheckBeamInput {
  return {
    id: `B${i}`,
    label: `B${i}`,
    weight: b.weight,
    planningMu: b.planningMu,
    layers: [{ topCm: 0, bottomCm: 30, relativeElectronDensity: 1 }],
    points: [{ id: 'P', depthCm: 10, planningDoseCGy: b.planningDoseCGy }],
    methods: [{ id: 'water', label: 'water', points: [{ id: 'P', dosePerMuCGy: b.dosePerMuCGy }] }],
  };
}

describe('checkPlan properties', () => {
  it('checkPlan(...) totals equal the sum of single-beam doses and MU × dose per MU equals each share', () => {
    fc.assert(
      fc.property(
        fc.array(beamArb, { minLength: 1, maxLength: 6 }),
        fc.double({ min: 1, max: 1000, noNaN: true }),
        (bs, rx) => {
          const beams = bs.map(inputOf);
          const all = checkPlan(beams, {
            tolerances: DEFAULT_TOLERANCES,
            prescription: { pointId: 'P', doseCGy: rx },
          });
          const sum = beams
            .map(
              (b) =>
                checkPlan([b], { tolerances: DEFAULT_TOLERANCES }).totals[0]?.methods[0]
                  ?.doseCGy as number,
            )
            .reduce((s, v) => s + v, 0);
          const total = all.totals[0]?.methods[0]?.doseCGy as number;
          // Floating-point sums in a different grouping: 1e-12 relative.
          expect(Math.abs(total - sum)).toBeLessThanOrEqual(1e-12 * Math.abs(sum));
          const wsum = bs.reduce((s, b) => s + b.weight, 0);
          let delivered = 0;
          all.beams.forEach((b, i) => {
            const m = b.points[0]?.methods[0];
            const share = (rx * (bs[i]?.weight ?? 0)) / wsum;
            delivered += (m?.mu as number) * (m?.dosePerMuCGy as number);
            expect(
              Math.abs((m?.mu as number) * (m?.dosePerMuCGy as number) - share),
            ).toBeLessThanOrEqual(1e-9 * share);
          });
          // The MU of all beams deliver the prescription: round-off only.
          expect(Math.abs(delivered - rx)).toBeLessThanOrEqual(1e-9 * rx);
          const worst = Math.max(
            ...all.beams.flatMap((b) =>
              b.points.flatMap((p) =>
                p.methods.flatMap((m) =>
                  [m.muDiffPercent ?? 0, m.doseDiffPercent ?? 0].map(Math.abs),
                ),
              ),
            ),
            ...all.totals.flatMap((t) => t.methods.map((m) => Math.abs(m.diffPercent ?? 0))),
          );
          expect(all.verdict).toBe(
            worst > DEFAULT_TOLERANCES.homogeneousPercent + 1e-12 ? 'fail' : 'pass',
          );
        },
      ),
      { numRuns: 300, seed: 20261201 },
    );
  });
});
