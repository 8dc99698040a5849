import { describe, expect, it } from 'vitest';
import { checkPlan, type CheckBeamInput } from '../../../src/engine/check/planCheck';
import { DEFAULT_TOLERANCES } from '../../../src/engine/check/tolerance';
import { expectRelClose } from '../../helpers/expectClose';

const WATER = [{ topCm: 0, bottomCm: 30, relativeElectronDensity: 1 }];
const LUNG_PATH = [
  { topCm: 0, bottomCm: 3, relativeElectronDensity: 1 },
  { topCm: 3, bottomCm: 10, relativeElectronDensity: 0.25 },
  { topCm: 10, bottomCm: 20, relativeElectronDensity: 1 },
];

function beam(
  id: string,
  weight: number,
  dpm: Record<string, number | null>,
  point: { planningDoseCGy?: number; planningMu?: number; depthCm?: number },
  layers = WATER,
): CheckBeamInput {
  const { planningMu, ...atPoint } = point;
  return {
    id,
    label: id,
    weight,
    planningMu,
    layers,
    points: [{ id: 'P', depthCm: point.depthCm ?? 10, ...atPoint }],
    methods: Object.entries(dpm).map(([mid, v]) => ({
      id: mid,
      label: mid,
      points: [{ id: 'P', dosePerMuCGy: v }],
    })),
  };
}

