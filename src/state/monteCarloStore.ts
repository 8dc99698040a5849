// The Monte Carlo run the page last started: its progress and its (partial or final) result.
// A slice of the page's one store: a run belongs to the case it was started for (`caseKey`, its
// run key) and its curve is merged only while the edited case still matches.
import { sliceOf } from './slice';
import { useAppStore } from './store';
import type { MonteCarloState } from './slices/monteCarloSlice';

export type { McRunStatus, MonteCarloState } from './slices/monteCarloSlice';

/** The Monte Carlo slice of the page's one store. */
export const useMonteCarloStore = sliceOf(useAppStore, 'monteCarlo');

export function setMonteCarlo(patch: Partial<MonteCarloState>): void {
  useMonteCarloStore.setState(patch);
}
