// Hidden debug actions for end-to-end tests and support, registered only when the page address
// carries "?debug=1": `window.__laminaDebug.killComputeWorker()` stops the compute worker now,
// `killComputeWorkerDuringNextCalculation()` stops it right after the next request is sent (a
// crash mid-run), `computeWorkerStarts()` counts the workers started. Nothing here runs otherwise.
import { computeWorker } from './computeClient';

export interface LaminaDebug {
  killComputeWorker(): void;
  killComputeWorkerDuringNextCalculation(): void;
  computeWorkerStarts(): number;
}

export function debugFlagIsSet(search: string): boolean {
  return new URLSearchParams(search).get('debug') === '1';
}

/** Registers `window.__laminaDebug` when the address asks for it; returns whether it did. */
export function installDebugHooks(): boolean {
  if (typeof window === 'undefined' || !debugFlagIsSet(window.location.search)) return false;
  const hooks: LaminaDebug = {
    killComputeWorker: () =>
      computeWorker.terminate('The compute worker was stopped (debug action).'),
    killComputeWorkerDuringNextCalculation: () =>
      computeWorker.terminateAfterNextCall(
        'The compute worker stopped during the calculation (debug action).',
      ),
    computeWorkerStarts: () => computeWorker.starts(),
  };
  (window as unknown as { __laminaDebug?: LaminaDebug }).__laminaDebug = hooks;
  return true;
}
