// The worker side of the calculation contract (src/compute/calcRequest.ts): validates the
// document, resolves the water data and the dose convention once, fixes grid and methods by
// purpose, reuses the
// deterministic part of recent full calculations (a Monte Carlo merge or a plan then costs only
// its assembly) and answers with plain data. The page's workers, the worker API tests and the CLI
// all call these functions.
import {
  assembleReport,
  computeCaseParts,
  depthGridCm,
  monteCarloBlock,
  phantomOfCase,
  type CalcOptions,
  type CaseParts,
} from './calculateCase';
import { calculatePlan } from './calculatePlan';
import type { CalcRequest, Problem } from './calcRequest';
import {
  monteCarloCalibration,
  monteCarloRunOptions,
  type McCalibration,
} from './monteCarloCalibration';
import { monteCarloRunKey, physicsBeamOf } from './monteCarloRunKey';
import { resolveDoseTo } from './doseConvention';
import type { DoseQuantity } from '../engine/dose/doseQuantity';
import {
  PREVIEW_DEPTH_STEP_CM,
  PREVIEW_ETAR_KNOT_STEP_CM,
  PREVIEW_METHOD_IDS,
} from './previewReport';
import { resolveWater, waterKeyOf, type WaterSourceSpec } from './waterSource';
import type { McOptions } from '../engine/montecarlo/monteCarloPlan';
import { validateCase } from '../io/caseFile';
import type { LaminaCase } from '../io/caseSchema';
import { prescriptionPointProblem, validatePlan } from '../io/planFile';
import { PLAN_FORMAT } from '../io/planSchema';
import type { CalcReport, PlanReport } from '../contract/reports';

/** Curve resolution of a full calculation (cm). */
export const FULL_DEPTH_STEP_CM = 0.05;

type Failure = { ok: false; problems: Problem[] };
export type CaseAnswer = { ok: true; report: CalcReport } | Failure;
export type PlanAnswer = { ok: true; report: PlanReport; isPlan: boolean } | Failure;
export interface McSetup {
  ok: true;
  /** The key the run's result is merged under (monteCarloRunKey). */
  key: string;
  options: McOptions;
  calibration: McCalibration;
  /** Depth grid of the full report, so the run's curve lines up with the other methods. */
  depthGridCm: number[];
  /** The dose convention the run reports (part of its key). */
  doseTo: DoseQuantity;
}
export type McSetupAnswer = McSetup | Failure;

type CaseRequest = Extract<CalcRequest, { purpose: 'preview' | 'full' }>;
type PlanRequest = Extract<CalcRequest, { purpose: 'plan' }>;
type McRequest = Extract<CalcRequest, { purpose: 'monte-carlo' }>;

/** Recent deterministic parts of full calculations, by case, water data and options. */
const PARTS_ENTRIES = 12;
const partsCache = new Map<string, CaseParts>();

/**
 * What the deterministic results depend on: beam (not its planning MU), layers (not their
 * labels), point ids and depths, water data and options. The case name, notes, planning values
 * and check settings (the dose convention is applied at assembly) do not change them, so an edit
 * of those reuses the parts (assembled with the current case).
 */
function physicsKey(c: LaminaCase, water: WaterSourceSpec, options: CalcOptions): string {
  return JSON.stringify([
    waterKeyOf(c, water),
    options.methods ?? null,
    options.depthStepCm ?? null,
    options.typeA ?? null,
    physicsBeamOf(c.beam),
    c.layers.map((l) => [l.materialId, l.thicknessCm, l.densityGPerCm3 ?? null]),
    c.points.map((p) => [p.id, p.depthCm]),
  ]);
}

function cachedParts(water: WaterSourceSpec) {
  return (c: LaminaCase, options: CalcOptions): CaseParts => {
    const key = physicsKey(c, water, options);
    const hit = partsCache.get(key);
    if (hit) {
      partsCache.delete(key);
      partsCache.set(key, hit);
      return { ...hit, case: c };
    }
    const parts = computeCaseParts(c, options);
    if (partsCache.size >= PARTS_ENTRIES)
      partsCache.delete(partsCache.keys().next().value as string);
    partsCache.set(key, parts);
    return parts;
  };
}

