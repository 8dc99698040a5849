// The one comparison that gives the check its verdict: among the deciding method's differences
// (ΔMU and Δdose per beam and point, Δ of the total over beams at each point) whose own verdict
// equals the check's, the one furthest from its tolerance relative to that tolerance (|Δ|/tol).
// Where nothing was compared, the numbers that were missing, per beam and point.
import type { MissingValue, PlanCheck } from './planCheck';
import { verdictWithSigma } from './checkUncertainty';
import type { Verdict } from './tolerance';

export type DifferenceKind = 'mu' | 'dose' | 'total-dose';

export interface DecidingDifference {
  methodId: string;
  kind: DifferenceKind;
  /** The beam (null for a total over beams). */
  beamId: string | null;
  pointId: string;
  percent: number;
  /** 1σ of the difference (percent points), Monte Carlo only. */
  sigmaPercent: number | null;
  tolerancePercent: number;
  verdict: Verdict;
}

/** Where nothing could be compared: what is missing at each beam and point. */
export interface MissingAt {
  beamId: string;
  pointId: string;
  missing: MissingValue[];
}

type CheckCore = Omit<PlanCheck, 'decidingDifference' | 'spread'>;

export function decidingDifferenceOf(check: CheckCore): DecidingDifference | null {
  const methodId = check.decisiveMethodId;
  if (methodId === null || check.verdict === 'none') return null;
  const candidates: DecidingDifference[] = [];
  const add = (
    kind: DifferenceKind,
    beamId: string | null,
    pointId: string,
    percent: number | null,
    sigmaPercent: number | null | undefined,
    tolerancePercent: number,
  ) => {
    if (percent === null) return;
    candidates.push({
      methodId,
      kind,
      beamId,
      pointId,
      percent,
      sigmaPercent: sigmaPercent ?? null,
      tolerancePercent,
      verdict: verdictWithSigma(percent, sigmaPercent ?? undefined, tolerancePercent),
    });
  };
  for (const b of check.beams)
    for (const p of b.points) {
      const m = p.methods.find((x) => x.methodId === methodId);
      if (!m) continue;
      add('mu', b.id, p.pointId, m.muDiffPercent, m.sigma?.muDiffPercent, p.tolerancePercent);
      add('dose', b.id, p.pointId, m.doseDiffPercent, m.sigma?.doseDiffPercent, p.tolerancePercent);
    }
  for (const t of check.totals) {
    const m = t.methods.find((x) => x.methodId === methodId);
    if (m && t.missingInBeams.length === 0 && check.beams.length > 1)
      add('total-dose', null, t.pointId, m.diffPercent, m.sigma?.diffPercent, t.tolerancePercent);
  }
  // The first of equal candidates (in beam and point order) decides: a later one must be larger by
  // more than rounding (TIE_RELATIVE), so points the same to the last bits (two points at the
  // surface) do not swap between two runs that round differently (page and command line).
  let best: DecidingDifference | null = null;
  let bestRatio = 0;
  for (const c of candidates) {
    if (c.verdict !== check.verdict) continue;
    const r = Math.abs(c.percent) / c.tolerancePercent;
    if (best === null || r > bestRatio * (1 + TIE_RELATIVE)) {
      best = c;
      bestRatio = r;
    }
  }
  return best;
}

/** Relative difference below which two |Δ|/tolerance ratios count as equal (rounding only). */
export const TIE_RELATIVE = 1e-9;

/** The deciding method's missing numbers at every beam and point where it compared nothing. */
export function missingOfDecisive(check: CheckCore): MissingAt[] {
  const out: MissingAt[] = [];
  for (const b of check.beams)
    for (const p of b.points) {
      const m = p.methods.find((x) => x.methodId === check.decisiveMethodId);
      if (m && m.missing.length > 0)
        out.push({ beamId: b.id, pointId: p.pointId, missing: m.missing });
    }
  return out;
}
