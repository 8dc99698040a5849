// Plain-text rendering of the point check: per-beam table, totals over beams and the verdict.
import type { PlanCheck } from '../engine/check/planCheck';
import { VERDICT_TEXT } from '../io/report/reportModel';
import {
  beamVerdictHeaders,
  beamVerdictRows,
  pointTableRows,
  POINT_TABLE_HEADERS,
  totalTableRows,
  TOTAL_TABLE_HEADERS,
} from '../io/report/reportTables';
import { table } from './formatReport';

export function formatCheck(check: PlanCheck): string {
  const out: string[] = ['Point check'];
  out.push(
    `Tolerances: ${check.tolerances.homogeneousPercent} % homogeneous path, ${check.tolerances.heterogeneousPercent} % heterogeneous path`,
  );
  if (check.prescription)
    out.push(`Prescription: ${check.prescription.doseCGy} cGy at ${check.prescription.pointId}`);
  for (const b of check.beams)
    out.push(
      `Beam ${b.id}${b.label && b.label !== b.id ? ` (${b.label})` : ''}: weight ${b.weight} (${(100 * b.weightFraction).toFixed(1)} %), planning MU ${b.planningMu ?? '—'}`,
    );
  if (check.methods.length === 0) {
    out.push('(no dose method computed: nothing to check)');
    return out.join('\n');
  }
  out.push('');
  out.push(table(POINT_TABLE_HEADERS, pointTableRows(check)));
  if (check.beams.length > 1) {
    out.push('');
    out.push('Total over beams');
    out.push(table(TOTAL_TABLE_HEADERS, totalTableRows(check)));
  }
  out.push('');
  out.push('Verdict per beam and method');
  out.push(table(beamVerdictHeaders(check), beamVerdictRows(check)));
  const decisive = check.methods.find((m) => m.id === check.decisiveMethodId);
  out.push(
    `Check verdict (${decisive ? decisive.id : 'no method'}): ${VERDICT_TEXT[check.verdict]}`,
  );
  return out.join('\n');
}
