// The type-A block of a case calculation: which water data to use (given by the caller, else the
// case's inline table), which type-A methods were asked for, and their results or the reason they
// could not be computed.
import { ssdCmOf } from '../engine/beam/geometry';
import type { WaterData } from '../engine/beam/waterData';
import type {
  CorrectionOptions,
  ScatterWeightFunction,
} from '../engine/corrections/correctionTypes';
import { resolveWater } from './waterSource';
import { etarScatterWeights } from '../engine/kernels/scatterWeights';
import { knotInterpolatedWeights } from './etarKnotWeights';
import { TYPE_A_METHOD_IDS, TYPE_A_METHODS } from '../engine/corrections/typeAMethods';
import { typeAMethodResults, type TypeAGeometry } from '../engine/corrections/typeAResults';
import type { MethodResult } from '../engine/methodResult';
import type { SlabPhantom } from '../engine/phantom/slabPhantom';
import type { LaminaCase } from '../io/caseSchema';
import { NEEDS_WATER_DATA } from '../contract/reports';

export { NEEDS_WATER_DATA };

/**
 * ETAR's default layer weights: the scatter part of our own water kernel for the beam. TERMA is
 * taken as constant over 1 cm cells (the kernel part is integrated exactly per cell); against
 * 0.2 cm cells ρ̃ changes by < 5e-4 on the demo lung case, at a fifth of the cost.
 */
const ETAR_CELL_STEP_CM = 1;
function kernelEtarWeights(c: LaminaCase): ScatterWeightFunction {
  return (phantom, pointDepthCm, sideAtDepthCm) =>
    etarScatterWeights(c.beam.energy, phantom, pointDepthCm, sideAtDepthCm, ETAR_CELL_STEP_CM);
}

/**
 * Type-A variant choices; `etarKnotStepCm` (drag previews only) evaluates ETAR's kernel weights at
 * knots this far apart at most and interpolates between them (src/compute/etarKnotWeights). Dose
 * to medium is a calculation option (CalcOptions.doseTo), applied to every method alike.
 */
export type TypeAVariants = CorrectionOptions & { etarKnotStepCm?: number };

export interface TypeAOutcome {
  methods: MethodResult[];
  unavailable: { id: string; reason: string }[];
  /** The water data used, when there was any. */
  waterData?: WaterData;
}

export function isTypeAMethodId(id: string): boolean {
  return TYPE_A_METHOD_IDS.includes(id);
}

/**
 * The caller's water data, else the case's own source (src/compute/waterSource: its inline table,
 * else the modelled beam for the case's energy).
 */
export function waterDataForCase(c: LaminaCase, given?: WaterData): WaterData | undefined {
  if (given) return given;
  const r = resolveWater(c);
  return r.ok ? r.waterData : undefined;
}

/** The correction options of a case's type-A methods (ETAR's default kernel weights filled in). */
export function typeAOptionsForCase(
  c: LaminaCase,
  variants: TypeAVariants = {},
): CorrectionOptions {
  const { etarKnotStepCm, ...options } = variants;
  if (options.etarRhoTilde === undefined && !options.etarWeights) {
    options.etarWeights = kernelEtarWeights(c);
    options.etarWeightsSource = 'scatter part of the water kernel (our Monte Carlo)';
    if (etarKnotStepCm !== undefined && etarKnotStepCm > 0) {
      options.etarWeights = knotInterpolatedWeights(
        options.etarWeights,
        ssdCmOf(c.beam.setup),
        etarKnotStepCm,
      );
      options.etarWeightsSource += `, exact every ≤ ${etarKnotStepCm} cm and interpolated (preview)`;
    }
  }
  return options;
}

/**
 * Type-A results for a case on the report's depth grid. `requested` = method ids asked for
 * (undefined: all type-A methods).
 */
export function typeAForCase(
  c: LaminaCase,
  phantom: SlabPhantom,
  depthCm: readonly number[],
  requested: readonly string[] | undefined,
  givenWaterData?: WaterData,
  variants: TypeAVariants = {},
): TypeAOutcome {
  const options = typeAOptionsForCase(c, variants);
  const ids = requested ? requested.filter(isTypeAMethodId) : TYPE_A_METHOD_IDS;
  const waterData = waterDataForCase(c, givenWaterData);
  if (!waterData)
    return { methods: [], unavailable: ids.map((id) => ({ id, reason: NEEDS_WATER_DATA })) };
  const methods = TYPE_A_METHODS.filter((m) => ids.includes(m.id));
  const geometry = typeAGeometryOfCase(c, phantom, depthCm);
  return {
    methods: typeAMethodResults(methods, geometry, waterData, options),
    unavailable: [],
    waterData,
  };
}

/** The geometry the type-A methods of a case read: set-up, field and the case's points. */
export function typeAGeometryOfCase(
  c: LaminaCase,
  phantom: SlabPhantom,
  depthCm: readonly number[],
): TypeAGeometry {
  return {
    phantom,
    ssdCm: ssdCmOf(c.beam.setup),
    fieldXCm: c.beam.fieldXCm,
    fieldYCm: c.beam.fieldYCm,
    depthCm,
    points: c.points,
  };
}
