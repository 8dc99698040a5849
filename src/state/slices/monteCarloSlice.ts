// The Monte Carlo run the page last started (a slice of the page's one store): its progress and
// its (partial or final) result, tied to the run key of the case it was started for.
import type { McResult } from '../../engine/montecarlo/monteCarloResult';
import type { McProgress } from '../../compute/mcRunState';

export type McRunStatus = 'idle' | 'running' | 'done' | 'cancelled' | 'failed';

export interface MonteCarloState {
  status: McRunStatus;
  /** Serialised case the run belongs to; null before any run. */
  caseKey: string | null;
  /** Latest merged result (partial while running). */
  result: McResult | null;
  progress: McProgress | null;
  /** Short message when the run failed. */
  error: string | null;
}

export const initialMonteCarloState = (): MonteCarloState => ({
  status: 'idle',
  caseKey: null,
  result: null,
  progress: null,
  error: null,
});
