// The report the depth-dose and CF views draw: the latest calculation plus the Monte Carlo curve
// of the page's run while that run belongs to the case being edited (live while it runs).
import { useMemo } from 'react';
import type { CalcReport } from '../../compute/calculateCase';
import { useMonteCarloStore } from '../../state/monteCarloStore';
import { useAppStore } from '../../state/store';
import { partialRunNote, withMonteCarloMethod } from './mergeMonteCarlo';
import { isRunCurrent, monteCarloCaseKey } from './mcRunModel';

/** The key of the case being edited, as the Monte Carlo run store keys runs. */
export function useCurrentMcCaseKey(): string {
  const present = useAppStore((s) => s.history.present);
  const waterSource = useAppStore((s) => (s as { waterSource?: string }).waterSource);
  const doseTo = useAppStore((s) => s.doseTo);
  return useMemo(
    () => monteCarloCaseKey(present, waterSource, doseTo),
    [present, waterSource, doseTo],
  );
}

export function useShownReport(): CalcReport | null {
  const report = useAppStore((s) => s.calc.report);
  const runKey = useMonteCarloStore((s) => s.caseKey);
  const method = useMonteCarloStore((s) => s.result?.method);
  const note = useMonteCarloStore((s) => partialRunNote(s.status));
  const currentKey = useCurrentMcCaseKey();
  const current = isRunCurrent(runKey, currentKey);
  return useMemo(
    () => withMonteCarloMethod(report, method, current, note),
    [report, method, current, note],
  );
}
