// One calculation of a case: geometry, radiological depths and every requested method, in a
// plain serialisable report. Runs unchanged in a worker, on the main thread and in Node.
// The deterministic methods (computeCaseParts) and a Monte Carlo run are assembled into the
// report by one function (assembleReport), which also puts every method in the calculation's dose
// convention, raises the warnings and puts their flags on every method's points: the CLI's Monte
// Carlo and the page's worker-pool run go through it alike.
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
import { withWarningFlags } from '../engine/equilibrium';
import { caseWarnings } from './caseWarnings';
import type { WaterData } from '../engine/beam/waterData';
import { isTypeAMethodId, typeAForCase, type TypeAVariants } from './typeAForCase';
import { isTypeBMethodId, typeBForCase } from './typeBForCase';
import { CALC_FORMAT, CALC_VERSION, CAUTIONS, type CalcReport } from '../contract/reports';
import { resolveWater } from './waterSource';
import {
  calibratedMonteCarloMethod,
  monteCarloCalibration,
  monteCarloRunOptions,
  MONTE_CARLO_METHOD_ID,
  type McRunOutput,
} from './monteCarloCalibration';
import { runMonteCarlo } from '../engine/montecarlo/runMonteCarlo';
import type { McCaseInput, McOptions } from '../engine/montecarlo/monteCarloPlan';
import type { McResult } from '../engine/montecarlo/monteCarloResult';
import { convertMethodDose } from '../engine/dose/doseConversion';
import { doseQuantityLabel as doseToLabel, type DoseQuantity } from '../engine/dose/doseQuantity';
import { resolveDoseTo } from './doseConvention';
import { depthGridCm } from './depthGrid';

export { CALC_FORMAT, CALC_VERSION, CAUTIONS, type CalcReport };

/** Runs a whole Monte Carlo case; any runner gives the result of runMonteCarlo for the same inputs. */
export type McRunner = (
  c: McCaseInput,
  options: McOptions,
  depthGridCm: readonly number[],
) => McResult;

export interface McCalcOptions {
  histories: number;
  seed: number;
  /**
   * Who runs the batches (default: runMonteCarlo, in this thread). In-process callers only: the
   * command line passes its threaded runner (src/cli/mcThreads.ts); the page runs its Monte Carlo
   * in the worker pool (mcPool.ts) and never sends one.
   */
  runner?: McRunner;
}

export interface CalcOptions {
  /** Method ids to compute; all available when absent. */
  methods?: readonly string[];
  /** Depth step of the curves (cm). */
  depthStepCm?: number;
  /** Water data resolved by the caller (src/compute/waterSource); the case's own source when absent. */
  waterData?: WaterData;
  /** Type-A variants (Batho TAR/TMR, ETAR ρ̃ or weights). */
  typeA?: TypeAVariants;
  /** Monte Carlo histories and seed; the monte-carlo method runs only when given. */
  mc?: McCalcOptions;
  /** Dose to water or dose to medium, for every method (default: the case's own, else water). */
  doseTo?: DoseQuantity;
}

export function phantomOfCase(c: LaminaCase): SlabPhantom {
  return makeSlabPhantom(c.layers);
}

export { depthGridCm };

/** The deterministic part of a case calculation, before warnings: reused for Monte Carlo merges. */
export interface CaseParts {
  case: LaminaCase;
  phantom: SlabPhantom;
  grid: number[];
  requested: readonly string[] | undefined;
  /** Type-A and type-B results, without warning flags. */
  methods: MethodResult[];
  typeAUnavailable: { id: string; reason: string }[];
  waterData: WaterData | undefined;
  /** The water method on the grid (for the measured-table Monte Carlo), computed or not asked. */
  water: MethodResult | undefined;
}

export function computeCaseParts(c: LaminaCase, options: CalcOptions = {}): CaseParts {
  const phantom = phantomOfCase(c);
  const grid = depthGridCm(phantom.totalThicknessCm, options.depthStepCm ?? 0.05);
  const resolution = options.waterData ? null : resolveWater(c);
  const resolved = options.waterData ?? (resolution?.ok ? resolution.waterData : undefined);
  const typeA = typeAForCase(c, phantom, grid, options.methods, resolved, options.typeA);
  const typeB = typeBForCase(c, phantom, grid, options.methods);
  const asked = (id: string) => !options.methods || options.methods.includes(id);
  let water = typeA.methods.find((m) => m.id === 'water');
  if (!water && asked(MONTE_CARLO_METHOD_ID) && resolved)
    water = typeAForCase(c, phantom, grid, ['water'], resolved).methods[0];
  return {
    case: c,
    phantom,
    grid,
    requested: options.methods,
    methods: [...typeA.methods, ...typeB],
    typeAUnavailable: typeA.unavailable,
    waterData: typeA.waterData,
    water,
  };
}

