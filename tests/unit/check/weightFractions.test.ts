// Beam shares of a plan without overflow: weights of 1e308 (whose sum is Infinity) used to give
// every beam a share of 0 and a check MU of 0.
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { checkPlan, type CheckBeamInput } from '../../../src/engine/check/planCheck';
import { DEFAULT_TOLERANCES } from '../../../src/engine/check/tolerance';
import { weightFractions } from '../../../src/engine/check/weightFractions';
import { expectRelClose } from '../../helpers/expectClose';

const beam = (id: string, weight: number, dpm: number): CheckBeamInput => ({
  id,
  label: id,
  weight,
  layers: [{ topCm: 0, bottomCm: 30, relativeElectronDensity: 1 }],
  points: [{ id: 'P', depthCm: 10 }],
  methods: [{ id: 'water', label: 'water', points: [{ id: 'P', dosePerMuCGy: dpm }] }],
});

describe('weightFractions(...)', () => {
  it('gives weight / Σ weights, exactly for small integers', () => {
    expect(weightFractions([1, 1])).toEqual([0.5, 0.5]);
    expect(weightFractions([1, 3])).toEqual([0.25, 0.75]);
    expect(weightFractions([0, 2])).toEqual([0, 1]);
    expect(weightFractions([0, 0])).toEqual([0, 0]);
  });

  it('weights near the largest double give the same shares as small ones (no overflow)', () => {
    expect(weightFractions([1e308, 1e308])).toEqual([0.5, 0.5]);
    expect(weightFractions([Number.MAX_VALUE, Number.MAX_VALUE, Number.MAX_VALUE / 2])).toEqual([
      0.4, 0.4, 0.2,
    ]);
  });

  it('shares are finite, in [0, 1] and sum to 1 for any non-negative finite weights, one positive', () => {
    fc.assert(
      fc.property(
        fc.array(fc.double({ min: 0, max: Number.MAX_VALUE, noNaN: true }), {
          minLength: 1,
          maxLength: 12,
        }),
        (ws) => {
          fc.pre(ws.some((w) => w > 0));
          const f = weightFractions(ws);
          for (const x of f) expect(x >= 0 && x <= 1).toBe(true);
          expect(Math.abs(f.reduce((s, x) => s + x, 0) - 1)).toBeLessThan(1e-12);
        },
      ),
      { seed: 15, numRuns: 2000 },
    );
  });

  it('checkPlan(...) with weights 1e308 gives the MU of equal weights (it gave 0.0 MU)', () => {
    const options = {
      tolerances: DEFAULT_TOLERANCES,
      prescription: { pointId: 'P', doseCGy: 200 },
    };
    const huge = checkPlan([beam('AP', 1e308, 0.8), beam('PA', 1e308, 0.5)], options);
    // 100 cGy each: 100/0.8 = 125 MU, 100/0.5 = 200 MU (exact arithmetic).
    expectRelClose(huge.beams[0]!.points[0]!.methods[0]!.mu!, 125, 1e-12);
    expectRelClose(huge.beams[1]!.points[0]!.methods[0]!.mu!, 200, 1e-12);
    expect(huge.beams.map((b) => b.weightFraction)).toEqual([0.5, 0.5]);
  });
});
