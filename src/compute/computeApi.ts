// The compute worker's API: plain functions over structured-cloneable data. No worker globals
// here, so tests call it through comlink over a MessageChannel and the CLI calls the same
// functions directly. Calculations go through the one contract (src/compute/calcRequest.ts).
import { validateCase } from '../io/caseFile';
import { makeSlabPhantom, radiologicalDepthCurve } from '../engine/phantom/slabPhantom';
import { depthGridCm } from './depthGrid';
import type { LayerSpec } from '../engine/phantom/slabPhantom';
import type { MeasuredTableInput, MeasuredTableSummary } from '../engine/beam/measuredTable';
import { ssdCmOf } from '../engine/beam/geometry';
import {
  typeBDosePlane,
  type DosePlane,
  type DosePlaneOptions,
} from '../engine/superposition/typeBMethods';
import {
  calculateCaseRequest,
  calculatePlanRequest,
  prepareMonteCarlo,
} from './calculationService';
import { measuredTableOf } from './waterSource';
import { resolveDoseTo } from './doseConvention';
import { explainPointRequest } from './explainPoint';
import { cfSweepRequest } from './cfSweep';

export interface RadiologicalCurve {
  depthCm: number[];
  radiologicalDepthCm: number[];
}

export const computeApi = {
  /** A case for a purpose ('preview' or 'full'); invalid input comes back as problems, never as a throw. */
  calculateCase: calculateCaseRequest,
  /** A plan (or a case as a one-beam plan) with its point check (purpose 'plan'). */
  calculatePlan: calculatePlanRequest,
  /** Calibration, options and key of a Monte Carlo run of a case (purpose 'monte-carlo'). */
  prepareMonteCarlo,
  /** Every method's written-out factors at one depth of a case (the factor view). */
  explainPoint: explainPointRequest,
  /** CF at a point against density, field, energy or depth, every deterministic method. */
  cfSweep: cfSweepRequest,
  /** Radiological depth against geometric depth through a layer stack. */
  radiologicalDepthCurve(layers: LayerSpec[], stepCm = 0.05): RadiologicalCurve {
    const phantom = makeSlabPhantom(layers);
    const grid = depthGridCm(phantom.totalThicknessCm, stepCm);
    return {
      depthCm: grid,
      radiologicalDepthCm: Array.from(radiologicalDepthCurve(phantom, grid)),
    };
  },
  /**
   * The x–z dose plane (y = 0) and lateral profiles of a case from a type-B engine (default the
   * superposition), in cGy/MU; lateral profiles at the case's point depths unless given; in the
   * dose convention asked for, else the case's own, else dose to water (doseConvention.ts).
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
        doseTo: resolveDoseTo(options.doseTo, c.check?.doseTo),
      }),
    };
  },
  /** Validate a measured TMR/PDD table (and scatter factors): problems, or a summary with plot data. */
  parseWaterTable(
    input: MeasuredTableInput,
  ): { ok: true; summary: MeasuredTableSummary } | { ok: false; problems: string[] } {
    const r = measuredTableOf(input);
    return r.ok ? { ok: true, summary: r.summary } : r;
  },
};

export type ComputeApi = typeof computeApi;
