// Starts and cancels the page's Monte Carlo run on the worker pool and keeps the run store
// (src/state/monteCarloStore.ts) up to date: progress and the partial result after every batch,
// the final (or, after Cancel, the merged-so-far) result at the end. One run at a time.
import { sliceOf } from '../../state/slice';
import { useAppStore } from '../../state/store';
import type { McForm } from '../../state/slices/mcFormSlice';
import { startMonteCarlo, type McPoolOptions, type McRunHandle } from '../../compute/mcPool';
import { setMonteCarlo, useMonteCarloStore } from '../../state/monteCarloStore';
import type { LaminaCase } from '../../io/caseSchema';
import type { McSetup } from '../../compute/calculationService';

export type { McForm } from '../../state/slices/mcFormSlice';

/** The Monte Carlo form slice of the page's one store. */
export const useMcForm = sliceOf(useAppStore, 'mcForm');

export function patchMcForm(patch: Partial<McForm>): void {
  useMcForm.setState(patch);
}

let current: { handle: McRunHandle; id: number } | null = null;
let runCounter = 0;

export interface StartRequest {
  caseData: LaminaCase;
  /** Calibration, engine options, key and depth grid, prepared by the compute worker. */
  setup: McSetup;
  histories: number;
  seed: number;
  /** Worker count and factory (tests run the batches in-process); browser workers by default. */
  pool?: Pick<McPoolOptions, 'workers' | 'createWorker'>;
}

export function startRun(req: StartRequest): void {
  cancelRun();
  const id = ++runCounter;
  const { calibration } = req.setup;
  patchMcForm({
    run: {
      histories: req.histories,
      seed: req.seed,
      doseTo: req.setup.doseTo,
      calibration,
      startedAtMs: Date.now(),
    },
  });
  setMonteCarlo({
    status: 'running',
    caseKey: req.setup.key,
    result: null,
    progress: null,
    error: null,
  });
  let handle: McRunHandle;
  try {
    handle = startMonteCarlo(
      req.caseData,
      req.setup.options,
      (p) => {
        if (id !== runCounter) return;
        setMonteCarlo({ progress: p, result: p.partial ?? useMonteCarloStore.getState().result });
      },
      { ...req.pool, depthGridCm: req.setup.depthGridCm },
    );
  } catch (e) {
    setMonteCarlo({ status: 'failed', error: messageOf(e) });
    return;
  }
  current = { handle, id };
  const latest = (): boolean => id === runCounter;
  handle.done.then(
    (result) => {
      if (!latest()) return;
      current = null;
      const cancelled = useMonteCarloStore.getState().status === 'cancelled';
      setMonteCarlo({ status: cancelled ? 'cancelled' : 'done', result });
    },
    (e: unknown) => {
      if (!latest()) return;
      current = null;
      // Cancelled before any estimate existed: stays "cancelled", with no result.
      if (useMonteCarloStore.getState().status === 'cancelled') return;
      setMonteCarlo({ status: 'failed', error: messageOf(e) });
    },
  );
}

/** Stop the running run (workers are ended at once); what was merged so far is kept. */
export function cancelRun(): void {
  if (!current) return;
  const { handle } = current;
  setMonteCarlo({ status: 'cancelled' });
  handle.cancel();
}

export function isRunActive(): boolean {
  return current !== null;
}

function messageOf(e: unknown): string {
  return e instanceof Error ? e.message : String(e);
}
