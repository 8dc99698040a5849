// A quick preview of a case while it is being edited: the fast methods (type A, with ETAR's kernel
// weights interpolated between knots, and the pencil beam) on a coarser grid, drawn at once, with
// the slower methods (superposition) carried over from the last full calculation and marked as updating until the full calculation of
// the new geometry arrives. The carried-over curves belong to the previous geometry: they are only
// drawn (dimmed), and a full report always replaces the preview.
import { lerp } from '../engine/units';
import type { MethodCurve, MethodResult } from '../engine/methodResult';
import type { CalcReport } from './calculateCase';
import { TYPE_A_METHOD_IDS } from '../engine/corrections/typeAMethodIds';

/** Methods that wait for the full calculation (superposition; Monte Carlo is never recomputed). */
export const SLOW_METHOD_IDS: readonly string[] = ['superposition', 'monte-carlo'];

/**
 * ETAR in the preview: exact kernel weights at knots at most this far apart (cm), linear between.
 * Against the exact weights on the 0.2 cm grid of the page's presets the CF differs by at most
 * 0.34 % (chest, rib, sinus, bone, water), at a fifth of the cost.
 */
export const PREVIEW_ETAR_KNOT_STEP_CM = 2;

/** Methods computed for the preview: every type-A method, and the pencil beam. */
export const PREVIEW_METHOD_IDS: readonly string[] = [
  ...TYPE_A_METHOD_IDS.filter((id) => !SLOW_METHOD_IDS.includes(id)),
  'pencil-beam',
];

/** Depth step of the preview curves (cm). */
export const PREVIEW_DEPTH_STEP_CM = 0.2;

/** Linear interpolation of (xs, ys) at x, held constant beyond the ends; null stays null. */
function sampleAt(xs: readonly number[], ys: readonly (number | null)[], x: number): number | null {
  const n = xs.length;
  if (n === 0) return null;
  if (x <= xs[0]!) return ys[0] ?? null;
  if (x >= xs[n - 1]!) return ys[n - 1] ?? null;
  let lo = 0;
  let hi = n - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (xs[mid]! <= x) lo = mid;
    else hi = mid;
  }
  const y0 = ys[lo];
  const y1 = ys[hi];
  if (y0 === null || y0 === undefined || y1 === null || y1 === undefined) return null;
  return lerp(x, xs[lo]!, xs[hi]!, y0, y1);
}

/** A curve resampled onto another depth grid (linear between samples, held beyond the ends). */
export function resampleCurve(curve: MethodCurve, depthCm: readonly number[]): MethodCurve {
  const at = (ys: readonly (number | null)[]) => depthCm.map((z) => sampleAt(curve.depthCm, ys, z));
  const out: MethodCurve = {
    depthCm: [...depthCm],
    dosePerMuCGy: at(curve.dosePerMuCGy),
    cf: at(curve.cf),
  };
  if (curve.sigmaDosePerMuCGy)
    out.sigmaDosePerMuCGy = at(curve.sigmaDosePerMuCGy).map((v) => v ?? 0);
  if (curve.sigmaCf) out.sigmaCf = at(curve.sigmaCf).map((v) => v ?? 0);
  return out;
}

export interface PreviewMerge {
  report: CalcReport;
  /** Ids of the methods carried over from the last full report (drawn as updating). */
  updatingIds: string[];
}

/**
 * The preview report with the last full report's other methods added, in the full report's order
 * (so colours stay put), resampled onto the preview grid and listed as updating.
 */
export function mergePreviewReport(preview: CalcReport, full: CalcReport | null): PreviewMerge {
  if (!full) return { report: preview, updatingIds: [] };
  const fresh = new Map(preview.methods.map((m) => [m.id, m]));
  const updatingIds: string[] = [];
  const methods: MethodResult[] = [];
  for (const m of full.methods) {
    const f = fresh.get(m.id);
    if (f) {
      methods.push(f);
      fresh.delete(m.id);
    } else {
      updatingIds.push(m.id);
      // Point values of the previous geometry are not shown as if they were current.
      const points = preview.points.map((p) => ({
        id: p.id,
        depthCm: p.depthCm,
        cf: null,
        dosePerMuCGy: null,
        flags: [],
      }));
      methods.push({ ...m, curve: resampleCurve(m.curve, preview.depthCm), points });
    }
  }
  methods.push(...fresh.values());
  return { report: { ...preview, methods }, updatingIds };
}
