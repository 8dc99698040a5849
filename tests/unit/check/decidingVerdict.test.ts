import { describe, expect, it } from 'vitest';
import { checkPlan, type CheckBeamInput } from '../../../src/engine/check/planCheck';
import { DEFAULT_TOLERANCES } from '../../../src/engine/check/tolerance';
import {
  decidingMethodText,
  spreadStatement,
  verdictStatement,
} from '../../../src/io/report/verdictStatement';
import { expectRelClose } from '../../helpers/expectClose';

const WATER = [{ topCm: 0, bottomCm: 30, relativeElectronDensity: 1 }];
const LUNG = [
  { topCm: 0, bottomCm: 3, relativeElectronDensity: 1 },
  { topCm: 3, bottomCm: 10, relativeElectronDensity: 0.25 },
  { topCm: 10, bottomCm: 20, relativeElectronDensity: 1 },
];

function beam(
  dpm: Record<string, number | null>,
  opts: { planningMu?: number; planningDoseCGy?: number; layers?: typeof WATER; id?: string },
): CheckBeamInput {
  return {
    id: opts.id ?? 'AP',
    label: opts.id ?? 'AP',
    weight: 1,
    planningMu: opts.planningMu,
    layers: opts.layers ?? WATER,
    points: [{ id: 'P', depthCm: 15, planningDoseCGy: opts.planningDoseCGy }],
    methods: Object.entries(dpm).map(([id, v]) => ({
      id,
      label: id,
      points: [{ id: 'P', dosePerMuCGy: v }],
    })),
  };
}

const ALL = { water: 0.9, rtmr: 0.8, batho: 0.81, superposition: 0.76, 'pencil-beam': 0.78 };

describe('the deciding method', () => {
  it('checkPlan(...) decides a heterogeneous path with the superposition by default, not ratio of TMR', () => {
    const r = checkPlan([beam(ALL, { planningMu: 125, layers: LUNG, planningDoseCGy: 100 })], {
      tolerances: DEFAULT_TOLERANCES,
    });
    expect(r.heterogeneous).toBe(true);
    expect(r.decisiveMethodId).toBe('superposition');
    expect(r.decisiveMethodReason).toBe('default-heterogeneous');
    expect(decidingMethodText(r)).toMatch(/^superposition, default for a path that crosses/);
  });

  it('checkPlan(...) prefers a Monte Carlo computed for every beam, else the superposition', () => {
    const withMc = { ...ALL, 'monte-carlo': 0.77 };
    const both = checkPlan(
      [beam(withMc, { layers: LUNG }), beam(withMc, { id: 'PA', layers: LUNG })],
      { tolerances: DEFAULT_TOLERANCES },
    );
    expect(both.decisiveMethodId).toBe('monte-carlo');
    const oneOnly = checkPlan(
      [beam(withMc, { layers: LUNG }), beam(ALL, { id: 'PA', layers: LUNG })],
      { tolerances: DEFAULT_TOLERANCES },
    );
    expect(oneOnly.decisiveMethodId).toBe('superposition');
    // A Monte Carlo listed without a dose (a stale or empty run) does not count.
    const empty = checkPlan([beam({ ...ALL, 'monte-carlo': null }, { layers: LUNG })], {
      tolerances: DEFAULT_TOLERANCES,
    });
    expect(empty.decisiveMethodId).toBe('superposition');
  });

  it('checkPlan(...) decides a water-like path with the ratio of TMR and says so', () => {
    const r = checkPlan([beam(ALL, { planningMu: 125 })], { tolerances: DEFAULT_TOLERANCES });
    expect(r.decisiveMethodId).toBe('rtmr');
    expect(r.decisiveMethodReason).toBe('default-homogeneous');
    expect(decidingMethodText(r)).toMatch(/default for water-like paths/);
  });

  it('checkPlan(...) keeps a chosen method, and names one that was not computed', () => {
    const chosen = checkPlan([beam(ALL, { layers: LUNG })], {
      tolerances: DEFAULT_TOLERANCES,
      decisiveMethodId: 'batho',
    });
    expect([chosen.decisiveMethodId, chosen.decisiveMethodReason]).toEqual(['batho', 'chosen']);
    const missing = checkPlan([beam(ALL, { layers: LUNG })], {
      tolerances: DEFAULT_TOLERANCES,
      decisiveMethodId: 'etar',
    });
    expect(missing.decisiveMethodId).toBe('superposition');
    expect(missing.requestedMethodUnavailable).toBe('etar');
    expect(decidingMethodText(missing)).toMatch(/etar was asked for but not computed/);
  });
});

