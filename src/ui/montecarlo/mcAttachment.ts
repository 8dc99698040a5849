// The page's Monte Carlo run as it travels with a calculation request: its result (partial or
// final), the key of the case it was started for and the label note while it is not finished.
// The worker merges it only when that key is the requested case's (src/compute/monteCarloRunKey:
// case, water source and dose convention).
import type { McRunAttachment } from '../../compute/calcRequest';
import { monteCarloRunKey } from '../../compute/monteCarloRunKey';
import type { WaterChoice } from '../../compute/waterSource';
import type { DoseQuantity } from '../../engine/dose/doseQuantity';
import type { LaminaCase } from '../../io/caseSchema';
import { useMonteCarloStore } from '../../state/monteCarloStore';
import { partialRunNote } from './mcRunModel';

export function currentMcAttachment(
  raw: LaminaCase,
  water: WaterChoice,
  doseTo: DoseQuantity,
): McRunAttachment | null {
  const m = useMonteCarloStore.getState();
  if (!m.result || m.caseKey === null) return null;
  // Only a run of this case travels (the worker checks the key again).
  if (m.caseKey !== monteCarloRunKey(raw, { kind: water }, doseTo)) return null;
  const { method, pointCf, histories, batchesDone, batches, seed } = m.result;
  return {
    key: m.caseKey,
    run: { method, pointCf, histories, batchesDone, batches, seed },
    note: partialRunNote(m.status),
  };
}
