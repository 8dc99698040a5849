// Comparing an independent check with the planning system: percent difference, tolerance and
// verdict. Action levels are editable; the defaults sit inside the range AAPM TG-114 (Stern et
// al. 2011) suggests for non-IMRT secondary checks — about 2 % for a simple homogeneous geometry
// and up to about 5 % where heterogeneity is handled differently (from memory).

/**
 * "uncertain": a Monte Carlo difference within the tolerance ± 2σ of its statistics, neither
 * shown inside nor outside (see verdictWithSigma); run more histories.
 */
export type Verdict = 'pass' | 'fail' | 'uncertain' | 'none';

export interface Tolerances {
  /** Action level for a path through water-like material only (%). */
  homogeneousPercent: number;
  /** Action level for a path that crosses a heterogeneity (%). */
  heterogeneousPercent: number;
}

export const DEFAULT_TOLERANCES: Readonly<Tolerances> = {
  homogeneousPercent: 2,
  heterogeneousPercent: 5,
};

/**
 * Percent difference of the check value from the planning system's value:
 * 100 · (check − planning) / planning. Null when either is missing, the planning value is 0 or the quotient overflows.
 */
export function percentDifference(
  checkValue: number | null | undefined,
  planningValue: number | null | undefined,
): number | null {
  if (checkValue === null || checkValue === undefined || !Number.isFinite(checkValue)) return null;
  if (planningValue === null || planningValue === undefined || !Number.isFinite(planningValue))
    return null;
  if (planningValue === 0) return null;
  const d = (100 * (checkValue - planningValue)) / planningValue;
  return Number.isFinite(d) ? d : null;
}

/** Pass when |difference| ≤ tolerance; "none" when there is nothing to compare. */
export function verdictOf(differencePercent: number | null, tolerancePercent: number): Verdict {
  if (differencePercent === null) return 'none';
  return Math.abs(differencePercent) <= tolerancePercent + 1e-12 ? 'pass' : 'fail';
}

/** The worst of several verdicts: any fail fails, then uncertain, then pass; all none gives none. */
export function worstVerdict(verdicts: Iterable<Verdict>): Verdict {
  let out: Verdict = 'none';
  for (const v of verdicts) {
    if (v === 'fail') return 'fail';
    if (v === 'uncertain') out = 'uncertain';
    else if (v === 'pass' && out === 'none') out = 'pass';
  }
  return out;
}

/** The tolerance that applies to a path. */
export function toleranceFor(heterogeneous: boolean, tolerances: Tolerances): number {
  return heterogeneous ? tolerances.heterogeneousPercent : tolerances.homogeneousPercent;
}

/** Tolerances must be finite and positive; returns the problems found (empty when valid). */
export function toleranceProblems(t: Tolerances): string[] {
  const out: string[] = [];
  if (!Number.isFinite(t.homogeneousPercent) || t.homogeneousPercent <= 0)
    out.push('homogeneous tolerance must be a positive number of percent');
  if (!Number.isFinite(t.heterogeneousPercent) || t.heterogeneousPercent <= 0)
    out.push('heterogeneous tolerance must be a positive number of percent');
  return out;
}