function waterProblems(c: LaminaCase, water: WaterSourceSpec): Failure | null {
  const r = resolveWater(c, water);
  return r.ok
    ? null
    : { ok: false, problems: r.problems.map((message) => ({ path: 'waterTable', message })) };
}

/** A case: the preview (fast methods, coarse grid) or the full calculation. */
export function calculateCaseRequest(req: CaseRequest): CaseAnswer {
  const v = validateCase(req.case);
  if (!v.ok) return v;
  const c = v.value;
  const bad = waterProblems(c, req.water);
  if (bad) return bad;
  const r = resolveWater(c, req.water) as { ok: true; waterData: CalcOptions['waterData'] };
  const waterData = r.waterData ? { waterData: r.waterData } : {};
  const doseTo = resolveDoseTo(req.options?.doseTo, c.check?.doseTo);
  if (req.purpose === 'preview') {
    const parts = computeCaseParts(c, {
      ...waterData,
      depthStepCm: PREVIEW_DEPTH_STEP_CM,
      methods: PREVIEW_METHOD_IDS,
      typeA: { etarKnotStepCm: PREVIEW_ETAR_KNOT_STEP_CM },
    });
    return { ok: true, report: assembleReport(parts, null, doseTo) };
  }
  const { methods, typeA } = req.options ?? {};
  const parts = cachedParts(req.water)(c, {
    ...waterData,
    depthStepCm: FULL_DEPTH_STEP_CM,
    ...(methods ? { methods } : {}),
    ...(typeA ? { typeA } : {}),
  });
  const run = req.mcRun;
  const attached =
    run && run.key === monteCarloRunKey(c, req.water, doseTo)
      ? { run: run.run, note: run.note }
      : null;
  return {
    ok: true,
    report: assembleReport(
      parts,
      attached ?? monteCarloBlock(parts, req.options?.mc, doseTo),
      doseTo,
    ),
  };
}

/** A plan (or a case as a one-beam plan) with its point check. */
export function calculatePlanRequest(req: PlanRequest): PlanAnswer {
  const v = validatePlan(req.plan);
  if (!v.ok) return v;
  // A prescription given with the request (CLI --prescribe) obeys the plan file's own rule.
  const rx = req.options?.prescription;
  const rxProblem = rx ? prescriptionPointProblem(v.value.beams, rx.pointId) : null;
  if (rxProblem)
    return { ok: false, problems: [{ path: 'prescription.pointId', message: rxProblem }] };
  for (const b of v.value.beams) {
    const bad = waterProblems(b.case, req.water);
    if (bad) return bad;
  }
  const isPlan =
    typeof req.plan === 'object' &&
    req.plan !== null &&
    (req.plan as { format?: unknown }).format === PLAN_FORMAT;
  const report = calculatePlan(v.value, {
    ...req.options,
    water: req.water,
    depthStepCm: FULL_DEPTH_STEP_CM,
    mcRun: req.mcRun ?? null,
    partsOf: cachedParts(req.water),
  });
  return { ok: true, report, isPlan };
}

/** What the page's worker pool needs to start a Monte Carlo run of a case. */
export function prepareMonteCarlo(req: McRequest): McSetupAnswer {
  const v = validateCase(req.case);
  if (!v.ok) return v;
  const c = v.value;
  const bad = waterProblems(c, req.water);
  if (bad) return bad;
  const r = resolveWater(c, req.water) as { ok: true; waterData: CalcOptions['waterData'] };
  const calibration = monteCarloCalibration(c, r.waterData);
  const doseTo = resolveDoseTo(req.run.doseTo, c.check?.doseTo);
  return {
    ok: true,
    key: monteCarloRunKey(c, req.water, doseTo),
    options: monteCarloRunOptions(calibration, {
      histories: req.run.histories,
      seed: req.run.seed,
      doseTo,
    }),
    calibration,
    depthGridCm: depthGridCm(phantomOfCase(c).totalThicknessCm, FULL_DEPTH_STEP_CM),
    doseTo,
  };
}
