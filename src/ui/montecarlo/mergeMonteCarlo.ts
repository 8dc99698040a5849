// Adding the page's Monte Carlo curve to a calculation report, so the depth-dose and CF views,
// their legends and the point table show it like any other method — only while the run belongs
// to the case being shown and lies on the report's depth grid.
import type { CalcReport } from '../../compute/calculateCase';
import type { MethodResult } from '../../engine/methodResult';

function sameGrid(a: readonly number[], b: readonly number[]): boolean {
  if (a.length !== b.length) return false;
  const tol = 1e-9;
  return a.every((v, i) => Math.abs(v - (b[i] as number)) <= tol);
}

/**
 * The report with `mc` appended (replacing any method of the same id; `note` added to its label),
 * or the report unchanged.
 */
export function withMonteCarloMethod<R extends CalcReport | null>(
  report: R,
  mc: MethodResult | null | undefined,
  runIsCurrent: boolean,
  note: string | null = null,
): R {
  if (!report || !mc || !runIsCurrent) return report;
  if (!sameGrid(mc.curve.depthCm, report.depthCm)) return report;
  const ids = new Set(report.points.map((p) => p.id));
  if (mc.points.some((p) => !ids.has(p.id))) return report;
  const shown = note ? { ...mc, label: `${mc.label} (${note})` } : mc;
  return { ...report, methods: [...report.methods.filter((m) => m.id !== mc.id), shown] };
}

/** Words added to the MC label in legends and tables while its result is not a finished run. */
export function partialRunNote(status: string): string | null {
  if (status === 'running') return 'running, partial';
  if (status === 'cancelled') return 'cancelled, partial';
  return null;
}
