// Everything the check panel shows, derived from the editor's case and its latest calculation
// plus the check inputs: the plan, the point check, and (on demand) the printable record.
import { useEffect, useMemo, useState } from 'react';
import type { CalcReport } from '../../compute/calculateCase';
import type { PlanReport } from '../../compute/calculatePlan';
import { checkInputOf } from '../../compute/checkInput';
import { getComputeWorker } from '../../compute/computeClient';
import type { DosePerMuFactors } from '../../engine/check/dosePerMu';
import { checkPlan, type PlanCheck } from '../../engine/check/planCheck';
import type { LaminaCase } from '../../io/caseSchema';
import { PLAN_FORMAT, PLAN_VERSION } from '../../io/planSchema';
import type { LaminaPlan } from '../../io/planFile';
import { toCaseFile } from '../../state/editorCase';
import { useShownReport } from '../montecarlo/useShownReport';
import { onRecalcRequest } from '../../state/recalc';
import { useAppStore, type WaterSource } from '../../state/store';
import { patchExtraBeam, useCheckStore, type CheckState } from './checkStore';

export interface CheckView {
  plan: LaminaPlan;
  /** Calculated beams (beams still calculating are left out). */
  reports: { id: string; label: string; weight: number; case: LaminaCase; report: CalcReport }[];
  pending: string[];
  check: PlanCheck;
  /**
   * Water factor chains per beam and point for the record, from the compute worker; null while
   * they are being asked for (after an edit).
   */
  waterChains: WaterChains | null;
}

/** Water dose-per-MU factor chains per beam id and point id. */
export type WaterChains = Record<string, Record<string, DosePerMuFactors>>;

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
  return plan;
}

/**
 * Keep every extra beam calculated (in the compute worker) whenever its case or the page's
 * water-data choice changes, so all beams read the same kind of water data.
 */
export function useExtraBeamCalculations(): void {
  const extra = useCheckStore((s) => s.extraBeams);
  const source = useAppStore((s) => s.waterSource);
  useEffect(() => {
    for (const b of extra) {
      if ((b.report && b.reportSource === source) || b.problems.length > 0) continue;
      const target = b.case;
      void getComputeWorker()
        .calculate(target, { waterSource: source === 'modelled' ? 'modelled' : 'case' })
        .then((r) => {
          const now = useCheckStore.getState().extraBeams.find((x) => x.key === b.key);
          if (!now || now.case !== target || useAppStore.getState().waterSource !== source) return;
          if (r.ok) patchExtraBeam(b.key, { report: r.report, reportSource: source, problems: [] });
          else patchExtraBeam(b.key, { problems: r.problems });
        })
        // The worker was lost (it is replaced on the next call): say so; Retry calculates again.
        .catch((e: unknown) => {
          const message = e instanceof Error ? e.message : String(e);
          patchExtraBeam(b.key, { problems: [{ path: WORKER_PROBLEM_PATH, message }] });
        });
    }
  }, [extra, source]);
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
 * The water factor chains of every beam of a plan, from the compute worker (the water data lives
 * there): the modelled beam when the page uses it, else each case's own table (none without one).
 */
export async function waterChainsOfPlan(
  plan: LaminaPlan,
  waterSource: WaterSource,
): Promise<WaterChains> {
  const worker = getComputeWorker();
  const source = waterSource === 'modelled' ? 'modelled' : 'case';
  const answers = await Promise.all(
    plan.beams.map((b) => worker.waterChains(b.case, { waterSource: source })),
  );
  return Object.fromEntries(
    plan.beams.map((b, i) => [b.id, answers[i]?.ok ? answers[i].chains : {}]),
  );
}

/** The chains of the plan's beams, asked again only when a beam's case or the water source changes. */
function useWaterChains(plan: LaminaPlan | null): WaterChains | null {
  const source = useAppStore((s) => s.waterSource);
  const key = useMemo(
    () => (plan ? JSON.stringify([source, plan.beams.map((b) => [b.id, b.case])]) : null),
    [plan, source],
  );
  const [got, setGot] = useState<{ key: string; chains: WaterChains } | null>(null);
  useEffect(() => {
    if (!plan || key === null) return;
    let live = true;
    waterChainsOfPlan(plan, source).then(
      (chains) => {
        if (live) setGot({ key, chains });
      },
      // The worker was lost: the record goes without chains until the next change (Retry).
      () => undefined,
    );
    return () => {
      live = false;
    };
    // eslint-disable-next-line react-hooks/exhaustive-deps -- the key stands for plan and source
  }, [key]);
  return got !== null && got.key === key ? got.chains : null;
}

/**
 * The check of the plan whose first beam is the case being edited. The first beam's report is the
 * drawn one: the latest calculation plus the page's Monte Carlo run (with its 1σ) while that run
 * belongs to the case as it is now — a run left stale by an edit is not checked.
 */
export function useCheckView(): CheckView | null {
  const present = useAppStore((s) => s.history.present);
  const report = useShownReport();
  const s = useCheckStore();
  const view = useMemo(() => {
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
      },
    );
    return { plan, reports, pending, check };
  }, [present, report, s]);
  const waterChains = useWaterChains(view?.plan ?? null);
  return useMemo(() => (view ? { ...view, waterChains } : null), [view, waterChains]);
}

/**
 * The plan report the record is built from, with the water factor chains given (by default the
 * view's, from the same water data the page's calculation used).
 */
export function planReportOf(view: CheckView, chains = view.waterChains): PlanReport {
  return {
    format: 'lamina.plancalc',
    version: 1,
    planName: view.plan.name,
    beams: view.reports.map((b) => ({
      id: b.id,
      label: b.label,
      weight: b.weight,
      report: b.report,
      waterChains: chains?.[b.id] ?? {},
    })),
    check: view.check,
  };
}
