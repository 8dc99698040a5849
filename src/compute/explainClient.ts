// The factor view's worker: the compute worker's script under its own name, so a sweep never
// queues behind (or in front of) the page's calculations, and Cancel can stop it by terminating
// it; the next call starts a fresh one.
import type * as Comlink from 'comlink';
import type { ComputeApi } from './computeApi';
import { superviseWorker } from './workerSupervisor';

export const explainWorker = superviseWorker<ComputeApi>(
  () =>
    new Worker(new URL('../../workers/compute.worker.ts', import.meta.url), {
      type: 'module',
      name: 'lamina-explain',
    }),
  'factor view',
);

export function getExplainWorker(): Comlink.Remote<ComputeApi> {
  return explainWorker.api();
}

/** Stop whatever the worker is computing (a sweep's Cancel); waiting calls reject. */
export function cancelExplainWork(): void {
  explainWorker.terminate('Cancelled.');
}
