// Everything the check panel shows, derived from the editor's case and its latest calculation
// plus the check inputs: the plan, the point check, and (on demand) the printable record.
import { useEffect, useMemo } from 'react';
import type { CalcReport } from '../../compute/calculateCase';
import { checkInputOf, waterChainsOf, type PlanReport } from '../../compute/calculatePlan';
import { getComputeWorker } from '../../compute/computeClient';
import { modelledWaterData } from '../../engine/beam/modelledBeam';
import { checkPlan, type PlanCheck } from '../../engine/check/planCheck';
import type { LaminaCase } from '../../io/caseSchema';
import { PLAN_FORMAT, PLAN_VERSION } from '../../io/planSchema';
import type { LaminaPlan } from '../../io/planFile';
import { toCaseFile } from '../../state/editorCase';
import { useShownReport } from '../montecarlo/useShownReport';
import { onRecalcRequest } from '../../state/recalc';
import { useAppStore } from '../../state/store';
import { patchExtraBeam, useCheckStore, type CheckState } from './checkStore';

export interface CheckView {
  plan: LaminaPlan;
  /** Calculated beams (beams still calculating are left out). */
  reports: { id: string; label: string; weight: number; case: LaminaCase; report: CalcReport }[];
  pending: string[];
  check: PlanCheck;
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
  if (s.checkMethodId) plan.checkMethodId = s.checkMethodId;
  plan.doseTo = useAppStore.getState().doseTo;
  return plan;
}

/**
 * Keep every extra beam calculated (in the compute worker) whenever its case or the page's
 * water-data choice changes, so all beams read the same kind of water data.
 */
export function useExtraBeamCalculations(): void {
  const extra = useCheckStore((s) => s.extraBeams);
  const source = useAppStore((s) => s.waterSource);
  const doseTo = useAppStore((s) => s.doseTo);
  useEffect(() => {
    const key = `${source}|${doseTo}`;
    const current = () => {
      const a = useAppStore.getState();
      return `${a.waterSource}|${a.doseTo}` === key;
    };
    for (const b of extra) {
      if ((b.report && b.reportSource === key) || b.problems.length > 0) continue;
      const target = b.case;
      void getComputeWorker()
        .calculate(target, { waterSource: source === 'modelled' ? 'modelled' : 'case', doseTo })
        .then((r) => {
          const now = useCheckStore.getState().extraBeams.find((x) => x.key === b.key);
          if (!now || now.case !== target || !current()) return;
          if (r.ok) patchExtraBeam(b.key, { report: r.report, reportSource: key, problems: [] });
          else patchExtraBeam(b.key, { problems: r.problems });
        })
        // The worker was lost (it is replaced on the next call): say so; Retry calculates again.
        .catch((e: unknown) => {
          const message = e instanceof Error ? e.message : String(e);
          patchExtraBeam(b.key, { problems: [{ path: WORKER_PROBLEM_PATH, message }] });
        });
    }
  }, [extra, source, doseTo]);
  useEffect(
    () =>
      onRecalcRequest(() => {
        for (const b of useCheckStore.getState().extraBeams)
          if (b.problems.some((p) => p.path === WORKER_PROBLEM_PATH))
            patchExtraBeam(b.key, { problems: [] });
      }),
    [],
  );
}

/** Problem path of a beam whose calculation was lost with the compute worker. */
export const WORKER_PROBLEM_PATH = '(calculation)';

/**
 * The check of the plan whose first beam is the case being edited. The first beam's report is the
 * drawn one: the latest calculation plus the page's Monte Carlo run (with its 1σ) while that run
 * belongs to the case as it is now — a run left stale by an edit is not checked.
 */
export function useCheckView(): CheckView | null {
  const present = useAppStore((s) => s.history.present);
  const report = useShownReport();
  const s = useCheckStore();
  const doseTo = useAppStore((a) => a.doseTo);
  return useMemo(() => {
    if (!report) return null;
    const first = toCaseFile(present);
    const plan = planOf(first, s);
    const reports: CheckView['reports'] = [];
    const pending: string[] = [];
    plan.beams.forEach((b, i) => {
      const r = i === 0 ? report : (s.extraBeams[i - 1]?.report ?? null);
      if (r)
        reports.push({
          id: b.id,
          label: b.label ?? b.case.name,
          weight: b.weight,
          case: b.case,
          report: r,
        });
      else pending.push(b.id);
    });
    const check = checkPlan(
      reports.map((b) => checkInputOf(b, b.case, b.report)),
      {
        tolerances: s.tolerances,
        prescription: plan.prescription,
        decisiveMethodId: s.checkMethodId || undefined,
        doseTo,
      },
    );
    return { plan: { ...plan, doseTo }, reports, pending, check };
  }, [present, report, s, doseTo]);
}

/**
 * The plan report the record is built from. The water factor chains are computed here from the
 * same water data the page's calculation used (the modelled beam, or the case's table).
 */
export function planReportOf(view: CheckView): PlanReport {
  const modelled = useAppStore.getState().waterSource === 'modelled';
  return {
    format: 'lamina.plancalc',
    version: 1,
    planName: view.plan.name,
    beams: view.reports.map((b) => ({
      id: b.id,
      label: b.label,
      weight: b.weight,
      report: b.report,
      waterChains: waterChainsOf(
        b.case,
        modelled ? { waterData: modelledWaterData(b.case.beam.energy) } : {},
      ),
    })),
    check: view.check,
  };
}
