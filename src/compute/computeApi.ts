// The compute worker's API: plain functions over structured-cloneable data. No worker globals
// here, so tests call it through comlink over a MessageChannel and the CLI calls it directly.
import { calculateCase, type CalcOptions, type CalcReport } from './calculateCase';
import { validateCase } from '../io/caseFile';
import { makeSlabPhantom, radiologicalDepthCurve } from '../engine/phantom/slabPhantom';
import { depthGridCm } from './calculateCase';
import type { LayerSpec } from '../engine/phantom/slabPhantom';

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
    options: CalcOptions = {},
  ):
    | { ok: true; report: CalcReport }
    | { ok: false; problems: { path: string; message: string }[] } {
    const v = validateCase(raw);
    if (!v.ok) return v;
    return { ok: true, report: calculateCase(v.value, options) };
  },
};

export type ComputeApi = typeof computeApi;
