// The Monte Carlo block of a case calculation: single-threaded unless a runner is given (the
// command line passes its threaded one, src/cli/mcThreads.ts; the page uses the worker pool in
// mcPool.ts instead). Runs only when a number of histories is given. With water data, dose per MU
// uses its reference dose rate and its collimator-scatter factor S_c (the MC models the phantom).
import { modelledWaterData } from '../engine/beam/modelledBeam';
import { equivalentSquareCm } from '../engine/beam/geometry';
import type { WaterData } from '../engine/beam/waterData';
import type { MethodResult } from '../engine/methodResult';
import { runMonteCarlo } from '../engine/montecarlo/runMonteCarlo';
import type { McCaseInput, McOptions } from '../engine/montecarlo/monteCarloPlan';
import type { McResult } from '../engine/montecarlo/monteCarloResult';
import type { LaminaCase } from '../io/caseSchema';

export const MONTE_CARLO_METHOD_ID = 'monte-carlo';

/** Runs a whole Monte Carlo case; any runner gives the result of runMonteCarlo for the same inputs. */
export type McRunner = (
  c: McCaseInput,
  options: McOptions,
  depthGridCm: readonly number[],
) => McResult;

export interface McCalcOptions {
  histories: number;
  seed: number;
  /** Who runs the batches (default: runMonteCarlo, in this thread). */
  runner?: McRunner;
}

export function monteCarloForCase(
  c: LaminaCase,
  depthCm: readonly number[],
  requested: readonly string[] | undefined,
  mc: McCalcOptions | undefined,
  waterData?: WaterData,
): { methods: MethodResult[]; unavailable: { id: string; reason: string }[] } {
  const asked = requested ? requested.includes(MONTE_CARLO_METHOD_ID) : true;
  if (!asked) return { methods: [], unavailable: [] };
  if (!mc) {
    return {
      methods: [],
      unavailable: requested
        ? [{ id: MONTE_CARLO_METHOD_ID, reason: 'needs a number of histories (--mc-histories N)' }]
        : [],
    };
  }
  const result = (mc.runner ?? runMonteCarlo)(
    c,
    {
      histories: mc.histories,
      seed: mc.seed,
      // The calibration maximum is fitted around the modelled beam's d_max (same kernels and
      // spectrum as the Monte Carlo), whatever water data the other methods use.
      referenceDMaxCm: modelledWaterData(c.beam.energy).dMaxCm,
      ...(waterData
        ? {
            referenceDosePerMuCGy: waterData.referenceDosePerMuCGy,
            collimatorScatterFactor: waterData.sc(
              equivalentSquareCm(c.beam.fieldXCm, c.beam.fieldYCm),
            ),
          }
        : {}),
    },
    depthCm,
  );
  return { methods: [result.method], unavailable: [] };
}