/**
 * The report of a case: its deterministic methods converted to the dose convention `doseTo`
 * (src/engine/dose/doseConversion.ts; the parts stay native, so a change of convention reuses
 * them) plus a Monte Carlo run (calibrated here, once, for every caller; a run is made in one
 * convention, monteCarloRunOptions), the warnings of them all and each method's flags.
 */
export function assembleReport(
  parts: CaseParts,
  mc: { run: McRunOutput; note?: string | null } | { unavailable: string } | null,
  doseTo: DoseQuantity,
): CalcReport {
  const c = parts.case;
  const { phantom, grid } = parts;
  const ssdCm = ssdCmOf(c.beam.setup);
  const requested = parts.requested ?? [];
  const methods = parts.methods.map((m) => convertMethodDose(m, doseTo, phantom, c.beam.energy));
  const mcUnavailable: { id: string; reason: string }[] = [];
  const runDoseTo = mc && 'run' in mc ? mc.run.method.dose?.quantity : undefined;
  if (mc && 'run' in mc && runDoseTo !== doseTo)
    mcUnavailable.push({
      id: MONTE_CARLO_METHOD_ID,
      reason: `the run reports ${runDoseTo ? doseToLabel(runDoseTo) : 'an unstated dose'}, not ${doseToLabel(doseTo)}: run it again`,
    });
  else if (mc && 'run' in mc) {
    const calibration = monteCarloCalibration(c, parts.waterData);
    const m = calibratedMonteCarloMethod(
      calibration,
      mc.run,
      parts.water,
      parts.waterData?.source ?? 'no water data',
    );
    methods.push(mc.note ? { ...m, label: `${m.label} (${mc.note})` } : m);
  } else if (mc) mcUnavailable.push({ id: MONTE_CARLO_METHOD_ID, reason: mc.unavailable });
  const unavailable = [
    ...parts.typeAUnavailable,
    ...mcUnavailable,
    ...requested
      .filter((id) => id !== MONTE_CARLO_METHOD_ID)
      .filter((id) => !isTypeAMethodId(id) && !isTypeBMethodId(id))
      .map((id) => ({ id, reason: `unknown method id "${id}"` })),
  ];
  const warnings = caseWarnings(c, phantom, methods, parts.waterData);
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
    doseTo,
  };
}

/**
 * Run the Monte Carlo of a case in this process (CLI, tests: in this thread, or on the runner's
 * threads), calibrated for its water data, in the dose convention `doseTo`.
 */
export function runMonteCarloForCase(
  parts: CaseParts,
  mc: McCalcOptions,
  doseTo: DoseQuantity,
): McRunOutput {
  const calibration = monteCarloCalibration(parts.case, parts.waterData);
  const run = mc.runner ?? runMonteCarlo;
  return run(
    parts.case,
    monteCarloRunOptions(calibration, { histories: mc.histories, seed: mc.seed, doseTo }),
    parts.grid,
  );
}

/** The Monte Carlo block asked of a case: a run, the reason it is not there, or nothing. */
export function monteCarloBlock(
  parts: CaseParts,
  mc: McCalcOptions | undefined,
  doseTo: DoseQuantity,
) {
  const asked = parts.requested ? parts.requested.includes(MONTE_CARLO_METHOD_ID) : true;
  if (!asked) return null;
  if (!mc)
    return parts.requested
      ? { unavailable: 'needs a number of histories (--mc-histories N)' }
      : null;
  return { run: runMonteCarloForCase(parts, mc, doseTo) };
}

export function calculateCase(c: LaminaCase, options: CalcOptions = {}): CalcReport {
  const doseTo = resolveDoseTo(options.doseTo, c.check?.doseTo);
  const parts = computeCaseParts(c, options);
  return assembleReport(parts, monteCarloBlock(parts, options.mc, doseTo), doseTo);
}
