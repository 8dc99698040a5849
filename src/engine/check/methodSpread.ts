// How far the methods disagree where the verdict is decided: the range of the check's value
// (check MU, dose for the planning MU, or total dose) across the heterogeneity-correction
// methods at that beam and point, with the methods at both ends. The uncorrected water method is
// left out: its distance from the others is the size of the correction, not a disagreement.
// Without a deciding comparison, the dose per MU at the prescription point (else the first point
// of the first beam).
import type { DecidingDifference } from './decidingDifference';
import type { PlanCheck } from './planCheck';

export type SpreadQuantity = 'check-mu' | 'dose' | 'total-dose' | 'dose-per-mu';

export interface MethodSpread {
  quantity: SpreadQuantity;
  beamId: string | null;
  pointId: string;
  low: { methodId: string; value: number };
  high: { methodId: string; value: number };
  /** (high − low) as a percentage of the deciding method's value (of low without one). */
  percent: number;
  /** What `percent` is relative to. */
  base: 'deciding' | 'lowest';
  /** Number of methods compared. */
  methods: number;
}

type CheckCore = Omit<PlanCheck, 'decidingDifference' | 'spread'>;

const UNCORRECTED = 'water';

function spreadOf(
  quantity: SpreadQuantity,
  beamId: string | null,
  pointId: string,
  values: readonly { methodId: string; value: number | null }[],
  decisiveId: string | null,
): MethodSpread | null {
  const v = values.filter(
    (x): x is { methodId: string; value: number } =>
      x.methodId !== UNCORRECTED && x.value !== null && Number.isFinite(x.value) && x.value > 0,
  );
  if (v.length < 2) return null;
  let low = v[0]!;
  let high = v[0]!;
  for (const x of v) {
    if (x.value < low.value) low = x;
    if (x.value > high.value) high = x;
  }
  const deciding = v.find((x) => x.methodId === decisiveId);
  const base = deciding?.value ?? low.value;
  return {
    quantity,
    beamId,
    pointId,
    low,
    high,
    percent: (100 * (high.value - low.value)) / base,
    base: deciding ? 'deciding' : 'lowest',
    methods: v.length,
  };
}

export function methodSpreadOf(
  check: CheckCore,
  deciding: DecidingDifference | null,
): MethodSpread | null {
  const id = check.decisiveMethodId;
  if (deciding && deciding.kind === 'total-dose') {
    const t = check.totals.find((x) => x.pointId === deciding.pointId);
    return t
      ? spreadOf(
          'total-dose',
          null,
          t.pointId,
          t.methods.map((m) => ({ methodId: m.methodId, value: m.doseCGy })),
          id,
        )
      : null;
  }
  if (deciding) {
    const b = check.beams.find((x) => x.id === deciding.beamId);
    const p = b?.points.find((x) => x.pointId === deciding.pointId);
    if (!b || !p) return null;
    return deciding.kind === 'mu'
      ? spreadOf(
          'check-mu',
          b.id,
          p.pointId,
          p.methods.map((m) => ({ methodId: m.methodId, value: m.mu })),
          id,
        )
      : spreadOf(
          'dose',
          b.id,
          p.pointId,
          p.methods.map((m) => ({ methodId: m.methodId, value: m.doseCGy })),
          id,
        );
  }
  const b = check.beams[0];
  const rxId = check.prescription?.pointId;
  const p = b?.points.find((x) => x.pointId === rxId) ?? b?.points[0];
  if (!b || !p) return null;
  return spreadOf(
    'dose-per-mu',
    b.id,
    p.pointId,
    p.methods.map((m) => ({ methodId: m.methodId, value: m.dosePerMuCGy })),
    id,
  );
}
