// Plain-text rendering of the point check: settings, per-beam table, totals over beams, the
// verdict per method and, last, the verdict in words with the deciding method and the spread.
import type { PlanCheck } from '../engine/check/planCheck';
import { doseQuantityLabel } from '../engine/dose/doseQuantity';
import {
  beamVerdictHeaders,
  beamVerdictRows,
  pointTableRows,
  POINT_TABLE_HEADERS,
  totalTableRows,
  TOTAL_TABLE_HEADERS,
} from '../io/report/reportTables';
import {
  decidingMethodText,
  spreadStatement,
  verdictStatement,
} from '../io/report/verdictStatement';

import { table } from './formatReport';

export function formatCheck(check: PlanCheck): string {
  const out: string[] = ['Point check'];
  out.push(
    `Tolerances: ${check.tolerances.homogeneousPercent} % homogeneous path, ${check.tolerances.heterogeneousPercent} % heterogeneous path`,
  );
  if (check.prescription)
    out.push(`Prescription: ${check.prescription.doseCGy} cGy at ${check.prescription.pointId}`);
  if (check.doseTo !== null) out.push(`Dose reported as: ${doseQuantityLabel(check.doseTo)}`);
  out.push(`Deciding method: ${decidingMethodText(check)}`);
  for (const b of check.beams)
    out.push(
      `Beam ${b.id}${b.label && b.label !== b.id ? ` (${b.label})` : ''}: weight ${b.weight} (${(100 * b.weightFraction).toFixed(1)} %), planning MU ${b.planningMu ?? '— (not given)'}`,
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
  out.push('');
  out.push(`Check verdict: ${verdictStatement(check)}`);
  out.push(spreadStatement(check));
  return out.join('\n');
}
