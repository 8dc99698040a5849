// Keeps the calculation in step with the case. Every edit asks the preview worker for the fast
// methods (ETAR with interpolated kernel weights) on a coarse grid (drawn at once, the slower
// methods carried over from the last full result and marked as updating) and the compute worker
// for the full report; while a boundary is being dragged only previews are asked for, and the full
// report once the drag ends. Both queues are latest-wins: older answers are dropped and waiting
// requests replaced, never queued. While a boundary is held (pointer down or keyboard focus) the
// preview worker also prepares the previews of its nearby snapped positions; an edit that lands on
// one is drawn from that in the same frame as the input.
import { useEffect } from 'react';
import { getComputeWorker, getPreviewWorker } from '../compute/computeClient';
import { installDebugHooks } from '../compute/debugHooks';
import { onRecalcRequest } from '../state/recalc';
import { boundariesCm, toCaseFile } from '../state/editorCase';
import { makeLatestOnly } from '../state/latestOnly';
import { makeShowGate } from '../state/showGate';
import { setCalc, useAppStore, type AppState, type WaterSource } from '../state/store';
import {
  boundaryCandidates,
  makeRecentCache,
  onSpeculationRequest,
  SPECULATION_RADIUS_CM,
  speculationStats,
} from '../state/speculation';
import type { LaminaCase } from '../io/caseSchema';
import type { ComputeApi } from '../compute/computeApi';
import type { CalcReport } from '../compute/calculateCase';
import type { DoseQuantity } from '../engine/dose/doseQuantity';
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
  doseTo: DoseQuantity;
  depthStepCm: number;
  methods?: readonly string[];
  /** Preview only: ETAR kernel weights exact at knots this far apart, interpolated between. */
  etarKnotStepCm?: number;
}

type Tagged =
  { seq: number; ok: true; answer: CalcAnswer } | { seq: number; ok: false; error: unknown };

/** Curve resolution of the full calculation. */
export const DEPTH_STEP_CM = 0.05;

/** A boundary is being moved: dragged with the pointer, or nudged with a key held down. */
const dragging = (s: AppState) =>
  (s.history.openKey?.startsWith('drag-') || s.history.openKey?.startsWith('nudge-')) ?? false;
const nudging = (s: AppState) => s.history.openKey?.startsWith('nudge-') ?? false;

/**
 * After a key nudge the full calculation waits this long for another nudge (ms): a run of
 * presses shows quick previews and ends with one full calculation, instead of a full calculation
 * per press landing in the middle of the next one.
 */
const NUDGE_SETTLE_MS = 250;

/** Options of every preview calculation (the live ones and the prepared ones alike). */
const PREVIEW_OPTIONS = {
  depthStepCm: PREVIEW_DEPTH_STEP_CM,
  methods: PREVIEW_METHOD_IDS,
  etarKnotStepCm: PREVIEW_ETAR_KNOT_STEP_CM,
} as const;

/**
 * Previews kept for instant reuse: about 40 kB of JSON each on the chest preset, so 120 entries
 * (three sweeps of a held boundary) stay under about 10 MB.
 */
const PREVIEW_CACHE_ENTRIES = 120;

/** The exact input a preview was computed for: the case file and the water data chosen. */
function previewKey(raw: LaminaCase, waterSource: WaterSource, doseTo: DoseQuantity): string {
  return `${waterSource}|${doseTo}|${JSON.stringify(raw)}`;
}

/** The worker's calculate options for an input. */
function optionsOf({
  waterSource,
  doseTo,
  depthStepCm,
  methods,
  etarKnotStepCm,
}: Omit<CalcInput, 'seq' | 'raw'>) {
  return {
    waterSource: waterSource === 'modelled' ? ('modelled' as const) : ('case' as const),
    doseTo,
    depthStepCm,
    ...(methods ? { methods: [...methods] } : {}),
    ...(etarKnotStepCm !== undefined ? { typeA: { etarKnotStepCm } } : {}),
  };
}

