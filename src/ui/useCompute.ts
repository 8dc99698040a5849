// Keeps the calculation in step with the case: a thin adapter from the store to the scheduler
// (src/compute/calcScheduler.ts), which decides what to ask of the preview and compute workers
// and what reaches the screen. The page's Monte Carlo run travels with each full request and is
// merged into the report in the worker while it belongs to the case.
import { useEffect } from 'react';
import { getComputeWorker, getPreviewWorker } from '../compute/computeClient';
import { installDebugHooks } from '../compute/debugHooks';
import { CalcScheduler, type CalcSnapshot, type SweepSource } from '../compute/calcScheduler';
import { onRecalcRequest } from '../state/recalc';
import { boundariesCm, toCaseFile } from '../state/editorCase';
import { setCalc, useAppStore, type AppState } from '../state/store';
import { boundaryCandidates, onSpeculationRequest } from '../state/speculation';
import { useMonteCarloStore } from '../state/monteCarloStore';
import { currentMcAttachment } from './montecarlo/mcAttachment';

/** A boundary is being moved: dragged with the pointer, or nudged with a key held down. */
const dragging = (s: AppState) =>
  (s.history.openKey?.startsWith('drag-') || s.history.openKey?.startsWith('nudge-')) ?? false;
const nudging = (s: AppState) => s.history.openKey?.startsWith('nudge-') ?? false;
const heldBoundary = (s: AppState): number | null => {
  const m = /^(?:drag|nudge)-(\d+)$/.exec(s.history.openKey ?? '');
  return m ? Number(m[1]) : null;
};

function snapshotOf(s: AppState): CalcSnapshot {
  const raw = toCaseFile(s.history.present);
  const doseTo = s.check.doseTo;
  return {
    raw,
    water: s.waterSource,
    doseTo,
    mcRun: currentMcAttachment(raw, s.waterSource, doseTo),
  };
}

/** The held boundary's neighbouring cases, read from the store when the sweep runs. */
const sweepSource: SweepSource = {
  boundaryAt: (k) => boundariesCm(useAppStore.getState().history.present)[k],
  candidates: (k, aroundCm) => {
    const s = useAppStore.getState();
    return boundaryCandidates(s.history.present, k, aroundCm).map((doc) => ({
      raw: toCaseFile(doc),
      water: s.waterSource,
      doseTo: s.check.doseTo,
      mcRun: null,
    }));
  },
};

export function useCompute(): void {
  useEffect(() => {
    const scheduler = new CalcScheduler({
      fullWorker: getComputeWorker,
      previewWorker: getPreviewWorker,
      show: setCalc,
    });
    const current = () => snapshotOf(useAppStore.getState());
    scheduler.ask(current(), { full: true, preview: false });
    const unsubscribe = useAppStore.subscribe((s, prev) => {
      if (
        s.history.present !== prev.history.present ||
        s.waterSource !== prev.waterSource ||
        s.check.doseTo !== prev.check.doseTo
      ) {
        scheduler.ask(snapshotOf(s), { full: !dragging(s), preview: true });
        scheduler.followSweep(heldBoundary(s), sweepSource);
      }
      // A drag that ends asks for the full calculation; a nudge once the keys have settled.
      else if (dragging(prev) && !dragging(s)) scheduler.moveEnded(nudging(prev), current);
    });
    // A Monte Carlo result (partial or final) is merged by the worker into the full report.
    const stopMc = useMonteCarloStore.subscribe((m, prev) => {
      if (m.result === prev.result && m.status === prev.status && m.caseKey === prev.caseKey)
        return;
      const s = useAppStore.getState();
      if (!dragging(s)) scheduler.ask(snapshotOf(s), { full: true, preview: false });
    });
    // Retry after a failed calculation (e.g. the worker was lost): the same case again.
    const stopRetry = onRecalcRequest(() =>
      scheduler.ask(current(), { full: true, preview: false }),
    );
    const stopSpeculation = onSpeculationRequest((k) => void scheduler.speculate(k, sweepSource));
    installDebugHooks();
    return () => {
      scheduler.dispose();
      stopSpeculation();
      stopRetry();
      stopMc();
      unsubscribe();
    };
  }, []);
}
