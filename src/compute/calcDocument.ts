// The JSON document of a calculation, as the CLI prints it (--json) and the page downloads it
// ("Results (JSON)"): a case keeps the "lamina.calc" document with a `check` section; a plan file
// gives the plan report ("lamina.plancalc"). The check carries its verdict, deciding method,
// spread and dose convention in words as well (`check.statements`, the page's and record's wording).
import type { CalcReport, PlanReport } from '../contract/reports';
import { checkStatements, type CheckStatements } from '../io/report/verdictStatement';

type DocumentCheck = PlanReport['check'] & { statements: CheckStatements };

export type CalcDocument =
  (CalcReport & { check: DocumentCheck }) | (Omit<PlanReport, 'check'> & { check: DocumentCheck });

export function calcDocumentOf(result: PlanReport, isPlan: boolean): CalcDocument {
  const check = { ...result.check, statements: checkStatements(result.check) };
  if (isPlan) return { ...result, check };
  const first = result.beams[0];
  if (!first) throw new Error('a case calculation has one beam');
  return { ...first.report, check };
}
