// The compute worker's API: plain functions over structured-cloneable data. No worker globals
// here, so tests call it through comlink over a MessageChannel and the CLI calls it directly.
import { calculateCase, type CalcOptions, type CalcReport } from './calculateCase';
import { validateCase } from '../io/caseFile';
import { makeSlabPhantom, radiologicalDepthCurve } from '../engine/phantom/slabPhantom';
import { depthGridCm } from './depthGrid';
import { waterChainsOf } from './calculatePlan';
import { monteCarloCalibration, type McCalibration } from './monteCarloCalibration';
import type { DosePerMuFactors } from '../engine/check/dosePerMu';
import type { LayerSpec } from '../engine/phantom/slabPhantom';
import {
  buildMeasuredWaterData,
  type MeasuredTableInput,
  type MeasuredTableSummary,
} from '../engine/beam/measuredTable';
import type { TypeAVariants } from './typeAForCase';
import { ssdCmOf } from '../engine/beam/geometry';
import { modelledWaterData } from '../engine/beam/modelledBeam';
import {
  typeBDosePlane,
  type DosePlane,
  type DosePlaneOptions,
} from '../engine/superposition/typeBMethods';

/**
 * Calculation options that cross the worker boundary: plain data only. The water table travels as
 * CSV text and is rebuilt into WaterData inside the worker.
 */
export interface WorkerCalcOptions extends Omit<CalcOptions, 'waterData' | 'typeA'> {
  waterTable?: MeasuredTableInput;
  /** 'modelled': the modelled beam of the case's energy, in place of any table (page choice). */
  waterSource?: 'case' | 'modelled';
  typeA?: Pick<
    TypeAVariants,
    'bathoTable' | 'etarRhoTilde' | 'etarScatterLengthCm' | 'doseToMedium' | 'etarKnotStepCm'
  >;
}

export interface RadiologicalCurve {
  depthCm: number[];
  radiologicalDepthCm: number[];
}

export const computeApi = {
  /** Radiological depth against geometric depth through a layer stack. */
  radiologicalDepthCurve(layers: LayerSpec[], stepCm = 0.05): RadiologicalCurve {
    const phantom = makeSlabPhantom(layers);
    const grid = depthGridCm(phantom.totalThicknessCm, stepCm);
    return {
      depthCm: grid,
      radiologicalDepthCm: Array.from(radiologicalDepthCurve(phantom, grid)),
    };
  },
  /** Validate and calculate a case; invalid input comes back as problems, never as a throw. */
  calculate(
    raw: unknown,
    options: WorkerCalcOptions = {},
  ):
    | { ok: true; report: CalcReport }
    | { ok: false; problems: { path: string; message: string }[] } {
    const v = validateCase(raw);
    if (!v.ok) return v;
    const { waterTable, waterSource, ...rest } = options;
    if (waterSource === 'modelled')
      return {
        ok: true,
        report: calculateCase(v.value, {
          ...rest,
          waterData: modelledWaterData(v.value.beam.energy),
        }),
      };
    if (!waterTable) return { ok: true, report: calculateCase(v.value, rest) };
    const table = buildMeasuredWaterData(waterTable);
    if (!table.ok)
      return {
        ok: false,
        problems: table.problems.map((message) => ({ path: 'waterTable', message })),
      };
    return { ok: true, report: calculateCase(v.value, { ...rest, waterData: table.waterData }) };
  },
  /**
   * The x–z dose plane (y = 0) and lateral profiles of a case from a type-B engine (default the
   * superposition), in cGy/MU; lateral profiles at the case's point depths unless given.
   */
  dosePlane(
    raw: unknown,
    options: DosePlaneOptions = {},
  ): { ok: true; plane: DosePlane } | { ok: false; problems: { path: string; message: string }[] } {
    const v = validateCase(raw);
    if (!v.ok) return v;
    const c = v.value;
    const beam = {
      ssdCm: ssdCmOf(c.beam.setup),
      fieldXCm: c.beam.fieldXCm,
      fieldYCm: c.beam.fieldYCm,
    };
    const profileDepthsCm = options.profileDepthsCm ?? c.points.map((p) => p.depthCm);
    return {
      ok: true,
      plane: typeBDosePlane(c.beam.energy, makeSlabPhantom(c.layers), beam, {
        ...options,
        profileDepthsCm,
      }),
    };
  },
  /**
   * The water dose-per-MU factor chain at each point of a case (for the check's record), from the
   * modelled beam ('modelled') or the case's own table.
   */
  waterChains(
    raw: unknown,
    options: { waterSource?: 'case' | 'modelled' } = {},
  ):
    | { ok: true; chains: Record<string, DosePerMuFactors> }
    | { ok: false; problems: { path: string; message: string }[] } {
    const v = validateCase(raw);
    if (!v.ok) return v;
    const waterData =
      options.waterSource === 'modelled' ? modelledWaterData(v.value.beam.energy) : undefined;
    return { ok: true, chains: waterChainsOf(v.value, waterData ? { waterData } : {}) };
  },
  /** Reference dose rate, S_c and d_max that tie the page's Monte Carlo run to MU. */
  monteCarloCalibration(
    raw: unknown,
    waterSource?: string,
  ):
    | { ok: true; calibration: McCalibration }
    | { ok: false; problems: { path: string; message: string }[] } {
    const v = validateCase(raw);
    if (!v.ok) return v;
    return { ok: true, calibration: monteCarloCalibration(v.value, waterSource) };
  },
  /** Validate a measured TMR/PDD table (and scatter factors): problems, or a summary with plot data. */
  parseWaterTable(
    input: MeasuredTableInput,
  ): { ok: true; summary: MeasuredTableSummary } | { ok: false; problems: string[] } {
    const r = buildMeasuredWaterData(input);
    return r.ok ? { ok: true, summary: r.summary } : r;
  },
};

export type ComputeApi = typeof computeApi;