describe('checkPlan', () => {
  it('checkPlan(...) gives MU for each beam’s weighted share of the prescription', () => {
    // Two equally weighted beams, 200 cGy at P: each delivers 100 cGy. MU = D/(dose per MU).
    const r = checkPlan([beam('AP', 1, { water: 0.8 }, {}), beam('PA', 1, { water: 0.5 }, {})], {
      tolerances: DEFAULT_TOLERANCES,
      prescription: { pointId: 'P', doseCGy: 200 },
    });
    // Exact arithmetic: 100/0.8 = 125 MU, 100/0.5 = 200 MU.
    expectRelClose(r.beams[0]?.points[0]?.methods[0]?.mu as number, 125, 1e-12);
    expectRelClose(r.beams[1]?.points[0]?.methods[0]?.mu as number, 200, 1e-12);
    expect(r.beams[0]?.weightFraction).toBe(0.5);
    expect(r.verdict).toBe('none'); // nothing from the planning system to compare with
  });

  it('checkPlan(...) compares MU and dose with the planning values against the path’s tolerance', () => {
    // Planning: 128 MU for 100 cGy. Check: 100/0.8 = 125 MU → −2.34 % (fails 2 %, passes 5 %).
    const water = checkPlan(
      [beam('AP', 1, { water: 0.8 }, { planningMu: 128, planningDoseCGy: 100 })],
      { tolerances: DEFAULT_TOLERANCES, prescription: { pointId: 'P', doseCGy: 100 } },
    );
    const pw = water.beams[0]?.points[0];
    expectRelClose(pw?.methods[0]?.muDiffPercent as number, (100 * (125 - 128)) / 128, 1e-12);
    // Dose for the planning MU: 128 · 0.8 = 102.4 cGy → +2.4 %.
    expectRelClose(pw?.methods[0]?.doseDiffPercent as number, 2.4, 1e-9);
    expect(pw?.tolerancePercent).toBe(2);
    expect(pw?.methods[0]?.verdict).toBe('fail');
    expect(water.verdict).toBe('fail');

    const lung = checkPlan(
      [
        beam(
          'AP',
          1,
          { rtmr: 0.8 },
          { planningMu: 128, planningDoseCGy: 100, depthCm: 15 },
          LUNG_PATH,
        ),
      ],
      { tolerances: DEFAULT_TOLERANCES, prescription: { pointId: 'P', doseCGy: 100 } },
    );
    expect(lung.beams[0]?.points[0]?.heterogeneous).toBe(true);
    expect(lung.beams[0]?.points[0]?.tolerancePercent).toBe(5);
    expect(lung.verdict).toBe('pass');
  });

  it('checkPlan(...) sums the dose over beams at a shared point and checks the total', () => {
    const a = beam('AP', 1, { water: 0.8, rtmr: 0.82 }, { planningMu: 120, planningDoseCGy: 97 });
    const b = beam('PA', 1, { water: 0.6, rtmr: 0.61 }, { planningMu: 170, planningDoseCGy: 103 });
    const r = checkPlan([a, b], { tolerances: DEFAULT_TOLERANCES });
    const total = r.totals[0];
    const singles = [a, b].map((x) => checkPlan([x], { tolerances: DEFAULT_TOLERANCES }));
    for (const [k, id] of ['water', 'rtmr'].entries()) {
      const sum = singles.reduce((s, c) => s + (c.totals[0]?.methods[k]?.doseCGy as number), 0);
      expect(total?.methods[k]?.methodId).toBe(id);
      // Sum of the single-beam results; only round-off separates them.
      expectRelClose(total?.methods[k]?.doseCGy as number, sum, 1e-12);
    }
    expect(total?.planningDoseCGy).toBe(200);
    // water: 120·0.8 + 170·0.6 = 198 cGy → −1 %.
    expectRelClose(total?.methods[0]?.diffPercent as number, -1, 1e-9);
    expect(total?.methods[0]?.verdict).toBe('pass');
  });

  it('checkPlan(...) leaves the total empty when a beam does not list the point', () => {
    const a = beam('AP', 1, { water: 0.8 }, { planningMu: 100, planningDoseCGy: 80 });
    const b: CheckBeamInput = { ...beam('PA', 1, { water: 0.6 }, {}), points: [] };
    const r = checkPlan([a, b], { tolerances: DEFAULT_TOLERANCES });
    expect(r.totals[0]?.missingInBeams).toEqual(['PA']);
    expect(r.totals[0]?.methods[0]?.doseCGy).toBeNull();
  });

  it('checkPlan(...) decides with the requested method, else an effective-depth method', () => {
    const b = beam('AP', 1, { water: 0.7, rtmr: 0.8 }, { planningMu: 125, planningDoseCGy: 100 });
    const auto = checkPlan([b], { tolerances: DEFAULT_TOLERANCES });
    expect(auto.decisiveMethodId).toBe('rtmr');
    expect(auto.verdict).toBe('pass'); // 125 · 0.8 = 100 cGy
    const byWater = checkPlan([b], { tolerances: DEFAULT_TOLERANCES, decisiveMethodId: 'water' });
    expect(byWater.verdict).toBe('fail'); // 125 · 0.7 = 87.5 cGy, −12.5 %
    expect(byWater.verdictByMethod).toEqual({ water: 'fail', rtmr: 'pass' });
  });

  it('checkPlan(...) gives no MU where a method has no dose per MU', () => {
    const r = checkPlan([beam('AP', 1, { etar: null }, { planningMu: 100 })], {
      tolerances: DEFAULT_TOLERANCES,
      prescription: { pointId: 'P', doseCGy: 100 },
    });
    expect(r.beams[0]?.points[0]?.methods[0]?.mu).toBeNull();
    expect(r.beams[0]?.points[0]?.methods[0]?.verdict).toBe('none');
  });

  it('checkPlan(...) without a prescription gives the MU for the planning dose at each point', () => {
    // 100 cGy planned at 0.8 cGy/MU → 125 MU; planning MU 120 → +4.17 % (exact arithmetic).
    const r = checkPlan(
      [beam('AP', 1, { water: 0.8 }, { planningMu: 120, planningDoseCGy: 100 })],
      {
        tolerances: DEFAULT_TOLERANCES,
      },
    );
    const m = r.beams[0]?.points[0]?.methods[0];
    expectRelClose(m?.mu as number, 125, 1e-12);
    expectRelClose(m?.muDiffPercent as number, (100 * 5) / 120, 1e-12);
    expect(r.beams[0]?.points[0]?.prescribedDoseCGy).toBeNull();
  });
});
