// The Monte Carlo run the page last started: its progress and its (partial or final) result.
// Kept apart from the editing store: a run belongs to the case it was started for (`caseKey`, the
// serialised case) and its curve is shown only while the edited case still matches.
import { create } from 'zustand';
import type { McResult } from '../engine/montecarlo/monteCarloResult';
import type { McProgress } from '../compute/mcRunState';

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

export const useMonteCarloStore = create<MonteCarloState>()(() => ({
  status: 'idle',
  caseKey: null,
  result: null,
  progress: null,
  error: null,
}));

export function setMonteCarlo(patch: Partial<MonteCarloState>): void {
  useMonteCarloStore.setState(patch);
}
