// The check's verdict in words, the same on the page, in the record and on the command line:
// which method decides and why, the one difference that gives the verdict (or the numbers that
// were missing), and the spread between methods where the verdict is decided.
import { missingOfDecisive } from '../../engine/check/decidingDifference';
import type { MissingValue, PlanCheck } from '../../engine/check/planCheck';
import type { SpreadQuantity } from '../../engine/check/methodSpread';
import { doseQuantityLabel } from '../../engine/dose/doseQuantity';

const signed = (v: number, digits = 2): string =>
  `${v > 0 ? '+' : v < 0 ? '−' : ''}${Math.abs(v).toFixed(digits)}`;

function labelOf(check: PlanCheck, id: string | null): string {
  if (id === null) return 'no method';
  return check.methods.find((m) => m.id === id)?.label ?? id;
}

const VERDICT_WORD = {
  pass: 'pass',
  fail: 'fail',
  uncertain: 'not decided',
  none: 'not compared',
} as const;

/** "Superposition …, default for a path that crosses a heterogeneity (…)". */
export function decidingMethodText(check: PlanCheck): string {
  const label = labelOf(check, check.decisiveMethodId);
  const why =
    check.decisiveMethodReason === 'chosen'
      ? 'chosen'
      : check.decisiveMethodReason === 'default-heterogeneous'
        ? 'default for a path that crosses a heterogeneity (Monte Carlo when a current run exists for every beam, else the superposition)'
        : 'default for water-like paths (the water data at the point)';
  const asked =
    check.requestedMethodUnavailable !== null
      ? `; ${check.requestedMethodUnavailable} was asked for but not computed for every beam`
      : '';
  return `${label}, ${why}${asked}`;
}

const MISSING_TEXT: Record<MissingValue, (beamId: string, pointId: string) => string> = {
  'planning-mu': (b) => `planning MU of beam ${b}`,
  'planning-dose': (b, p) => `planning dose (or prescription) at point ${p} of beam ${b}`,
  'dose-per-mu': (b, p) => `dose per MU at point ${p} of beam ${b}`,
};

/** What was missing where nothing was compared, e.g. "planning MU of beam AP". */
export function missingText(check: PlanCheck): string {
  const seen: string[] = [];
  for (const at of missingOfDecisive(check))
    for (const m of at.missing) {
      const t = MISSING_TEXT[m](at.beamId, at.pointId);
      if (!seen.includes(t)) seen.push(t);
    }
  return seen.length > 0 ? `missing ${seen.join('; ')}` : 'nothing to compare';
}

const KIND_TEXT = { mu: 'ΔMU', dose: 'Δdose', 'total-dose': 'Δ total dose' } as const;

/**
 * "fail — Superposition …: ΔMU −6.10 % beyond ±5 % (beam AP, point iso)"; the deciding
 * difference named once, or the numbers missing.
 */
export function verdictStatement(check: PlanCheck): string {
  const word = VERDICT_WORD[check.verdict];
  const label = labelOf(check, check.decisiveMethodId);
  const d = check.decidingDifference;
  if (!d) return `${word} — ${label}: ${missingText(check)}`;
  const sigma = d.sigmaPercent !== null ? ` ± ${d.sigmaPercent.toFixed(2)} (1σ)` : '';
  const relation =
    d.verdict === 'fail' ? 'beyond' : d.verdict === 'uncertain' ? 'within 2σ of' : 'within';
  const where =
    d.beamId === null ? `total at point ${d.pointId}` : `beam ${d.beamId}, point ${d.pointId}`;
  return `${word} — ${label}: ${KIND_TEXT[d.kind]} ${signed(d.percent)} %${sigma} ${relation} ±${d.tolerancePercent} % (${where})`;
}

const QUANTITY_TEXT: Record<SpreadQuantity, { name: string; unit: string; digits: number }> = {
  'check-mu': { name: 'check MU', unit: 'MU', digits: 1 },
  dose: { name: 'dose for the planning MU', unit: 'cGy', digits: 1 },
  'total-dose': { name: 'total dose', unit: 'cGy', digits: 1 },
  'dose-per-mu': { name: 'dose per MU', unit: 'cGy/MU', digits: 4 },
};

/** "Spread between methods (check MU, beam AP, point iso): 118.2 MU (Batho …) to 126.0 MU (…), 6.6 %". */
export function spreadStatement(check: PlanCheck): string {
  const s = check.spread;
  if (!s) return 'Spread between methods: fewer than two correction methods computed.';
  const q = QUANTITY_TEXT[s.quantity];
  const where =
    s.beamId === null ? `total at point ${s.pointId}` : `beam ${s.beamId}, point ${s.pointId}`;
  const v = (x: { methodId: string; value: number }) =>
    `${x.value.toFixed(q.digits)} ${q.unit} (${labelOf(check, x.methodId)})`;
  return `Spread between ${s.methods} correction methods (${q.name}, ${where}): ${v(s.low)} to ${v(s.high)}, ${s.percent.toFixed(1)} % of the ${s.base === 'deciding' ? 'deciding method’s value' : 'lowest value'}; uncorrected water left out.`;
}

/** The check in words, as the page, the record and the command line print it (and the JSON carries). */
export interface CheckStatements {
  verdict: string;
  decidingMethod: string;
  spread: string;
  doseTo: string | null;
}

export function checkStatements(check: PlanCheck): CheckStatements {
  return {
    verdict: verdictStatement(check),
    decidingMethod: decidingMethodText(check),
    spread: spreadStatement(check),
    doseTo: check.doseTo === null ? null : doseQuantityLabel(check.doseTo),
  };
}
