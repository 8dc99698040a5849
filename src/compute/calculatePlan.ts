// One calculation of a plan: every beam's case through the case calculation, then the point check
// (MU for the prescription, differences from the planning system, verdicts, sums over beams).
// Plain serialisable data; runs in a worker, on the main thread and in Node. A Monte Carlo run of
// the page (McRunAttachment) is merged into the first beam here, when it belongs to that beam.
import {
  assembleReport,
  computeCaseParts,
  monteCarloBlock,
  type CalcOptions,
  type CaseParts,
} from './calculateCase';
import { ssdCmOf } from '../engine/beam/geometry';
import type { WaterData } from '../engine/beam/waterData';
import { dosePerMuFactors, type DosePerMuFactors } from '../engine/check/dosePerMu';
import { isBeyondWaterData } from '../engine/beam/waterDataReach';
import { checkPlan } from '../engine/check/planCheck';
import { DEFAULT_TOLERANCES } from '../engine/check/tolerance';
import type { LaminaPlan } from '../io/planFile';
import type { LaminaCase } from '../io/caseSchema';
import { PLAN_CALC_FORMAT, type PlanBeamReport, type PlanReport } from '../contract/reports';
import type { CaseCalcOptions, McRunAttachment, PlanCalcOverrides } from './calcRequest';
import { CASE_WATER, resolveWater, type WaterSourceSpec } from './waterSource';
import { monteCarloRunKey } from './monteCarloRunKey';
import { resolveDoseTo } from './doseConvention';
import { checkInputOf } from './checkInput';

export { checkInputOf };

export type { PlanBeamReport, PlanReport };

export interface PlanCalcOptions extends CaseCalcOptions, PlanCalcOverrides {
  /** Water data of every beam (default: each beam's own source). */
  water?: WaterSourceSpec;
  /** Depth step of the curves (cm). */
  depthStepCm?: number;
  /** The page's Monte Carlo run, merged into the first beam when it belongs to it. */
  mcRun?: McRunAttachment | null;
  /** How a beam's deterministic part is computed (the worker passes a cached one). */
  partsOf?: (c: LaminaCase, options: CalcOptions) => CaseParts;
}

/** The water factor chain at each point of a case (empty without water data). */
export function waterChainsOf(
  c: LaminaCase,
  waterData: WaterData | undefined,
): Record<string, DosePerMuFactors> {
  const out: Record<string, DosePerMuFactors> = {};
  if (!waterData) return out;
  // No chain for a point below the table's deepest depth: its TMR would be the table's edge value.
  for (const p of c.points.filter((q) => !isBeyondWaterData(waterData, q.depthCm)))
    out[p.id] = dosePerMuFactors({
      waterData,
      ssdCm: ssdCmOf(c.beam.setup),
      depthCm: p.depthCm,
      fieldXCm: c.beam.fieldXCm,
      fieldYCm: c.beam.fieldYCm,
      cf: 1,
    });
  return out;
}

export function calculatePlan(plan: LaminaPlan, options: PlanCalcOptions = {}): PlanReport {
  const { tolerances, checkMethodId, prescription, water = CASE_WATER, mcRun } = options;
  const partsOf = options.partsOf ?? computeCaseParts;
  // One dose convention for every beam: the caller's (--dose-to, the page), else the plan's, else water.
  const doseTo = resolveDoseTo(options.doseTo, plan.doseTo);
  const beams: PlanBeamReport[] = plan.beams.map((b, i) => {
    const resolved = resolveWater(b.case, water);
    if (!resolved.ok) throw new Error(`water data: ${resolved.problems.join('; ')}`);
    const parts = partsOf(b.case, {
      ...(options.methods ? { methods: options.methods } : {}),
      ...(options.depthStepCm !== undefined ? { depthStepCm: options.depthStepCm } : {}),
      ...(options.typeA ? { typeA: options.typeA } : {}),
      ...(resolved.waterData ? { waterData: resolved.waterData } : {}),
    });
    const attached =
      i === 0 && mcRun && mcRun.key === monteCarloRunKey(b.case, water, doseTo)
        ? { run: mcRun.run, note: mcRun.note }
        : null;
    return {
      id: b.id,
      label: b.label || b.case.name || b.id,
      weight: b.weight,
      report: assembleReport(parts, attached ?? monteCarloBlock(parts, options.mc, doseTo), doseTo),
      waterChains: waterChainsOf(b.case, parts.waterData),
    };
  });
  const check = checkPlan(
    beams.map((b, i) =>
      checkInputOf(b, (plan.beams[i] as LaminaPlan['beams'][number]).case, b.report),
    ),
    {
      tolerances: tolerances ?? plan.tolerances ?? DEFAULT_TOLERANCES,
      prescription: prescription ?? plan.prescription,
      decisiveMethodId: checkMethodId ?? plan.checkMethodId,
      doseTo,
    },
  );
  return { format: PLAN_CALC_FORMAT, version: 1, planName: plan.name, beams, check };
}
