// Starts and cancels the page's Monte Carlo run on the worker pool and keeps the run store
// (src/state/monteCarloStore.ts) up to date: progress and the partial result after every batch,
// the final (or, after Cancel, the merged-so-far) result at the end. One run at a time.
import { create } from 'zustand';
import { startMonteCarlo, type McPoolOptions, type McRunHandle } from '../../compute/mcPool';
import { setMonteCarlo, useMonteCarloStore } from '../../state/monteCarloStore';
import type { LaminaCase } from '../../io/caseSchema';
import type { McCalibration } from '../../compute/monteCarloCalibration';
import { getComputeWorker } from '../../compute/computeClient';

/** The form of the panel (kept when switching views) and what the current run was started with. */
export interface McForm {
  historiesText: string;
  seedText: string;
  doseToWater: boolean;
  /** Settings of the run in the store (null before any run). */
  run: {
    histories: number;
    seed: number;
    doseToWater: boolean;
    calibration: McCalibration;
    startedAtMs: number;
  } | null;
}

export const useMcForm = create<McForm>()(() => ({
  historiesText: '200000',
  seedText: '1',
  doseToWater: false,
  run: null,
}));

export function patchMcForm(patch: Partial<McForm>): void {
  useMcForm.setState(patch);
}

/** The run in progress: its calibration still being asked for (handle null), or its pool running. */
let current: { handle: McRunHandle | null; id: number } | null = null;
let runCounter = 0;

export interface StartRequest {
  caseData: LaminaCase;
  caseKey: string;
  histories: number;
  seed: number;
  doseToWater: boolean;
  waterSource?: string | undefined;
  /** The report's depth grid, so the MC curve lines up with the other methods. */
  depthGridCm: readonly number[];
  /** Worker count and factory (tests run the batches in-process); browser workers by default. */
  pool?: Pick<McPoolOptions, 'workers' | 'createWorker'>;
  /** The run's calibration (tests compute it in-process); by default the compute worker's. */
  calibrate?: (c: LaminaCase, waterSource?: string) => Promise<McCalibration>;
}

/** The calibration from the compute worker, where the water data is. */
async function workerCalibration(c: LaminaCase, waterSource?: string): Promise<McCalibration> {
  const r = await getComputeWorker().monteCarloCalibration(c, waterSource);
  if (!r.ok) throw new Error(r.problems.map((p) => `${p.path}: ${p.message}`).join('; '));
  return r.calibration;
}

export function startRun(req: StartRequest): void {
  cancelRun();
  const id = ++runCounter;
  const startedAtMs = Date.now();
  current = { handle: null, id };
  // The run's settings are shown once its calibration is known.
  patchMcForm({ run: null });
  setMonteCarlo({
    status: 'running',
    caseKey: req.caseKey,
    result: null,
    progress: null,
    error: null,
  });
  const latest = (): boolean => id === runCounter && current?.id === id;
  (req.calibrate ?? workerCalibration)(req.caseData, req.waterSource).then(
    (calibration) => {
      // Cancelled or replaced while the calibration was on its way: nothing is started.
      if (latest()) startPool(req, id, calibration, startedAtMs);
    },
    (e: unknown) => {
      if (!latest()) return;
      current = null;
      setMonteCarlo({ status: 'failed', error: messageOf(e) });
    },
  );
}

function startPool(
  req: StartRequest,
  id: number,
  calibration: McCalibration,
  startedAtMs: number,
): void {
  patchMcForm({
    run: {
      histories: req.histories,
      seed: req.seed,
      doseToWater: req.doseToWater,
      calibration,
      startedAtMs,
    },
  });
  let handle: McRunHandle;
  try {
    handle = startMonteCarlo(
      req.caseData,
      {
        histories: req.histories,
        seed: req.seed,
        doseToWater: req.doseToWater,
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
    current = null;
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
  if (handle) handle.cancel();
  // A run still waiting for its calibration is dropped here; a running pool settles through done.
  else current = null;
}

export function isRunActive(): boolean {
  return current !== null;
}

function messageOf(e: unknown): string {
  return e instanceof Error ? e.message : String(e);
}
