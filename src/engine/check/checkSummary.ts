// One line per check: the largest percent difference of a method over every beam, point and
// total, the number of comparisons made and the verdict, for batch runs and summaries.
import type { PlanCheck } from './planCheck';
import type { Verdict } from './tolerance';

export interface CheckSummary {
  methodId: string | null;
  /** Largest |difference| (%) found for the method, signed; null when nothing was compared. */
  largestDiffPercent: number | null;
  comparisons: number;
  verdict: Verdict;
}

export function summarizeCheck(check: PlanCheck, methodId = check.decisiveMethodId): CheckSummary {
  let largest: number | null = null;
  let comparisons = 0;
  const consider = (v: number | null) => {
    if (v === null) return;
    comparisons += 1;
    if (largest === null || Math.abs(v) > Math.abs(largest)) largest = v;
  };
  for (const b of check.beams)
    for (const p of b.points)
      for (const m of p.methods)
        if (m.methodId === methodId) {
          consider(m.muDiffPercent);
          consider(m.doseDiffPercent);
        }
  if (check.beams.length > 1)
    for (const t of check.totals)
      for (const m of t.methods) if (m.methodId === methodId) consider(m.diffPercent);
  return {
    methodId,
    largestDiffPercent: largest,
    comparisons,
    verdict: methodId === null ? 'none' : (check.verdictByMethod[methodId] ?? 'none'),
  };
}
