// Keeps the factor view's explanation in step with the case, the depth and the dose convention:
// each change asks the factor-view worker; an answer for an older request is dropped, and the
// last answer stays on screen (marked as updating) until the new one arrives.
import { useEffect, useState } from 'react';
import { getExplainWorker } from '../../compute/explainClient';
import type { PointExplanation } from '../../contract/explain';
import type { LaminaCase } from '../../io/caseSchema';
import type { WaterChoice } from '../../compute/waterSource';
import type { DoseQuantity } from '../../engine/dose/doseQuantity';

export interface ExplanationState {
  explanation: PointExplanation | null;
  updating: boolean;
  error: string | null;
}

interface Answer {
  forKey: string;
  explanation: PointExplanation | null;
  error: string | null;
}

export function useExplanation(
  raw: LaminaCase,
  key: string,
  depthCm: number | null,
  water: WaterChoice,
  doseTo: DoseQuantity,
  retry: number,
): ExplanationState {
  const requestKey = `${key}|${depthCm}|${water}|${doseTo}|${retry}`;
  const [answer, setAnswer] = useState<Answer>({ forKey: '', explanation: null, error: null });
  useEffect(() => {
    if (depthCm === null) return;
    let current = true;
    getExplainWorker()
      .explainPoint({ case: raw, water: { kind: water }, depthCm, options: { doseTo } })
      .then(
        (a) => {
          if (!current) return;
          setAnswer((old) =>
            a.ok
              ? { forKey: requestKey, explanation: a.explanation, error: null }
              : {
                  forKey: requestKey,
                  explanation: old.explanation,
                  error: a.problems.map((p) => `${p.path}: ${p.message}`).join('; '),
                },
          );
        },
        (e: unknown) => {
          if (!current) return;
          setAnswer((old) => ({
            forKey: requestKey,
            explanation: old.explanation,
            error: `The factors could not be calculated: ${e instanceof Error ? e.message : String(e)}`,
          }));
        },
      );
    return () => {
      current = false;
    };
    // raw changes identity with every edit; requestKey carries its content and the other inputs
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [requestKey]);
  return {
    explanation: answer.explanation,
    updating: depthCm !== null && answer.forKey !== requestKey,
    error: answer.error,
  };
}
