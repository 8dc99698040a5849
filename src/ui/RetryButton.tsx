// "Retry" for a calculation that failed (e.g. the compute worker was lost): asks for the same
// case to be calculated again, on a fresh worker if the old one is gone.
import { requestRecalc } from '../state/recalc';

export function RetryButton() {
  return (
    <button type="button" data-testid="calc-retry" onClick={requestRecalc}>
      Retry
    </button>
  );
}
