// Keeps the calculation in step with the case: every edit asks the compute worker for a new
// report; only the newest answer is shown (older ones are dropped, waiting ones replaced).
import { useEffect } from 'react';
import { getComputeWorker } from '../compute/computeClient';
import { toCaseFile } from '../state/editorCase';
import { makeLatestOnly } from '../state/latestOnly';
import { setCalc, useAppStore } from '../state/store';
import type { LaminaCase } from '../io/caseSchema';
import type { ComputeApi } from '../compute/computeApi';

type CalcAnswer = ReturnType<ComputeApi['calculate']>;

export function useCompute(): void {
  useEffect(() => {
    const started = new Map<number, number>();
    const runner = makeLatestOnly(
      (raw: LaminaCase): Promise<CalcAnswer> => getComputeWorker().calculate(raw, {}),
      (result, id) => {
        const t0 = started.get(id);
        started.clear();
        const elapsedMs = t0 === undefined ? null : performance.now() - t0;
        if (!result.ok) {
          setCalc({ status: 'error', error: String(result.error), elapsedMs });
          return;
        }
        const r = result.value;
        if (r.ok)
          setCalc({ status: 'done', report: r.report, problems: [], error: null, elapsedMs });
        else setCalc({ status: 'invalid', problems: r.problems, error: null, elapsedMs });
      },
      (id) => {
        started.set(id, performance.now());
        setCalc({ status: 'running', requestId: id });
      },
    );
    runner.request(toCaseFile(useAppStore.getState().history.present));
    const unsubscribe = useAppStore.subscribe((s, prev) => {
      if (s.history.present !== prev.history.present) runner.request(toCaseFile(s.history.present));
    });
    return () => {
      unsubscribe();
      runner.cancel();
    };
  }, []);
}
