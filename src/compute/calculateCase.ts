// One calculation of a case: geometry, radiological depths and every requested method, in a
// plain serialisable report. Runs unchanged in a worker, on the main thread and in Node.
import { ssdCmOf, fieldAtDepthCm, equivalentSquareCm } from '../engine/beam/geometry';
import { getMaterial } from '../engine/materials/materialLibrary';
import {
  layerIndexAtDepth,
  makeSlabPhantom,
  radiologicalDepthCm,
  type SlabPhantom,
} from '../engine/phantom/slabPhantom';
import type { MethodResult } from '../engine/methodResult';
import type { LaminaCase } from '../io/caseSchema';
import { withWarningFlags, type Warning } from '../engine/equilibrium';
import { caseWarnings } from './caseWarnings';
import type { WaterData } from '../engine/beam/waterData';
import { isTypeAMethodId, typeAForCase, type TypeAVariants } from './typeAForCase';
import { MONTE_CARLO_METHOD_ID, monteCarloForCase, type McCalcOptions } from './monteCarloForCase';
import { isTypeBMethodId, typeBForCase } from './typeBForCase';
import { CAUTIONS } from './reportText';
import { depthGridCm } from './depthGrid';

export const CALC_FORMAT = 'lamina.calc';
export const CALC_VERSION = 1;

export interface CalcOptions {
  /** Method ids to compute; all available when absent. */
  methods?: readonly string[];
  /** Depth step of the curves (cm). */
  depthStepCm?: number;
  /** Water data for the type-A methods; the case's inline table when absent. */
  waterData?: WaterData;
  /** Type-A variants (Batho TAR/TMR, ETAR ρ̃ or weights, dose to medium). */
  typeA?: TypeAVariants;
  /** Monte Carlo histories and seed; the monte-carlo method runs only when given. */
  mc?: McCalcOptions;
}

export interface CalcReport {
  format: typeof CALC_FORMAT;
  version: typeof CALC_VERSION;
  caseName: string;
  beam: {
    energy: string;
    setup: string;
    ssdCm: number;
    fieldXCm: number;
    fieldYCm: number;
    equivalentSquareAtSurfaceCm: number;
  };
  layers: {
    index: number;
    materialId: string;
    material: string;
    thicknessCm: number;
    topCm: number;
    bottomCm: number;
    densityGPerCm3: number;
    relativeElectronDensity: number;
  }[];
  points: { id: string; depthCm: number; radiologicalDepthCm: number; layerIndex: number }[];
  /** Depth grid shared by all curves (cm). */
  depthCm: number[];
  /** Radiological depth on that grid (cm). */
  radiologicalDepthCm: number[];
  methods: MethodResult[];
  /** Method ids that were asked for but are not available, with the reason. */
  unavailable: { id: string; reason: string }[];
  /** Equilibrium and validity warnings (src/engine/equilibrium), sorted by depth. */
  warnings: Warning[];
  cautions: string[];
}

export function phantomOfCase(c: LaminaCase): SlabPhantom {
  return makeSlabPhantom(c.layers);
}

export function calculateCase(c: LaminaCase, options: CalcOptions = {}): CalcReport {
  const phantom = phantomOfCase(c);
  const ssdCm = ssdCmOf(c.beam.setup);
  const step = options.depthStepCm ?? 0.05;
  const grid = depthGridCm(phantom.totalThicknessCm, step);
  const requested = options.methods ?? [];
  const typeA = typeAForCase(c, phantom, grid, options.methods, options.waterData, options.typeA);
  const mc = monteCarloForCase(c, grid, options.methods, options.mc, typeA.waterData);
  const typeB = typeBForCase(c, phantom, grid, options.methods);
  const unavailable = [
    ...typeA.unavailable,
    ...mc.unavailable,
    ...requested
      .filter((id) => id !== MONTE_CARLO_METHOD_ID)
      .filter((id) => !isTypeAMethodId(id) && !isTypeBMethodId(id))
      .map((id) => ({ id, reason: `unknown method id "${id}"` })),
  ];
  const methods = [...typeA.methods, ...typeB, ...mc.methods];
  const warnings = caseWarnings(c, phantom, methods, typeA.waterData);
  return {
    format: CALC_FORMAT,
    version: CALC_VERSION,
    caseName: c.name,
    beam: {
      energy: c.beam.energy,
      setup:
        c.beam.setup.kind === 'SSD'
          ? `SSD ${c.beam.setup.ssdCm} cm`
          : `SAD ${c.beam.setup.sadCm} cm, isocentre at ${c.beam.setup.isocentreDepthCm} cm`,
      ssdCm,
      fieldXCm: c.beam.fieldXCm,
      fieldYCm: c.beam.fieldYCm,
      equivalentSquareAtSurfaceCm: equivalentSquareCm(
        fieldAtDepthCm(c.beam.fieldXCm, ssdCm, 0),
        fieldAtDepthCm(c.beam.fieldYCm, ssdCm, 0),
      ),
    },
    layers: phantom.layers.map((l, index) => ({
      index,
      materialId: l.materialId,
      material: getMaterial(l.materialId).label,
      thicknessCm: l.thicknessCm,
      topCm: l.topCm,
      bottomCm: l.bottomCm,
      densityGPerCm3: l.densityGPerCm3,
      relativeElectronDensity: l.relativeElectronDensity,
    })),
    points: c.points.map((p) => ({
      id: p.id,
      depthCm: p.depthCm,
      radiologicalDepthCm: radiologicalDepthCm(phantom, p.depthCm),
      layerIndex: layerIndexAtDepth(phantom, p.depthCm),
    })),
    depthCm: grid,
    radiologicalDepthCm: grid.map((d) => radiologicalDepthCm(phantom, d)),
    // Each method's points carry the flags of the warnings that concern that method there.
    methods: withWarningFlags(methods, warnings),
    unavailable,
    warnings,
    cautions: [...CAUTIONS],
  };
}
