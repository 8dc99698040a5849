// The JSON document of a calculation, as the CLI prints it (--json) and the page downloads it
// ("Results as JSON"): a case keeps the "lamina.calc" document with a `check` section; a plan file
// gives the plan report ("lamina.plancalc").
import type { CalcReport, PlanReport } from '../contract/reports';

export type CalcDocument = (CalcReport & { check: PlanReport['check'] }) | PlanReport;

export function calcDocumentOf(result: PlanReport, isPlan: boolean): CalcDocument {
  if (isPlan) return result;
  const first = result.beams[0];
  if (!first) throw new Error('a case calculation has one beam');
  return { ...first.report, check: result.check };
}
