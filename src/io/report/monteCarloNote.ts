// What the record says about a Monte Carlo result in the check: the run's histories, batches
// and seed (read back from the method's variant text, which the engine writes) and what the
// "± σ" values and the "uncertain" verdict mean, so the printed record can be reproduced.
import type { CalcReport } from '../../contract/reports';
import { VERDICT_SIGMA_MULTIPLE } from '../../engine/check/checkUncertainty';

export const MONTE_CARLO_METHOD_ID = 'monte-carlo';

export interface McRunFacts {
  histories: number;
  batchesDone: number;
  batches: number;
  seed: number;
}

/** The run's facts from a variant such as "…; 200000 histories in 10 of 10 batches, seed 7; …". */
export function monteCarloRunOf(variant: string): McRunFacts | null {
  const m = /(\d+) histories in (\d+) of (\d+) batches, seed (\d+)/.exec(variant);
  if (!m) return null;
  return {
    histories: Number(m[1]),
    batchesDone: Number(m[2]),
    batches: Number(m[3]),
    seed: Number(m[4]),
  };
}

/** One sentence per beam that has a Monte Carlo result; empty when none has. */
export function monteCarloRecordLines(
  beams: readonly { id: string; report: CalcReport }[],
): string[] {
  const out: string[] = [];
  for (const b of beams) {
    const mc = b.report.methods.find((m) => m.id === MONTE_CARLO_METHOD_ID);
    if (!mc) continue;
    const run = monteCarloRunOf(mc.variant);
    const facts = run
      ? `${run.histories} histories per run in ${run.batchesDone} of ${run.batches} batches, seed ${run.seed}${run.batchesDone < run.batches ? ' (partial run)' : ''}`
      : `variant: ${mc.variant}`;
    out.push(`${mc.label}, beam ${b.id}: ${facts}.`);
  }
  if (out.length > 0)
    out.push(
      `Monte Carlo values written "x ± s" give the statistical 1σ of the batch means (dose per MU; MU and dose to first order, σ_MU/MU = σ_D/D; totals over beams in quadrature). A Monte Carlo verdict is "uncertain" when the difference lies within the tolerance ± ${VERDICT_SIGMA_MULTIPLE}σ: the run shows neither agreement nor disagreement; run more histories.`,
    );
  return out;
}
