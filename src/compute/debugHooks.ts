// Hidden debug actions for end-to-end tests and support, registered only when the page address
// carries "?debug=1": `window.__laminaDebug.killComputeWorker()` stops the compute worker now,
// `killComputeWorkerDuringNextCalculation()` stops it right after the next request is sent (a
// crash mid-run), `computeWorkerStarts()` counts the workers started, `killMonteCarloWorkers()`
// stops the workers of a running Monte Carlo run, `speculation()` counts the previews prepared
// for a held boundary and the edits drawn from them, `chartDraws()` counts each chart's layouts
// (and those that repeated the previous one unchanged). Nothing here runs otherwise.
import { chartDrawCounts, enableDrawStats, type ChartDrawCount } from '../state/drawStats';
import { speculationStats } from '../state/speculation';
import { computeWorker } from './computeClient';

export interface LaminaDebug {
  killComputeWorker(): void;
  killComputeWorkerDuringNextCalculation(): void;
  computeWorkerStarts(): number;
  /** Stops every Monte Carlo worker of the running run as if it had crashed; returns how many. */
  killMonteCarloWorkers(): Promise<number>;
  /** Previews prepared for a held boundary, and edits drawn from a ready preview. */
  speculation(): { prepared: number; hits: number };
  /** Layouts of each chart (by test id) since the hooks were installed, and repeated ones. */
  chartDraws(): Record<string, ChartDrawCount>;
}

export function debugFlagIsSet(search: string): boolean {
  return new URLSearchParams(search).get('debug') === '1';
}

/** Registers `window.__laminaDebug` when the address asks for it; returns whether it did. */
export function installDebugHooks(): boolean {
  if (typeof window === 'undefined' || !debugFlagIsSet(window.location.search)) return false;
  enableDrawStats();
  const hooks: LaminaDebug = {
    killComputeWorker: () =>
      computeWorker.terminate('The compute worker was stopped (debug action).'),
    killComputeWorkerDuringNextCalculation: () =>
      computeWorker.terminateAfterNextCall(
        'The compute worker stopped during the calculation (debug action).',
      ),
    computeWorkerStarts: () => computeWorker.starts(),
    speculation: () => ({ ...speculationStats }),
    chartDraws: chartDrawCounts,
    // Imported on use, so the Monte Carlo pool stays out of the page's first bundle.
    killMonteCarloWorkers: async () =>
      (await import('./mcPool')).terminateMonteCarloWorkers(
        'A Monte Carlo worker stopped during the run (debug action).',
      ),
  };
  (window as unknown as { __laminaDebug?: LaminaDebug }).__laminaDebug = hooks;
  return true;
}
