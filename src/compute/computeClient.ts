// The page's handle on the compute worker. One worker, created on first use, replaced if it dies.
import * as Comlink from 'comlink';
import type { ComputeApi } from './computeApi';

let worker: Worker | undefined;
let remote: Comlink.Remote<ComputeApi> | undefined;

export function getComputeWorker(): Comlink.Remote<ComputeApi> {
  if (!remote) {
    worker = new Worker(new URL('../../workers/compute.worker.ts', import.meta.url), {
      type: 'module',
      name: 'lamina-compute',
    });
    remote = Comlink.wrap<ComputeApi>(worker);
  }
  return remote;
}

/** Terminate the worker (e.g. after a crash or to cancel); the next call starts a fresh one. */
export function resetComputeWorker(): void {
  remote?.[Comlink.releaseProxy]();
  worker?.terminate();
  worker = undefined;
  remote = undefined;
}