function calcIn(
  worker: () => ReturnType<typeof getComputeWorker>,
): (input: CalcInput) => Promise<Tagged> {
  return ({ seq, raw, ...rest }) =>
    worker()
      .calculate(raw, optionsOf(rest))
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

    const cache = makeRecentCache<CalcReport>(PREVIEW_CACHE_ENTRIES);
    const keys = new Map<number, string>();

    const showPreview = (report: CalcReport, full: CalcReport) => {
      const merged = mergePreviewReport(report, full);
      setCalc({
        status: 'running',
        report: merged.report,
        problems: [],
        error: null,
        updatingMethodIds: merged.updatingIds,
      });
    };

    const preview = makeLatestOnly(calcIn(getPreviewWorker), (result) => {
      // Failures and invalid cases are reported by the full calculation.
      const t = result.ok ? result.value : null;
      if (!t || !t.ok || !t.answer.ok) return;
      const key = keys.get(t.seq);
      keys.delete(t.seq);
      if (key !== undefined) cache.set(key, t.answer.report);
      // Before the first full report there is nothing to carry over: wait for it instead of
      // showing a partial method set.
      if (!lastFull || !gate.preview(t.seq)) return;
      showPreview(t.answer.report, lastFull);
    });

    // Preparing the previews of a held boundary: one at a time through the preview worker, nearest
    // position first; a newer request (another boundary, or the same one re-centred) ends the
    // older sweep.
    let sweep = 0;
    let sweepAround: { k: number; depthCm: number } | null = null;
    const speculate = async (k: number | null) => {
      const id = ++sweep;
      if (k === null) {
        // The boundary was let go: stop preparing, and do not follow later edits.
        sweepAround = null;
        return;
      }
      // Let the frame of the input that asked for this paint first.
      await new Promise((resolve) => setTimeout(resolve, 0));
      const s = useAppStore.getState();
      const doc = s.history.present;
      const around = boundariesCm(doc)[k];
      if (id !== sweep || around === undefined) return;
      sweepAround = { k, depthCm: around };
      for (const candidate of boundaryCandidates(doc, k, around)) {
        if (id !== sweep) return;
        const raw = toCaseFile(candidate);
        const key = previewKey(raw, s.waterSource, s.doseTo);
        if (cache.has(key)) continue;
        try {
          const answer = await getPreviewWorker().calculate(
            raw,
            optionsOf({ waterSource: s.waterSource, doseTo: s.doseTo, ...PREVIEW_OPTIONS }),
          );
          if (answer.ok) {
            cache.set(key, answer.report);
            speculationStats.prepared += 1;
          }
        } catch {
          // The worker was lost: the live path reports it; preparing stops here.
          return;
        }
      }
    };
    /**
     * Re-centre the sweep when the held boundary has moved half the prepared radius; start one
     * when a boundary is moved with no sweep going (e.g. nudged by key after a pointer drag).
     */
    const followSweep = (s: AppState) => {
      const held = /^(?:drag|nudge)-(\d+)$/.exec(s.history.openKey ?? '');
      if (!sweepAround) {
        if (held) void speculate(Number(held[1]));
        return;
      }
      const at = boundariesCm(s.history.present)[sweepAround.k];
      if (at !== undefined && Math.abs(at - sweepAround.depthCm) >= SPECULATION_RADIUS_CM / 2)
        void speculate(sweepAround.k);
    };

    const ask = (s: AppState, wants: { full: boolean; preview: boolean }) => {
      seq += 1;
      const base = {
        seq,
        raw: toCaseFile(s.history.present),
        waterSource: s.waterSource,
        doseTo: s.doseTo,
      };
      if (wants.preview) {
        const key = previewKey(base.raw, base.waterSource, base.doseTo);
        const ready = lastFull ? cache.get(key) : undefined;
        if (ready && lastFull && gate.preview(seq)) {
          speculationStats.hits += 1;
          showPreview(ready, lastFull);
        } else {
          keys.set(seq, key);
          for (const old of keys.keys()) if (old < seq - 8) keys.delete(old);
          preview.request({ ...base, ...PREVIEW_OPTIONS });
        }
      }
      if (wants.full) full.request({ ...base, depthStepCm: DEPTH_STEP_CM });
    };

    ask(useAppStore.getState(), { full: true, preview: false });
    let settle: ReturnType<typeof setTimeout> | undefined;
    const unsubscribe = useAppStore.subscribe((s, prev) => {
      if (
        s.history.present !== prev.history.present ||
        s.waterSource !== prev.waterSource ||
        s.doseTo !== prev.doseTo
      ) {
        clearTimeout(settle);
        ask(s, { full: !dragging(s), preview: true });
        followSweep(s);
      }
      // A drag that ends asks for the full calculation; a nudge once the keys have settled.
      else if (dragging(prev) && !dragging(s)) {
        clearTimeout(settle);
        if (nudging(prev))
          settle = setTimeout(
            () => ask(useAppStore.getState(), { full: true, preview: false }),
            NUDGE_SETTLE_MS,
          );
        else ask(s, { full: true, preview: false });
      }
    });
    // Retry after a failed calculation (e.g. the worker was lost): the same case again.
    const stopRetry = onRecalcRequest(() =>
      ask(useAppStore.getState(), { full: true, preview: false }),
    );
    const stopSpeculation = onSpeculationRequest((k) => void speculate(k));
    installDebugHooks();
    return () => {
      clearTimeout(settle);
      sweep += 1;
      stopSpeculation();
      stopRetry();
      unsubscribe();
      full.cancel();
      preview.cancel();
    };
  }, []);
}
