// The report the depth-dose and CF views draw: the latest calculation from the compute worker,
// which already carries the page's Monte Carlo run while that run belongs to the case being edited
// (merged, calibrated and flagged in the worker: src/compute/calculationService).
import { useMemo } from 'react';
import { monteCarloRunKey } from '../../compute/monteCarloRunKey';
import type { CalcReport } from '../../contract/reports';
import { toCaseFile } from '../../state/editorCase';
import { useAppStore } from '../../state/store';

/**
 * The run key of the case being edited with the page's water source and dose convention
 * (src/compute/monteCarloRunKey).
 */
export function useCurrentMcCaseKey(): string {
  const present = useAppStore((s) => s.history.present);
  const waterSource = useAppStore((s) => s.waterSource);
  const doseTo = useAppStore((s) => s.check.doseTo);
  return useMemo(
    () => monteCarloRunKey(toCaseFile(present), { kind: waterSource }, doseTo),
    [present, waterSource, doseTo],
  );
}

export function useShownReport(): CalcReport | null {
  return useAppStore((s) => s.calc.report);
}