describe('the planning dose alone and missing numbers', () => {
  it('checkPlan(...) compares a planning dose alone with the dose for the beam’s planning MU', () => {
    // No prescription: 125 MU × 0.8 cGy/MU = 100 cGy against a planning dose of 104 cGy → −3.85 %.
    const r = checkPlan([beam({ rtmr: 0.8 }, { planningMu: 125, planningDoseCGy: 104 })], {
      tolerances: DEFAULT_TOLERANCES,
    });
    const m = r.beams[0]?.points[0]?.methods[0];
    expectRelClose(m?.doseDiffPercent as number, (100 * (100 - 104)) / 104, 1e-12);
    expect(m?.verdict).toBe('fail');
    expect(m?.missing).toEqual([]);
  });

  it('checkPlan(...) says which number is missing where nothing is compared', () => {
    const noMu = checkPlan([beam({ rtmr: 0.8 }, { planningDoseCGy: 100 })], {
      tolerances: DEFAULT_TOLERANCES,
    });
    expect(noMu.verdict).toBe('none');
    expect(noMu.beams[0]?.points[0]?.methods[0]?.missing).toEqual(['planning-mu']);
    expect(verdictStatement(noMu)).toBe('not compared — rtmr: missing planning MU of beam AP');
    const noDose = checkPlan([beam({ rtmr: 0.8 }, { planningMu: 120 })], {
      tolerances: DEFAULT_TOLERANCES,
    });
    expect(verdictStatement(noDose)).toBe(
      'not compared — rtmr: missing planning dose (or prescription) at point P of beam AP',
    );
    const noDpm = checkPlan([beam({ rtmr: null }, { planningMu: 120, planningDoseCGy: 90 })], {
      tolerances: DEFAULT_TOLERANCES,
      decisiveMethodId: 'rtmr',
    });
    expect(noDpm.beams[0]?.points[0]?.methods[0]?.missing).toEqual(['dose-per-mu']);
  });
});

