// Keeps the calculation in step with the case. Every edit asks the preview worker for the fast
// methods (ETAR with interpolated kernel weights) on a coarse grid (drawn at once, the slower methods carried over from the last full
// result and marked as updating) and the compute worker for the full report; while a boundary is
// being dragged only previews are asked for, and the full report once the drag ends. Both queues
// are latest-wins: older answers are dropped and waiting requests replaced, never queued.
import { useEffect } from 'react';
import { getComputeWorker, getPreviewWorker } from '../compute/computeClient';
import { installDebugHooks } from '../compute/debugHooks';
import { onRecalcRequest } from '../state/recalc';
import { toCaseFile } from '../state/editorCase';
import { makeLatestOnly } from '../state/latestOnly';
import { makeShowGate } from '../state/showGate';
import { setCalc, useAppStore, type AppState, type WaterSource } from '../state/store';
import type { LaminaCase } from '../io/caseSchema';
import type { ComputeApi } from '../compute/computeApi';
import type { CalcReport } from '../compute/calculateCase';
import {
  mergePreviewReport,
  PREVIEW_DEPTH_STEP_CM,
  PREVIEW_ETAR_KNOT_STEP_CM,
  PREVIEW_METHOD_IDS,
} from '../compute/previewReport';

type CalcAnswer = Awaited<ReturnType<ComputeApi['calculate']>>;

interface CalcInput {
  /** Edit sequence number: a newer edit's answer always replaces an older one on screen. */
  seq: number;
  raw: LaminaCase;
  waterSource: WaterSource;
  depthStepCm: number;
  methods?: readonly string[];
  /** Preview only: ETAR kernel weights exact at knots this far apart, interpolated between. */
  etarKnotStepCm?: number;
}

type Tagged =
  { seq: number; ok: true; answer: CalcAnswer } | { seq: number; ok: false; error: unknown };

/** Curve resolution of the full calculation. */
export const DEPTH_STEP_CM = 0.05;

const dragging = (s: AppState) => s.history.openKey?.startsWith('drag-') ?? false;

function calcIn(
  worker: () => ReturnType<typeof getComputeWorker>,
): (input: CalcInput) => Promise<Tagged> {
  return ({ seq, raw, waterSource, depthStepCm, methods, etarKnotStepCm }) =>
    worker()
      .calculate(raw, {
        waterSource: waterSource === 'modelled' ? 'modelled' : 'case',
        depthStepCm,
        ...(methods ? { methods: [...methods] } : {}),
        ...(etarKnotStepCm !== undefined ? { typeA: { etarKnotStepCm } } : {}),
      })
      .then(
        (answer): Tagged => ({ seq, ok: true, answer }),
        (error: unknown): Tagged => ({ seq, ok: false, error }),
      );
}

export function useCompute(): void {
  useEffect(() => {
    const started = new Map<number, number>();
    let seq = 0;
    const gate = makeShowGate();
    let lastFull: CalcReport | null = null;

    const full = makeLatestOnly(
      calcIn(getComputeWorker),
      (result, id, superseded) => {
        const t0 = started.get(id);
        started.delete(id);
        const elapsedMs = t0 === undefined ? null : performance.now() - t0;
        // calcIn never rejects: failures arrive tagged.
        const t = result.ok ? result.value : null;
        if (!t) return;
        if (t.ok && t.answer.ok) lastFull = t.answer.report;
        // A preview of a newer edit is already on screen: keep it (its full report is coming).
        if (!gate.full(t.seq)) return;
        if (!t.ok) {
          const e = t.error;
          setCalc({
            status: 'error',
            error: e instanceof Error ? e.message : String(e),
            // Nothing was calculated: the header must not say "calculated in …".
            elapsedMs: null,
            updatingMethodIds: [],
          });
          return;
        }
        const r = t.answer;
        // A superseded result still repaints; the newer one is on its way.
        const status = superseded ? 'running' : 'done';
        if (r.ok)
          setCalc({
            status,
            report: r.report,
            problems: [],
            error: null,
            elapsedMs,
            updatingMethodIds: [],
          });
        else
          setCalc({
            status: 'invalid',
            problems: r.problems,
            error: null,
            elapsedMs,
            updatingMethodIds: [],
          });
      },
      (id) => {
        started.set(id, performance.now());
        setCalc({ status: 'running', requestId: id });
        for (const k of started.keys()) if (k < id - 1) started.delete(k);
      },
    );

    const preview = makeLatestOnly(calcIn(getPreviewWorker), (result) => {
      // Failures and invalid cases are reported by the full calculation.
      const t = result.ok ? result.value : null;
      // Before the first full report there is nothing to carry over: wait for it instead of
      // showing a partial method set.
      if (!t || !t.ok || !t.answer.ok || !lastFull || !gate.preview(t.seq)) return;
      const merged = mergePreviewReport(t.answer.report, lastFull);
      setCalc({
        status: 'running',
        report: merged.report,
        problems: [],
        error: null,
        updatingMethodIds: merged.updatingIds,
      });
    });

    const ask = (s: AppState, wants: { full: boolean; preview: boolean }) => {
      seq += 1;
      const base = { seq, raw: toCaseFile(s.history.present), waterSource: s.waterSource };
      if (wants.preview)
        preview.request({
          ...base,
          depthStepCm: PREVIEW_DEPTH_STEP_CM,
          methods: PREVIEW_METHOD_IDS,
          etarKnotStepCm: PREVIEW_ETAR_KNOT_STEP_CM,
        });
      if (wants.full) full.request({ ...base, depthStepCm: DEPTH_STEP_CM });
    };

    ask(useAppStore.getState(), { full: true, preview: false });
    const unsubscribe = useAppStore.subscribe((s, prev) => {
      if (s.history.present !== prev.history.present || s.waterSource !== prev.waterSource)
        ask(s, { full: !dragging(s), preview: true });
      // A drag that ends asks for the full calculation.
      else if (dragging(prev) && !dragging(s)) ask(s, { full: true, preview: false });
    });
    // Retry after a failed calculation (e.g. the worker was lost): the same case again.
    const stopRetry = onRecalcRequest(() =>
      ask(useAppStore.getState(), { full: true, preview: false }),
    );
    installDebugHooks();
    return () => {
      stopRetry();
      unsubscribe();
      full.cancel();
      preview.cancel();
    };
  }, []);
}
