// The page's handle on the compute worker. One worker, created on first use; if it throws or
// dies, waiting calls reject with a WorkerLostError and the next call starts a fresh one.
import type * as Comlink from 'comlink';
import type { ComputeApi } from './computeApi';
import { superviseWorker } from './workerSupervisor';

export const computeWorker = superviseWorker<ComputeApi>(
  () =>
    new Worker(new URL('../../workers/compute.worker.ts', import.meta.url), {
      type: 'module',
      name: 'lamina-compute',
    }),
  'compute',
);

export function getComputeWorker(): Comlink.Remote<ComputeApi> {
  return computeWorker.api();
}

/** Terminate the worker (e.g. after a crash or to cancel); the next call starts a fresh one. */
export function resetComputeWorker(): void {
  computeWorker.terminate();
}

/**
 * A second worker for the quick previews during edits (fast methods only), so a preview never
 * waits behind a full calculation still running in the first one.
 */
export const previewWorker = superviseWorker<ComputeApi>(
  () =>
    new Worker(new URL('../../workers/compute.worker.ts', import.meta.url), {
      type: 'module',
      name: 'lamina-preview',
    }),
  'preview',
);

export function getPreviewWorker(): Comlink.Remote<ComputeApi> {
  return previewWorker.api();
}
