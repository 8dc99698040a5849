// The check part of the command line: one case or plan file calculated with its point check
// (text or JSON), and the options shared with batch mode.
import { calculatePlan, type PlanCalcOptions, type PlanReport } from '../compute/calculatePlan';
import { DEFAULT_TOLERANCES } from '../engine/check/tolerance';
import { PLAN_FORMAT } from '../io/planSchema';
import { validatePlan, type PlanParseResult } from '../io/planFile';
import { monteCarloRecordLines } from '../io/report/monteCarloNote';
import { checkStatements, formatCheck } from './formatCheck';
import { formatReport } from './formatReport';

export interface LoadedDocument {
  isPlan: boolean;
  parsed: PlanParseResult;
}

/** Parse case-or-plan text; a case file becomes a one-beam plan. */
export function loadDocument(text: string): LoadedDocument {
  let raw: unknown;
  try {
    raw = JSON.parse(text);
  } catch (e) {
    return {
      isPlan: false,
      parsed: {
        ok: false,
        problems: [{ path: '(file)', message: `not valid JSON: ${(e as Error).message}` }],
      },
    };
  }
  const isPlan =
    typeof raw === 'object' && raw !== null && (raw as { format?: unknown }).format === PLAN_FORMAT;
  return { isPlan, parsed: validatePlan(raw) };
}

/**
 * Options from --methods, --tolerances H,X, --prescribe POINT=DOSE, --check-method ID and
 * --dose-to water|medium; throws on a malformed value.
 */
export function planOptionsOf(flags: Map<string, string | true>): PlanCalcOptions {
  const options: PlanCalcOptions = {};
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

/**
 * JSON output: a case keeps the "lamina.calc" document with a `check` section; a plan prints the
 * plan report. The check carries its verdict, deciding method and spread in words as well.
 */
export function jsonOf(result: PlanReport, isPlan: boolean): unknown {
  const check = { ...result.check, statements: checkStatements(result.check) };
  if (isPlan) return { ...result, check };
  return { ...(result.beams[0]?.report ?? {}), check };
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

export function calculateDocument(
  doc: LoadedDocument,
  options: PlanCalcOptions,
): PlanReport | null {
  if (!doc.parsed.ok) return null;
  return calculatePlan(doc.parsed.value, {
    ...options,
    tolerances: options.tolerances ?? doc.parsed.value.tolerances ?? DEFAULT_TOLERANCES,
  });
}
