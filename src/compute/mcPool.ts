// Runs a Monte Carlo case on a pool of workers (navigator.hardwareConcurrency by default): short
// batches handed out one at a time, merged as they arrive, progress after each, cancel at any
// moment (workers are terminated; `done` then resolves with what was merged, or rejects if no
// estimate exists yet). Results do not depend on the number of workers.
import type { McCaseInput, McOptions } from '../engine/montecarlo/monteCarloPlan';
import type { McResult } from '../engine/montecarlo/monteCarloResult';
import type { BatchTally, BatchTask } from '../engine/montecarlo/runBatch';
import { McRunState, type McProgress } from './mcRunState';
import { depthGridCm } from './depthGrid';
import { superviseWorker } from './workerSupervisor';

/** What the pool needs from a worker; `dispose` ends it. */
export interface McWorkerHandle {
  runBatch(task: BatchTask): Promise<BatchTally>;
  dispose(): void;
}

export interface McPoolOptions {
  /** Number of workers; default navigator.hardwareConcurrency (at least 1). */
  workers?: number;
  /** Depth grid of the result curve (cm); default 0 to the phantom bottom in 0.05 cm steps. */
  depthGridCm?: readonly number[];
  /** Worker factory (tests pass an in-process one). */
  createWorker?: () => McWorkerHandle;
}

export interface McRunHandle {
  cancel(): void;
  done: Promise<McResult>;
}

/** Live browser Monte Carlo workers, for the ?debug=1 hooks (see ./debugHooks). */
const liveBrowserWorkers = new Set<{ terminate(reason?: string): void }>();

/** Debug aid: stop every live Monte Carlo worker as if it had crashed; returns how many. */
export function terminateMonteCarloWorkers(reason: string): number {
  const n = liveBrowserWorkers.size;
  for (const w of [...liveBrowserWorkers]) w.terminate(reason);
  return n;
}

function browserWorker(): McWorkerHandle {
  // Supervised: a worker that crashes rejects its batch (the run then fails with that message)
  // instead of leaving the run waiting forever.
  const supervised = superviseWorker<{ runBatch(task: BatchTask): BatchTally }>(
    () =>
      new Worker(new URL('../../workers/mc.worker.ts', import.meta.url), {
        type: 'module',
        name: 'lamina-mc',
      }),
    'Monte Carlo',
  );
  liveBrowserWorkers.add(supervised);
  return {
    runBatch: (task) => supervised.api().runBatch(task),
    dispose: () => {
      liveBrowserWorkers.delete(supervised);
      supervised.terminate();
    },
  };
}

export function startMonteCarlo(
  caseData: McCaseInput,
  options: McOptions,
  onProgress: (p: McProgress) => void,
  pool: McPoolOptions = {},
): McRunHandle {
  const total = caseData.layers.reduce((s, l) => s + l.thicknessCm, 0);
  const state = new McRunState(caseData, options, pool.depthGridCm ?? depthGridCm(total, 0.05));
  const n = Math.max(
    1,
    pool.workers ?? (typeof navigator !== 'undefined' ? navigator.hardwareConcurrency : 1) ?? 1,
  );
  const create = pool.createWorker ?? browserWorker;
  const handles = Array.from({ length: n }, () => create());
  let cancelled = false;
  let settle: (() => void) | undefined;
  const cancelledSignal = new Promise<void>((resolve) => (settle = resolve));

  const loop = async (h: McWorkerHandle): Promise<void> => {
    for (let t = state.nextTask(); t && !cancelled; t = state.nextTask()) {
      const tally = await Promise.race([h.runBatch(t.task), cancelledSignal.then(() => undefined)]);
      if (cancelled || !tally) return;
      state.accept(t.scenarioIndex, tally);
      onProgress(state.progress());
    }
  };

  const disposeAll = (): void => handles.forEach((h) => h.dispose());
  const done = Promise.all(handles.map(loop)).then(
    () => {
      disposeAll();
      if (!state.hasEstimate) throw new Error('Monte Carlo cancelled before any estimate');
      return state.result();
    },
    (err: unknown) => {
      disposeAll();
      throw err;
    },
  );
  return {
    cancel() {
      if (cancelled) return;
      cancelled = true;
      settle?.();
    },
    done,
  };
}
