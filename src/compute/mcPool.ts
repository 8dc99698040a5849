// Runs a Monte Carlo case on a pool of workers (navigator.hardwareConcurrency by default): short
// batches handed out one at a time, merged as they arrive, progress after each, cancel at any
// moment (workers are terminated; `done` then resolves with what was merged, or rejects if no
// estimate exists yet). Results do not depend on the number of workers.
import * as Comlink from 'comlink';
import type { McCaseInput, McOptions } from '../engine/montecarlo/monteCarloPlan';
import type { McResult } from '../engine/montecarlo/monteCarloResult';
import type { BatchTally, BatchTask } from '../engine/montecarlo/runBatch';
import { McRunState, type McProgress } from './mcRunState';
import { depthGridCm } from './calculateCase';

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

function browserWorker(): McWorkerHandle {
  const worker = new Worker(new URL('../../workers/mc.worker.ts', import.meta.url), {
    type: 'module',
    name: 'lamina-mc',
  });
  const remote = Comlink.wrap<{ runBatch(task: BatchTask): BatchTally }>(worker);
  return {
    runBatch: (task) => remote.runBatch(task),
    dispose: () => {
      remote[Comlink.releaseProxy]();
      worker.terminate();
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
