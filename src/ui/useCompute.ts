// Keeps the calculation in step with the case: every edit asks the compute worker for a new
// report; only the newest answer is shown (older ones are dropped, waiting ones replaced).
import { useEffect } from 'react';
import { getComputeWorker } from '../compute/computeClient';
import { installDebugHooks } from '../compute/debugHooks';
import { onRecalcRequest } from '../state/recalc';
import { toCaseFile } from '../state/editorCase';
import { makeLatestOnly } from '../state/latestOnly';
import { setCalc, useAppStore, type AppState, type WaterSource } from '../state/store';
import type { LaminaCase } from '../io/caseSchema';
import type { ComputeApi } from '../compute/computeApi';

type CalcAnswer = ReturnType<ComputeApi['calculate']>;

interface CalcInput {
  raw: LaminaCase;
  waterSource: WaterSource;
  depthStepCm: number;
}

/** Curve resolution: full, or coarse while a boundary is being dragged (about 3× faster). */
export const DEPTH_STEP_CM = 0.05;
export const DRAG_DEPTH_STEP_CM = 0.2;

const dragging = (s: AppState) => s.history.openKey?.startsWith('drag-') ?? false;

function inputOf(s: AppState): CalcInput {
  return {
    raw: toCaseFile(s.history.present),
    waterSource: s.waterSource,
    depthStepCm: dragging(s) ? DRAG_DEPTH_STEP_CM : DEPTH_STEP_CM,
  };
}

export function useCompute(): void {
  useEffect(() => {
    const started = new Map<number, number>();
    const runner = makeLatestOnly(
      ({ raw, waterSource, depthStepCm }: CalcInput): Promise<CalcAnswer> =>
        getComputeWorker().calculate(raw, {
          waterSource: waterSource === 'modelled' ? 'modelled' : 'case',
          depthStepCm,
        }),
      (result, id, superseded) => {
        const t0 = started.get(id);
        started.delete(id);
        const elapsedMs = t0 === undefined ? null : performance.now() - t0;
        if (!result.ok) {
          const e = result.error;
          setCalc({
            status: 'error',
            error: e instanceof Error ? e.message : String(e),
            // Nothing was calculated: the header must not say "calculated in …".
            elapsedMs: null,
          });
          return;
        }
        const r = result.value;
        // A superseded result still repaints (e.g. during a drag); the newer one is on its way.
        const status = superseded ? 'running' : 'done';
        if (r.ok) setCalc({ status, report: r.report, problems: [], error: null, elapsedMs });
        else setCalc({ status: 'invalid', problems: r.problems, error: null, elapsedMs });
      },
      (id) => {
        started.set(id, performance.now());
        setCalc({ status: 'running', requestId: id });
        for (const k of started.keys()) if (k < id - 1) started.delete(k);
      },
    );
    runner.request(inputOf(useAppStore.getState()));
    const unsubscribe = useAppStore.subscribe((s, prev) => {
      // A drag that ends asks once more at full resolution.
      if (
        s.history.present !== prev.history.present ||
        s.waterSource !== prev.waterSource ||
        (dragging(prev) && !dragging(s))
      )
        runner.request(inputOf(s));
    });
    // Retry after a failed calculation (e.g. the worker was lost): the same case again.
    const stopRetry = onRecalcRequest(() => runner.request(inputOf(useAppStore.getState())));
    installDebugHooks();
    return () => {
      stopRetry();
      unsubscribe();
      runner.cancel();
    };
  }, []);
}
