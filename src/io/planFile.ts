// Reading and writing plan files. A plan's beams embed whole case documents, each validated (and
// migrated) by the case rules, so a problem is reported with its full path, e.g.
// "beams[1].case.layers[0].thicknessCm". A single-beam case file opens as a one-beam plan.
import { formatPath, validateCase, type CaseProblem } from './caseFile';
import { CASE_FORMAT, type LaminaCase } from './caseSchema';
import type { CaseCheckSettings } from './checkSettingsSchema';
import type { DoseQuantity } from '../engine/dose/doseQuantity';
import type { MethodId } from '../engine/methodRegistry';
import { issueText } from './issueText';
import {
  PLAN_FORMAT,
  PLAN_VERSION,
  planShellSchema,
  type PlanPrescription,
  type PlanTolerances,
} from './planSchema';

export interface PlanBeam {
  id: string;
  label?: string | undefined;
  weight: number;
  case: LaminaCase;
}

export interface LaminaPlan {
  format: typeof PLAN_FORMAT;
  version: typeof PLAN_VERSION;
  name: string;
  notes?: string | undefined;
  beams: PlanBeam[];
  prescription?: PlanPrescription | undefined;
  tolerances?: PlanTolerances | undefined;
  checkMethodId?: MethodId | undefined;
  doseTo?: DoseQuantity | undefined;
}

export type PlanParseResult =
  { ok: true; value: LaminaPlan } | { ok: false; problems: CaseProblem[] };

/** The plan-level check settings of a plan (absent fields left out). */
export function checkSettingsOfPlan(p: LaminaPlan): CaseCheckSettings {
  const s: CaseCheckSettings = {};
  if (p.prescription) s.prescription = { ...p.prescription };
  if (p.tolerances) s.tolerances = { ...p.tolerances };
  if (p.checkMethodId) s.checkMethodId = p.checkMethodId;
  if (p.doseTo) s.doseTo = p.doseTo;
  return s;
}

/**
 * A one-beam plan around a single-beam case (weight 1): the case's `check` block becomes the
 * plan's prescription, tolerances, deciding method and dose convention; the beam's case keeps
 * no check block of its own (the plan's settings are the only ones read).
 */
export function planOfCase(c: LaminaCase): LaminaPlan {
  const { check, ...beamCase } = c;
  return {
    format: PLAN_FORMAT,
    version: PLAN_VERSION,
    name: c.name,
    beams: [{ id: 'beam-1', weight: 1, case: beamCase }],
    ...(check?.prescription ? { prescription: { ...check.prescription } } : {}),
    ...(check?.tolerances ? { tolerances: { ...check.tolerances } } : {}),
    ...(check?.checkMethodId ? { checkMethodId: check.checkMethodId } : {}),
    ...(check?.doseTo ? { doseTo: check.doseTo } : {}),
  };
}

/** A case with these check settings (the `check` block left out when there are none). */
export function caseWithCheckSettings(c: LaminaCase, s: CaseCheckSettings): LaminaCase {
  const rest = { ...c };
  delete rest.check;
  return Object.keys(s).length > 0 ? { ...rest, check: s } : rest;
}

/** The rule for a prescription point: some beam must have it (null when one does). */
export function prescriptionPointProblem(
  beams: readonly { case: { points: readonly { id: string }[] } }[],
  pointId: string,
): string | null {
  return beams.some((b) => b.case.points.some((p) => p.id === pointId))
    ? null
    : `no beam has a point "${pointId}"`;
}

function validatePlanDocument(raw: unknown): PlanParseResult {
  const shell = planShellSchema.safeParse(raw, { error: issueText });
  if (!shell.success)
    return {
      ok: false,
      problems: shell.error.issues.map((i) => ({ path: formatPath(i.path), message: i.message })),
    };
  const problems: CaseProblem[] = [];
  const beams: PlanBeam[] = [];
  shell.data.beams.forEach((b, i) => {
    const c = validateCase(b.case);
    if (!c.ok) {
      for (const p of c.problems)
        problems.push({
          path: `beams[${i}].case${p.path === '(file)' ? '' : p.path.startsWith('[') ? p.path : `.${p.path}`}`,
          message: p.message,
        });
    } else beams.push({ ...b, case: c.value });
  });
  const rx = shell.data.prescription;
  const rxProblem =
    rx && problems.length === 0 ? prescriptionPointProblem(beams, rx.pointId) : null;
  if (rxProblem) problems.push({ path: 'prescription.pointId', message: rxProblem });
  if (problems.length > 0) return { ok: false, problems };
  return { ok: true, value: { ...shell.data, version: PLAN_VERSION, beams } };
}

/**
 * Validate a parsed JSON document as a plan: a "lamina.plan" document, or a "lamina.case"
 * document (any readable version), which becomes a one-beam plan.
 */
export function validatePlan(raw: unknown): PlanParseResult {
  if (
    typeof raw === 'object' &&
    raw !== null &&
    (raw as { format?: unknown }).format === CASE_FORMAT
  ) {
    const c = validateCase(raw);
    return c.ok ? { ok: true, value: planOfCase(c.value) } : c;
  }
  return validatePlanDocument(raw);
}

export function parsePlanText(text: string): PlanParseResult {
  let raw: unknown;
  try {
    raw = JSON.parse(text);
  } catch (e) {
    return {
      ok: false,
      problems: [{ path: '(file)', message: `not valid JSON: ${(e as Error).message}` }],
    };
  }
  return validatePlan(raw);
}

export function serializePlan(p: LaminaPlan): string {
  return `${JSON.stringify({ ...p, format: PLAN_FORMAT, version: PLAN_VERSION }, null, 2)}\n`;
}

/**
 * True when a plan is one beam that a case file can hold whole (save it as a case, the settings
 * in its `check` block): weight 1, no label of its own.
 */
export function isPlainCase(p: LaminaPlan): boolean {
  const b = p.beams[0];
  return p.beams.length === 1 && b !== undefined && b.weight === 1 && !b.label;
}

/** The case file of a one-beam plan: its case with the plan's settings in the `check` block. */
export function caseOfPlainPlan(p: LaminaPlan): LaminaCase | null {
  const b = p.beams[0];
  if (!b || p.beams.length !== 1) return null;
  return caseWithCheckSettings(b.case, checkSettingsOfPlan(p));
}