describe('the deciding difference and the spread', () => {
  it('decidingDifferenceOf(...) keeps the first of two differences equal to rounding (page and CLI name the same point)', () => {
    // Two points with the same dose per MU but for the last bit (as the page's and the CLI's
    // engines may give): the first in point order decides either way (derived).
    const d = 0.5; // 100 cGy planned with 125 MU: ΔMU +60 %, Δdose −37.5 %, a fail decided by ΔMU
    const dUp = d * (1 + 4 * Number.EPSILON);
    const twoPoints = (a: number, b: number): CheckBeamInput => ({
      id: 'AP',
      label: 'AP',
      weight: 1,
      planningMu: 125,
      layers: LUNG,
      points: [
        { id: 'P1', depthCm: 5, planningDoseCGy: 100 },
        { id: 'P2', depthCm: 6, planningDoseCGy: 100 },
      ],
      methods: [
        {
          id: 'superposition',
          label: 'superposition',
          points: [
            { id: 'P1', dosePerMuCGy: a },
            { id: 'P2', dosePerMuCGy: b },
          ],
        },
      ],
    });
    const opts = { tolerances: DEFAULT_TOLERANCES, decisiveMethodId: 'superposition' };
    for (const [a, b] of [
      [d, dUp],
      [dUp, d],
    ] as const)
      expect(checkPlan([twoPoints(a, b)], opts).decidingDifference?.pointId).toBe('P1');
    // A real difference still moves it.
    expect(checkPlan([twoPoints(d, d * 0.99)], opts).decidingDifference?.pointId).toBe('P2');
  });

  it('verdictStatement(...) names the one difference that decides, with its sign and tolerance', () => {
    // Superposition: check MU = 100/0.76 = 131.58 vs 125 planning MU → +5.26 % (fails 5 %);
    // dose 125 × 0.76 = 95 cGy vs 100 → −5.00 % (passes): the MU difference decides.
    const r = checkPlan([beam(ALL, { planningMu: 125, planningDoseCGy: 100, layers: LUNG })], {
      tolerances: DEFAULT_TOLERANCES,
      prescription: { pointId: 'P', doseCGy: 100 },
    });
    expect(r.verdict).toBe('fail');
    expect(r.decidingDifference?.kind).toBe('mu');
    expectRelClose(
      r.decidingDifference?.percent as number,
      (100 * (100 / 0.76 - 125)) / 125,
      1e-12,
    );
    expect(verdictStatement(r)).toBe(
      'fail — superposition: ΔMU +5.26 % beyond ±5 % (beam AP, point P)',
    );
  });

  it('spreadStatement(...) gives the range of the check value across the correction methods', () => {
    const r = checkPlan([beam(ALL, { planningMu: 125, planningDoseCGy: 100, layers: LUNG })], {
      tolerances: DEFAULT_TOLERANCES,
      prescription: { pointId: 'P', doseCGy: 100 },
    });
    // Check MU 100/dpm: lowest from batho (0.81 → 123.46), highest from superposition (0.76 →
    // 131.58); water (uncorrected) is left out. Spread relative to the deciding value 131.58.
    expect(r.spread?.low.methodId).toBe('batho');
    expect(r.spread?.high.methodId).toBe('superposition');
    expect(r.spread?.methods).toBe(4);
    expectRelClose(
      r.spread?.percent as number,
      (100 * (100 / 0.76 - 100 / 0.81)) / (100 / 0.76),
      1e-12,
    );
    expect(spreadStatement(r)).toMatch(
      /^Spread between 4 correction methods \(check MU, beam AP, point P\): 123\.5 MU \(batho\) to 131\.6 MU \(superposition\), 6\.2 %/,
    );
  });
});

describe('the deciding difference between equal points', () => {
  // Two points at the same place whose doses per MU differ only in the last bits (rounding): the
  // first point decides whichever rounds larger, so page and command line name the same point.
  const twoPoints = (a: number, b: number): CheckBeamInput => ({
    id: 'AP',
    label: 'AP',
    weight: 1,
    planningMu: 100,
    layers: WATER,
    points: [
      { id: 'P2', depthCm: 0, planningDoseCGy: 100 },
      { id: 'P3', depthCm: 0, planningDoseCGy: 100 },
    ],
    methods: [
      {
        id: 'rtmr',
        label: 'rtmr',
        points: [
          { id: 'P2', dosePerMuCGy: a },
          { id: 'P3', dosePerMuCGy: b },
        ],
      },
    ],
  });

  it('names the first point when the two differ by rounding only, in either order', () => {
    const v = 0.5;
    const w = v * (1 + 4e-16);
    for (const [a, b] of [
      [v, w],
      [w, v],
    ] as const) {
      const r = checkPlan([twoPoints(a, b)], { tolerances: DEFAULT_TOLERANCES });
      expect(r.decidingDifference?.pointId).toBe('P2');
    }
  });

  it('names the later point when its difference is really larger', () => {
    const r = checkPlan([twoPoints(0.5, 0.45)], { tolerances: DEFAULT_TOLERANCES });
    expect(r.decidingDifference?.pointId).toBe('P3');
  });
});
