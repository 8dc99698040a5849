// One calculation of a plan: every beam's case through calculateCase, then the point check
// (MU for the prescription, differences from the planning system, verdicts, sums over beams).
// Plain serialisable data; runs in a worker, on the main thread and in Node.
import { calculateCase, type CalcOptions, type CalcReport } from './calculateCase';
import { waterDataForCase } from './typeAForCase';
import { ssdCmOf } from '../engine/beam/geometry';
import { dosePerMuFactors, type DosePerMuFactors } from '../engine/check/dosePerMu';
import { checkPlan, type PlanCheck, type Prescription } from '../engine/check/planCheck';
import { DEFAULT_TOLERANCES, type Tolerances } from '../engine/check/tolerance';
import type { LaminaPlan } from '../io/planFile';
import { checkInputOf } from './checkInput';

export { checkInputOf };

export interface PlanCalcOptions extends CalcOptions {
  /** Overrides the plan's tolerances (e.g. edited on the page). */
  tolerances?: Tolerances;
  /** Overrides the plan's decisive method. */
  checkMethodId?: string;
  /** Overrides the plan's prescription (total dose at a point, all beams). */
  prescription?: Prescription;
}

export interface PlanBeamReport {
  id: string;
  label: string;
  weight: number;
  report: CalcReport;
  /** Water dose-per-MU factor chain (CF = 1) at each point, when the beam has water data. */
  waterChains: Record<string, DosePerMuFactors>;
}

export interface PlanReport {
  format: 'lamina.plancalc';
  version: 1;
  planName: string;
  beams: PlanBeamReport[];
  check: PlanCheck;
}

/** The water factor chain at each point of a case (empty without water data). */
export function waterChainsOf(
  c: LaminaPlan['beams'][number]['case'],
  options: CalcOptions,
): Record<string, DosePerMuFactors> {
  const wd = waterDataForCase(c, options.waterData);
  const out: Record<string, DosePerMuFactors> = {};
  if (!wd) return out;
  for (const p of c.points)
    out[p.id] = dosePerMuFactors({
      waterData: wd,
      ssdCm: ssdCmOf(c.beam.setup),
      depthCm: p.depthCm,
      fieldXCm: c.beam.fieldXCm,
      fieldYCm: c.beam.fieldYCm,
      cf: 1,
    });
  return out;
}

export function calculatePlan(plan: LaminaPlan, options: PlanCalcOptions = {}): PlanReport {
  const { tolerances, checkMethodId, prescription, ...calcOptions } = options;
  const beams = plan.beams.map((b) => ({
    id: b.id,
    label: b.label || b.case.name || b.id,
    weight: b.weight,
    report: calculateCase(b.case, calcOptions),
    waterChains: waterChainsOf(b.case, calcOptions),
  }));
  const check = checkPlan(
    beams.map((b, i) =>
      checkInputOf(b, (plan.beams[i] as LaminaPlan['beams'][number]).case, b.report),
    ),
    {
      tolerances: tolerances ?? plan.tolerances ?? DEFAULT_TOLERANCES,
      prescription: prescription ?? plan.prescription,
      decisiveMethodId: checkMethodId ?? plan.checkMethodId,
    },
  );
  return { format: 'lamina.plancalc', version: 1, planName: plan.name, beams, check };
}
