// The statistical uncertainty of a Monte Carlo dose per MU carried through the point check: the
// 1σ of the MU for a dose and of the dose for given MU (first-order propagation), of a percent
// difference from a planning value, of a sum over independent beams, and the verdict rule that
// keeps a noisy result from claiming agreement it has not shown.
import type { Verdict } from './tolerance';

/** How many σ a difference must clear the tolerance by before the check decides. */
export const VERDICT_SIGMA_MULTIPLE = 2;

/**
 * 1σ of MU = D / (dose per MU): to first order σ_MU / MU = σ_(D/MU) / (D/MU) (the prescribed
 * dose is exact). Null when the MU or the dose per MU is missing or not positive.
 */
export function sigmaOfMu(
  mu: number | null,
  dosePerMuCGy: number | null,
  sigmaDosePerMuCGy: number,
): number | null {
  if (mu === null || dosePerMuCGy === null || !(dosePerMuCGy > 0)) return null;
  if (!Number.isFinite(mu) || !Number.isFinite(sigmaDosePerMuCGy)) return null;
  return (Math.abs(mu) * sigmaDosePerMuCGy) / dosePerMuCGy;
}

/** 1σ of dose = MU × dose per MU (cGy), the planning MU being exact: MU · σ_(D/MU). */
export function sigmaOfDoseCGy(mu: number | null, sigmaDosePerMuCGy: number): number | null {
  if (mu === null || !Number.isFinite(mu) || !Number.isFinite(sigmaDosePerMuCGy)) return null;
  return Math.abs(mu) * sigmaDosePerMuCGy;
}

/**
 * 1σ of the percent difference 100 · (check − planning) / planning, the planning value being
 * exact: 100 · σ_check / |planning|. Null when either is missing or the planning value is 0.
 */
export function sigmaOfPercentDifference(
  sigmaCheck: number | null | undefined,
  planningValue: number | null | undefined,
): number | null {
  if (sigmaCheck === null || sigmaCheck === undefined || !Number.isFinite(sigmaCheck)) return null;
  if (planningValue === null || planningValue === undefined || !Number.isFinite(planningValue))
    return null;
  if (planningValue === 0) return null;
  return (100 * sigmaCheck) / Math.abs(planningValue);
}

/**
 * 1σ of a sum of independent terms (separate runs per beam): the quadrature sum √(Σ σᵢ²). Null
 * when any term has no σ, so a total never shows a σ smaller than its parts'.
 */
export function quadratureSum(sigmas: readonly (number | null | undefined)[]): number | null {
  if (sigmas.length === 0) return null;
  let s = 0;
  for (const v of sigmas) {
    if (v === null || v === undefined || !Number.isFinite(v)) return null;
    s += v * v;
  }
  return Math.sqrt(s);
}

/**
 * Verdict of a difference that carries a statistical 1σ (percent points).
 *
 * Rule: "pass" only when |Δ| + 2σ ≤ tolerance, "fail" only when |Δ| − 2σ > tolerance, and
 * "uncertain" in the band between (within the tolerance ± 2σ). Why: a Monte Carlo difference
 * that sits within 2σ of the action level may be on either side of it by chance alone (about
 * 95 % coverage for a normal batch mean), so the run has shown neither agreement nor
 * disagreement; the action is to run more histories, not to accept or to change the plan. The
 * band is symmetric so a short run neither passes nor fails a plan by its noise. Without σ
 * (deterministic methods, σ null) the plain rule |Δ| ≤ tolerance applies.
 */
export function verdictWithSigma(
  differencePercent: number | null,
  sigmaPercent: number | null | undefined,
  tolerancePercent: number,
): Verdict {
  if (differencePercent === null) return 'none';
  const eps = 1e-12;
  const d = Math.abs(differencePercent);
  const band =
    sigmaPercent === null || sigmaPercent === undefined || !Number.isFinite(sigmaPercent)
      ? 0
      : VERDICT_SIGMA_MULTIPLE * Math.abs(sigmaPercent);
  if (d + band <= tolerancePercent + eps) return 'pass';
  if (d - band > tolerancePercent + eps) return 'fail';
  return 'uncertain';
}
