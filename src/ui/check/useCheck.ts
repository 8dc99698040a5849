// Everything the check panel shows comes from the compute worker's plan calculation (purpose
// 'plan', src/compute/calculationService): the plan built from the editor's case and the check
// settings (prescription, tolerances, deciding method, dose convention), every beam calculated
// with the page's water source, the page's Monte Carlo run merged into beam 1 while it belongs to
// it, and the point check with its deciding method (decided in the worker). The page only
// schedules and draws.
import { useEffect, useMemo } from 'react';
import { getComputeWorker } from '../../compute/computeClient';
import type { PlanAnswer } from '../../compute/calculationService';
import type { PlanReport } from '../../contract/reports';
import type { PlanCheck } from '../../engine/check/planCheck';
import { DEFAULT_DOSE_QUANTITY } from '../../engine/dose/doseQuantity';
import { isMethodId } from '../../engine/methodRegistry';
import type { LaminaCase } from '../../io/caseSchema';
import { PLAN_FORMAT, PLAN_VERSION } from '../../io/planSchema';
import type { LaminaPlan } from '../../io/planFile';
import { toCaseFile } from '../../state/editorCase';
import { makeLatestOnly } from '../../state/latestOnly';
import { useMonteCarloStore } from '../../state/monteCarloStore';
import { onRecalcRequest } from '../../state/recalc';
import { useAppStore, type WaterSource } from '../../state/store';
import { currentMcAttachment } from '../montecarlo/mcAttachment';
import { patchCheck, useCheckStore, type CheckState } from './checkStore';

export interface CheckView {
  plan: LaminaPlan;
  /** The plan as the worker calculated it (one beam per plan beam, in order). */
  result: PlanReport;
  /** Calculated beams with their cases, for the figure and the exports. */
  reports: {
    id: string;
    label: string;
    weight: number;
    case: LaminaCase;
    report: PlanReport['beams'][number]['report'];
  }[];
  /** The result belongs to an older input: a newer calculation is on its way. */
  pending: boolean;
  check: PlanCheck;
  /** Whether the document is a plan (several beams) rather than one case. */
  isPlan: boolean;
}

export function planOf(first: LaminaCase, s: CheckState): LaminaPlan {
  const plan: LaminaPlan = {
    format: PLAN_FORMAT,
    version: PLAN_VERSION,
    name: s.planName || first.name,
    beams: [
      {
        id: s.firstBeam.id,
        label: s.firstBeam.label || undefined,
        weight: s.firstBeam.weight,
        case: first,
      },
      ...s.extraBeams.map((b) => ({
        id: b.id,
        label: b.label || undefined,
        weight: b.weight,
        case: b.case,
      })),
    ],
    tolerances: { ...s.tolerances },
  };
  if (s.prescriptionDoseCGy !== null && s.prescriptionPointId)
    plan.prescription = { pointId: s.prescriptionPointId, doseCGy: s.prescriptionDoseCGy };
  if (isMethodId(s.checkMethodId)) plan.checkMethodId = s.checkMethodId;
  plan.doseTo = s.doseTo;
  return plan;
}

/** A single beam is checked as the case it is (its JSON document is "lamina.calc"). */
function documentOf(plan: LaminaPlan): unknown {
  return plan.beams.length > 1 ? plan : { ...plan.beams[0]!.case };
}

/** Problem path of a plan whose calculation was lost with the compute worker. */
export const WORKER_PROBLEM_PATH = '(calculation)';

interface PlanInput {
  key: string;
  plan: LaminaPlan;
  water: WaterSource;
}

/**
 * Keep the plan calculated in the compute worker whenever the editor's case, the check settings,
 * the water source or the page's Monte Carlo run change (latest wins). Returns the key of the
 * current input: a shown result with another key is pending.
 */
export function usePlanCalculation(): string {
  const present = useAppStore((s) => s.history.present);
  const water = useAppStore((s) => s.waterSource);
  const mcResult = useMonteCarloStore((s) => s.result);
  const mcStatus = useMonteCarloStore((s) => s.status);
  const s = useCheckStore();
  const {
    firstBeam,
    extraBeams,
    planName,
    tolerances,
    prescriptionDoseCGy,
    prescriptionPointId,
    checkMethodId,
    doseTo,
  } = s;
  const input = useMemo((): PlanInput => {
    const first = toCaseFile(present);
    const plan = planOf(first, {
      ...useCheckStore.getState(),
      firstBeam,
      extraBeams,
      planName,
      tolerances,
      prescriptionDoseCGy,
      prescriptionPointId,
      checkMethodId,
      doseTo,
    });
    return {
      key: JSON.stringify([plan, water, mcResult?.histories ?? null, mcStatus]),
      plan,
      water,
    };
  }, [
    present,
    water,
    mcResult,
    mcStatus,
    firstBeam,
    extraBeams,
    planName,
    tolerances,
    prescriptionDoseCGy,
    prescriptionPointId,
    checkMethodId,
    doseTo,
  ]);

  const runner = useMemo(
    () =>
      makeLatestOnly(
        ({ plan, water: w }: PlanInput): Promise<PlanAnswer> => {
          const first = plan.beams[0]!.case;
          const doseTo = plan.doseTo ?? DEFAULT_DOSE_QUANTITY;
          return getComputeWorker().calculatePlan({
            purpose: 'plan',
            plan: documentOf(plan),
            water: { kind: w },
            // The check settings edited on the page (a one-beam document carries none of its own).
            options: {
              ...(plan.tolerances ? { tolerances: plan.tolerances } : {}),
              ...(plan.prescription ? { prescription: plan.prescription } : {}),
              ...(plan.checkMethodId ? { checkMethodId: plan.checkMethodId } : {}),
              doseTo,
            },
            mcRun: currentMcAttachment(first, w, doseTo),
          });
        },
        (result, id) => {
          const key = keys.get(id);
          keys.delete(id);
          if (!result.ok) {
            const message =
              result.error instanceof Error ? result.error.message : String(result.error);
            patchCheck({
              planProblems: [{ path: WORKER_PROBLEM_PATH, message }],
              planKey: key ?? null,
            });
            return;
          }
          const a = result.value;
          if (a.ok) patchCheck({ planReport: a.report, planProblems: [], planKey: key ?? null });
          else patchCheck({ planProblems: a.problems, planKey: key ?? null });
        },
      ),
    [],
  );
  useEffect(() => {
    keys.set(runner.request(input), input.key);
    patchCheck({ wantedKey: input.key });
  }, [runner, input]);
  useEffect(
    () =>
      onRecalcRequest(() => {
        if (useCheckStore.getState().planProblems.some((p) => p.path === WORKER_PROBLEM_PATH)) {
          keys.set(runner.request(input), input.key);
        }
      }),
    [runner, input],
  );
  return input.key;
}
const keys = new Map<number, string>();

/**
 * The check view: the worker's last plan report with the plan it was calculated for; pending
 * from the render that changed the input (`inputKey`) until its result arrives.
 */
export function useCheckView(inputKey: string): CheckView | null {
  const present = useAppStore((s) => s.history.present);
  const s = useCheckStore();
  return useMemo(() => {
    const result = s.planReport;
    if (!result) return null;
    const plan = planOf(toCaseFile(present), s);
    const reports = result.beams.map((b, i) => ({
      id: b.id,
      label: b.label,
      weight: b.weight,
      case: plan.beams[i]?.case ?? toCaseFile(present),
      report: b.report,
    }));
    return {
      plan,
      result,
      reports,
      pending: s.planKey !== inputKey,
      check: result.check,
      isPlan: plan.beams.length > 1,
    };
  }, [present, s, inputKey]);
}
