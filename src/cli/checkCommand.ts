// The check part of the command line: one case or plan file calculated with its point check
// (text or JSON) through the same contract as the page (src/compute/calcRequest.ts), and the
// options shared with batch mode.
import type { CaseCalcOptions, PlanCalcOverrides, Problem } from '../compute/calcRequest';
import { calculatePlanRequest, type PlanAnswer } from '../compute/calculationService';
import { calcDocumentOf } from '../compute/calcDocument';
import type { WaterSourceSpec } from '../compute/waterSource';
import type { PlanReport } from '../contract/reports';
import { monteCarloRecordLines } from '../io/report/monteCarloNote';
import { formatCheck } from './formatCheck';
import { formatReport } from './formatReport';

/** Everything a file is calculated with on the command line. */
export interface CliCalc {
  water: WaterSourceSpec;
  options: CaseCalcOptions & PlanCalcOverrides;
}

export type ParsedDocument = { ok: true; raw: unknown } | { ok: false; problems: Problem[] };

/** Parse the JSON text of a case or plan file. */
export function loadDocument(text: string): ParsedDocument {
  try {
    return { ok: true, raw: JSON.parse(text) as unknown };
  } catch (e) {
    return {
      ok: false,
      problems: [{ path: '(file)', message: `not valid JSON: ${(e as Error).message}` }],
    };
  }
}

/** The calculation of a parsed document (validation problems come back in the answer). */
export function calculateDocument(doc: ParsedDocument, calc: CliCalc): PlanAnswer {
  if (!doc.ok) return doc;
  return calculatePlanRequest({ purpose: 'plan', plan: doc.raw, ...calc });
}

/**
 * Options from --methods, --tolerances H,X, --prescribe POINT=DOSE, --check-method ID and
 * --dose-to water|medium; throws on a malformed value.
 */
export function planOptionsOf(
  flags: Map<string, string | true>,
): CaseCalcOptions & PlanCalcOverrides {
  const options: CaseCalcOptions & PlanCalcOverrides = {};
  const methods = flags.get('methods');
  if (typeof methods === 'string')
    options.methods = methods
      .split(',')
      .map((s) => s.trim())
      .filter(Boolean);
  const tol = flags.get('tolerances');
  if (typeof tol === 'string') {
    const [h, x] = tol.split(',').map(Number);
    if (h === undefined || x === undefined || !(h > 0) || !(x > 0))
      throw new Error(
        '--tolerances needs two positive percentages: homogeneous,heterogeneous (e.g. 2,5)',
      );
    options.tolerances = { homogeneousPercent: h, heterogeneousPercent: x };
  }
  const rx = flags.get('prescribe');
  if (typeof rx === 'string') {
    const m = /^(.+)=([^=]+)$/.exec(rx);
    const dose = m ? Number(m[2]) : NaN;
    if (!m || !(dose > 0) || !Number.isFinite(dose))
      throw new Error('--prescribe needs POINT=DOSE with the dose in cGy (e.g. P1=200)');
    options.prescription = { pointId: m[1] as string, doseCGy: dose };
  }
  const method = flags.get('check-method');
  if (typeof method === 'string') options.checkMethodId = method;
  const doseTo = flags.get('dose-to');
  if (doseTo !== undefined) {
    if (doseTo !== 'water' && doseTo !== 'medium')
      throw new Error(`--dose-to must be "water" or "medium" (found ${JSON.stringify(doseTo)})`);
    options.doseTo = doseTo;
  }
  return options;
}

export const WATER_DATA_USAGE = `  --water-data case|modelled  water data of the type-A methods: the case's own measured table
                  when it carries one, else the modelled beam ('case', the default, as on the page),
                  or always the modelled beam ('modelled')`;

/** The water source from --water-data (and a table read from --tmr/--pdd); throws on a bad value. */
export function waterSourceOf(
  flags: Map<string, string | true>,
  table: WaterSourceSpec | undefined,
): WaterSourceSpec {
  const v = flags.get('water-data');
  if (v !== undefined && v !== 'case' && v !== 'modelled')
    throw new Error(`--water-data: "${String(v)}" is not one of case, modelled`);
  if (table) {
    if (v !== undefined) throw new Error('--water-data cannot be combined with --tmr/--pdd');
    return table;
  }
  return { kind: v === 'modelled' ? 'modelled' : 'case' };
}

/** JSON output: the document of the calculation (src/compute/calcDocument). */
export function jsonOf(result: PlanReport, isPlan: boolean): unknown {
  return calcDocumentOf(result, isPlan);
}

export function textOf(result: PlanReport, isPlan: boolean): string {
  const parts: string[] = [];
  if (isPlan) parts.push(`Plan: ${result.planName || '(unnamed)'} (${result.beams.length} beams)`);
  for (const b of result.beams) {
    if (isPlan) parts.push(`\n=== Beam ${b.id}${b.label !== b.id ? ` — ${b.label}` : ''} ===`);
    parts.push(formatReport(b.report));
  }
  parts.push('');
  parts.push(formatCheck(result.check));
  // The Monte Carlo run behind any "± σ" in the check: histories, batches, seed, meaning of σ.
  const mcLines = monteCarloRecordLines(result.beams);
  if (mcLines.length > 0) parts.push('', ...mcLines);
  return parts.join('\n');
}
