// Starts and cancels the page's Monte Carlo run on the worker pool and keeps the run store
// (src/state/monteCarloStore.ts) up to date: progress and the partial result after every batch,
// the final (or, after Cancel, the merged-so-far) result at the end. One run at a time.
import { create } from 'zustand';
import { startMonteCarlo, type McPoolOptions, type McRunHandle } from '../../compute/mcPool';
import { setMonteCarlo, useMonteCarloStore } from '../../state/monteCarloStore';
import type { LaminaCase } from '../../io/caseSchema';
import type { DoseQuantity } from '../../engine/dose/doseQuantity';
import { monteCarloCalibration, type McCalibration } from './mcCalibration';

/** The form of the panel (kept when switching views) and what the current run was started with. */
export interface McForm {
  historiesText: string;
  seedText: string;
  /** Settings of the run in the store (null before any run). */
  run: {
    histories: number;
    seed: number;
    doseTo: DoseQuantity;
    calibration: McCalibration;
    startedAtMs: number;
  } | null;
}

export const useMcForm = create<McForm>()(() => ({
  historiesText: '200000',
  seedText: '1',
  run: null,
}));

export function patchMcForm(patch: Partial<McForm>): void {
  useMcForm.setState(patch);
}

let current: { handle: McRunHandle; id: number } | null = null;
let runCounter = 0;

export interface StartRequest {
  caseData: LaminaCase;
  caseKey: string;
  histories: number;
  seed: number;
  /** The page's dose convention (scored as dose to medium, converted when water is chosen). */
  doseTo: DoseQuantity;
  waterSource?: string | undefined;
  /** The report's depth grid, so the MC curve lines up with the other methods. */
  depthGridCm: readonly number[];
  /** Worker count and factory (tests run the batches in-process); browser workers by default. */
  pool?: Pick<McPoolOptions, 'workers' | 'createWorker'>;
}

export function startRun(req: StartRequest): void {
  cancelRun();
  const id = ++runCounter;
  const calibration = monteCarloCalibration(req.caseData, req.waterSource);
  patchMcForm({
    run: {
      histories: req.histories,
      seed: req.seed,
      doseTo: req.doseTo,
      calibration,
      startedAtMs: Date.now(),
    },
  });
  setMonteCarlo({
    status: 'running',
    caseKey: req.caseKey,
    result: null,
    progress: null,
    error: null,
  });
  let handle: McRunHandle;
  try {
    handle = startMonteCarlo(
      req.caseData,
      {
        histories: req.histories,
        seed: req.seed,
        doseTo: req.doseTo,
        referenceDosePerMuCGy: calibration.referenceDosePerMuCGy,
        collimatorScatterFactor: calibration.collimatorScatterFactor,
        referenceDMaxCm: calibration.referenceDMaxCm,
      },
      (p) => {
        if (id !== runCounter) return;
        setMonteCarlo({ progress: p, result: p.partial ?? useMonteCarloStore.getState().result });
      },
      { ...req.pool, depthGridCm: req.depthGridCm },
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
