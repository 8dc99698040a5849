// Monte Carlo dose per MU, decided once for the CLI and the page's worker-pool run.
// The Monte Carlo models the phantom only. With the modelled beam its dose per fluence is tied to
// MU absolutely: its own water calibration run (10 × 10, SSD 100, fitted around the modelled d_max)
// scaled by the modelled reference dose rate and S_c. With a measured table the Monte Carlo dose
// per MU at a point is CF_MC × the table's water dose per MU there (CF_MC = MC dose in the case /
// MC dose in the matched water run, the run's 'water' scenario), so it differs from the other
// methods only by its heterogeneity physics; its 1σ is σ(CF_MC) × the water dose (the table
// carries no σ), and the table's own flags (extrapolation) travel with it. The run is made in the
// calculation's dose convention (CF and dose alike), so CF_MC × the table's water dose is already
// in that convention.
import { equivalentSquareCm } from '../engine/beam/geometry';
import { modelledWaterData } from '../engine/beam/modelledBeam';
import type { WaterData } from '../engine/beam/waterData';
import type { MethodResult } from '../engine/methodResult';
import { MONTE_CARLO_METHOD_ID } from '../engine/methodRegistry';
import type { McOptions } from '../engine/montecarlo/monteCarloPlan';
import type { DoseQuantity } from '../engine/dose/doseQuantity';
import type { McResult } from '../engine/montecarlo/monteCarloResult';
import type { LaminaCase } from '../io/caseSchema';
import { isMeasuredWater } from './waterSource';

export interface McCalibration {
  /** 'absolute': the run's own calibration; 'cf-times-water': CF_MC × the measured table. */
  mode: 'absolute' | 'cf-times-water';
  referenceDosePerMuCGy: number;
  collimatorScatterFactor: number;
  /**
   * Nominal d_max (cm) around which the calibration run's maximum is fitted: the modelled beam's,
   * which comes from the same kernels and spectrum as the Monte Carlo.
   */
  referenceDMaxCm: number;
  /** Where the dose per MU comes from, in words (panel, variant). */
  source: string;
}

/** What a Monte Carlo run hands back for the report (structured-cloneable, from McResult). */
export type McRunOutput = Pick<
  McResult,
  'method' | 'pointCf' | 'histories' | 'batchesDone' | 'batches' | 'seed'
>;

export function monteCarloCalibration(
  c: LaminaCase,
  waterData: WaterData | undefined,
): McCalibration {
  const modelled = modelledWaterData(c.beam.energy);
  const field = equivalentSquareCm(c.beam.fieldXCm, c.beam.fieldYCm);
  const absolute = {
    referenceDosePerMuCGy: modelled.referenceDosePerMuCGy,
    collimatorScatterFactor: modelled.sc(field),
    referenceDMaxCm: modelled.dMaxCm,
  };
  if (waterData && isMeasuredWater(c, waterData))
    return {
      mode: 'cf-times-water',
      ...absolute,
      source: `CF (Monte Carlo) × water dose per MU of ${waterData.source}`,
    };
  return {
    mode: 'absolute',
    ...absolute,
    source: `absolute: Monte Carlo water calibration run scaled to ${modelled.source} (reference dose rate, S_c)`,
  };
}

/**
 * The Monte Carlo engine options of a run with this calibration, in one dose convention: the
 * engine scores dose to medium and converts once (src/engine/dose/doseConversion.ts), so a run
 * belongs to its convention (it is part of the run key, monteCarloRunKey.ts).
 */
export function monteCarloRunOptions(
  calibration: McCalibration,
  run: { histories: number; seed: number; doseTo: DoseQuantity },
): McOptions {
  return {
    histories: run.histories,
    seed: run.seed,
    doseTo: run.doseTo,
    referenceDosePerMuCGy: calibration.referenceDosePerMuCGy,
    collimatorScatterFactor: calibration.collimatorScatterFactor,
    referenceDMaxCm: calibration.referenceDMaxCm,
  };
}

/** The engine's flag for a point whose relative 1σ exceeds 2 % (src/engine/montecarlo/monteCarloResult). */
const MC_SIGMA_FLAG = 'MC 1σ > 2 %';
const MC_SIGMA_FLAG_LIMIT = 0.02;

const times = (a: number | null | undefined, b: number | null | undefined): number | null =>
  a === null || a === undefined || b === null || b === undefined || !Number.isFinite(a * b)
    ? null
    : a * b;

/** Flags of the water table's look-ups (extrapolation, clamping) that the MC dose inherits. */
function tableFlags(flags: readonly string[]): string[] {
  return flags.filter((f) => /extrapolat|clamp/i.test(f));
}

/**
 * The report's Monte Carlo method: the run's own result with the absolute calibration, or
 * CF_MC × the water method's dose per MU (same depth grid and points) with a measured table.
 */
export function calibratedMonteCarloMethod(
  calibration: McCalibration,
  run: McRunOutput,
  water: MethodResult | undefined,
  waterSource: string,
): MethodResult {
  const m = run.method;
  if (calibration.mode === 'absolute')
    return { ...m, waterData: `${waterSource}: reference dose rate and S_c only` };
  if (!water) throw new Error('the measured-table Monte Carlo needs the water method');
  const wd = water.curve.dosePerMuCGy;
  const sigmaCf = m.curve.sigmaCf ?? [];
  return {
    ...m,
    variant: `${m.variant}; dose per MU = CF × water dose per MU of the measured table`,
    waterData: `${waterSource} (dose per MU = CF × its water dose per MU)`,
    curve: {
      depthCm: [...m.curve.depthCm],
      dosePerMuCGy: m.curve.cf.map((cf, i) => times(cf, wd[i])),
      cf: [...m.curve.cf],
      sigmaDosePerMuCGy: m.curve.cf.map((_, i) => times(sigmaCf[i] ?? 0, wd[i]) ?? 0),
      sigmaCf: [...sigmaCf],
    },
    points: m.points.map((p, i) => {
      const w = water.points.find((q) => q.id === p.id);
      const pc = run.pointCf[i];
      // A point whose MC value is unknown (too few batches) stays unknown.
      const dose = p.dosePerMuCGy === null ? null : times(pc?.cf, w?.dosePerMuCGy);
      const sigma = dose === null ? 0 : (times(pc?.sigmaCf, w?.dosePerMuCGy) ?? 0);
      const own = p.flags.filter((f) => f !== MC_SIGMA_FLAG);
      if (dose !== null && !(sigma / dose <= MC_SIGMA_FLAG_LIMIT)) own.push(MC_SIGMA_FLAG);
      return {
        ...p,
        dosePerMuCGy: dose,
        sigmaDosePerMuCGy: sigma,
        flags: [...own, ...tableFlags(w?.flags ?? []).filter((f) => !own.includes(f))],
      };
    }),
  };
}

export { MONTE_CARLO_METHOD_ID };
