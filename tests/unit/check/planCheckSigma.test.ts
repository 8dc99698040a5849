import { describe, expect, it } from 'vitest';
import { checkPlan, type CheckBeamInput } from '../../../src/engine/check/planCheck';
import { DEFAULT_TOLERANCES } from '../../../src/engine/check/tolerance';
import { expectRelClose } from '../../helpers/expectClose';

const WATER = [{ topCm: 0, bottomCm: 30, relativeElectronDensity: 1 }];

function beam(
  id: string,
  methods: Record<string, { dpm: number | null; sigma?: number }>,
  point: { planningDoseCGy?: number; planningMu?: number },
): CheckBeamInput {
  const { planningMu, ...atPoint } = point;
  return {
    id,
    label: id,
    weight: 1,
    planningMu,
    layers: WATER,
    points: [{ id: 'P', depthCm: 10, ...atPoint }],
    methods: Object.entries(methods).map(([mid, v]) => ({
      id: mid,
      label: mid,
      points: [
        v.sigma === undefined
          ? { id: 'P', dosePerMuCGy: v.dpm }
          : { id: 'P', dosePerMuCGy: v.dpm, sigmaDosePerMuCGy: v.sigma },
      ],
    })),
  };
}

const rx = { pointId: 'P', doseCGy: 100 };

// Expected values are exact first-order propagation; 1e-12 relative allows round-off only.
describe('checkPlan with a Monte Carlo σ', () => {
  it('checkPlan(...) gives the MU and the dose of a method with σ their first-order 1σ', () => {
    // MU = 100/0.8 = 125 ± 125·0.008/0.8 = 1.25; dose = 125 MU · 0.8 = 100 ± 125·0.008 = 1 cGy.
    const r = checkPlan(
      [
        beam(
          'AP',
          { 'monte-carlo': { dpm: 0.8, sigma: 0.008 }, water: { dpm: 0.8 } },
          { planningMu: 125, planningDoseCGy: 100 },
        ),
      ],
      { tolerances: DEFAULT_TOLERANCES, prescription: rx },
    );
    const [mc, water] = r.beams[0]?.points[0]?.methods ?? [];
    expectRelClose(mc?.sigma?.dosePerMuCGy as number, 0.008, 1e-12);
    expectRelClose(mc?.sigma?.mu as number, 1.25, 1e-12);
    expectRelClose(mc?.sigma?.doseCGy as number, 1, 1e-12);
    expectRelClose(mc?.sigma?.muDiffPercent as number, 1, 1e-12);
    expectRelClose(mc?.sigma?.doseDiffPercent as number, 1, 1e-12);
    // Deterministic methods carry no σ block at all.
    expect(water?.sigma).toBeUndefined();
  });

  it('checkPlan(...) calls a Monte Carlo point uncertain when within tolerance by less than 2σ', () => {
    // Planning 128 MU for 100 cGy; check 100/0.8 = 125 MU (−2.34 %), 128 × 0.8 = 102.4 cGy
    // (+2.40 %); a water path with a 3 % tolerance, so both differences are within it.
    const tolerances = { homogeneousPercent: 3, heterogeneousPercent: 5 };
    const planning = { planningMu: 128, planningDoseCGy: 100 };
    // σ 1 % of D/MU: Δ_MU −2.34 ± 0.98, Δ_dose +2.40 ± 1.02 → |Δ| + 2σ > 3, |Δ| − 2σ < 3.
    const noisy = checkPlan([beam('AP', { 'monte-carlo': { dpm: 0.8, sigma: 0.008 } }, planning)], {
      tolerances,
      prescription: rx,
      decisiveMethodId: 'monte-carlo',
    });
    expect(noisy.beams[0]?.points[0]?.methods[0]?.verdict).toBe('uncertain');
    expect(noisy.verdict).toBe('uncertain');
    // σ 0.1 %: |Δ| + 2σ ≈ 2.6 ≤ 3 → pass, the same difference now shown within tolerance.
    const long = checkPlan([beam('AP', { 'monte-carlo': { dpm: 0.8, sigma: 0.0008 } }, planning)], {
      tolerances,
      prescription: rx,
    });
    expect(long.beams[0]?.points[0]?.methods[0]?.verdict).toBe('pass');
    // The same numbers without σ pass as before.
    const plain = checkPlan([beam('AP', { rtmr: { dpm: 0.8 } }, planning)], {
      tolerances,
      prescription: rx,
    });
    expect(plain.beams[0]?.points[0]?.methods[0]?.verdict).toBe('pass');
  });

  it('checkPlan(...) combines the beams’ σ of the total dose in quadrature', () => {
    // AP: 120 MU × σ 0.003 = 0.36 cGy; PA: 100 MU × σ 0.0048 = 0.48 cGy → √(0.36² + 0.48²) = 0.6.
    const r = checkPlan(
      [
        beam('AP', { 'monte-carlo': { dpm: 0.8, sigma: 0.003 } }, { planningMu: 120 }),
        beam('PA', { 'monte-carlo': { dpm: 1.0, sigma: 0.0048 } }, { planningMu: 100 }),
      ],
      { tolerances: DEFAULT_TOLERANCES },
    );
    const t = r.totals[0]?.methods[0];
    expectRelClose(t?.doseCGy as number, 196, 1e-12);
    expectRelClose(t?.sigma?.doseCGy as number, 0.6, 1e-12);
  });

  it('checkPlan(...) gives no total σ when a beam lacks the Monte Carlo', () => {
    const r = checkPlan(
      [
        beam(
          'AP',
          { 'monte-carlo': { dpm: 0.8, sigma: 0.003 }, water: { dpm: 0.8 } },
          {
            planningMu: 120,
            planningDoseCGy: 96,
          },
        ),
        beam('PA', { water: { dpm: 1.0 } }, { planningMu: 100, planningDoseCGy: 100 }),
      ],
      { tolerances: DEFAULT_TOLERANCES },
    );
    const mcTotal = r.totals[0]?.methods.find((m) => m.methodId === 'monte-carlo');
    expect(mcTotal?.doseCGy).toBeNull();
    expect(mcTotal?.sigma?.doseCGy).toBeNull();
    expect(mcTotal?.verdict).toBe('none');
    const waterTotal = r.totals[0]?.methods.find((m) => m.methodId === 'water');
    expect(waterTotal?.sigma).toBeUndefined();
    expect(waterTotal?.verdict).toBe('pass');
  });
});
