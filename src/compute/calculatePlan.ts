// One calculation of a plan: every beam's case through calculateCase, then the point check
// (MU for the prescription, differences from the planning system, verdicts, sums over beams).
// Plain serialisable data; runs in a worker, on the main thread and in Node.
import { calculateCase, type CalcOptions, type CalcReport } from './calculateCase';
import { waterDataForCase } from './typeAForCase';
import { ssdCmOf } from '../engine/beam/geometry';
import { dosePerMuFactors, type DosePerMuFactors } from '../engine/check/dosePerMu';
import { isBeyondWaterData } from '../engine/beam/waterDataReach';
import {
  checkPlan,
  type CheckBeamInput,
  type PlanCheck,
  type Prescription,
} from '../engine/check/planCheck';
import { DEFAULT_TOLERANCES, type Tolerances } from '../engine/check/tolerance';
import type { LaminaPlan } from '../io/planFile';

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

/** The check's view of one calculated beam. */
export function checkInputOf(
  beam: { id: string; label: string; weight: number },
  c: LaminaPlan['beams'][number]['case'],
  report: CalcReport,
): CheckBeamInput {
  return {
    id: beam.id,
    label: beam.label,
    weight: beam.weight,
    layers: report.layers,
    points: c.points,
    methods: report.methods.map((m) => ({
      id: m.id,
      label: m.label,
      // The Monte Carlo's statistical 1σ travels with its dose per MU (deterministic methods have none).
      points: m.points.map((p) =>
        p.sigmaDosePerMuCGy === undefined
          ? { id: p.id, dosePerMuCGy: p.dosePerMuCGy }
          : { id: p.id, dosePerMuCGy: p.dosePerMuCGy, sigmaDosePerMuCGy: p.sigmaDosePerMuCGy },
      ),
    })),
  };
}

/** The water factor chain at each point of a case (empty without water data). */
export function waterChainsOf(
  c: LaminaPlan['beams'][number]['case'],
  options: CalcOptions,
): Record<string, DosePerMuFactors> {
  const wd = waterDataForCase(c, options.waterData);
  const out: Record<string, DosePerMuFactors> = {};
  if (!wd) return out;
  // No chain for a point below the table's deepest depth: its TMR would be the table's edge value.
  for (const p of c.points.filter((q) => !isBeyondWaterData(wd, q.depthCm)))
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
