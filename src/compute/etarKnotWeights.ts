// A cheap stand-in for ETAR's kernel layer weights during a boundary drag (preview only): the
// exact weights at knot depths (the surface, every interface, the bottom, and points at most
// `knotStepCm` apart inside each layer), linear in depth between knots. The field side at a knot
// follows the beam's divergence from the side asked for. The full calculation and its point
// values always use the exact weights; this approximation is labelled in the method's variant.
import type { ScatterWeightFunction } from '../engine/corrections/correctionTypes';
import type { SlabPhantom } from '../engine/phantom/slabPhantom';

/** Knot depths (cm): surface, interfaces and bottom, with each layer cut into ≤ knotStepCm parts. */
export function knotDepthsCm(phantom: SlabPhantom, knotStepCm: number): number[] {
  const out = [0];
  for (const layer of phantom.layers) {
    const n = Math.max(1, Math.ceil(layer.thicknessCm / knotStepCm - 1e-9));
    for (let i = 1; i <= n; i++) out.push(layer.topCm + (i * layer.thicknessCm) / n);
  }
  return out;
}

interface Knots {
  depthCm: number[];
  weights: (Float64Array | undefined)[];
}

/**
 * `exact` evaluated only at knots (each knot once per phantom), interpolated linearly in depth.
 * `ssdCm`: source–surface distance, to carry the field side from the asked depth to a knot's.
 */
export function knotInterpolatedWeights(
  exact: ScatterWeightFunction,
  ssdCm: number,
  knotStepCm: number,
): ScatterWeightFunction {
  const cache = new WeakMap<SlabPhantom, Knots>();
  return (phantom, pointDepthCm, sideAtDepthCm) => {
    let k = cache.get(phantom);
    if (!k) {
      const depthCm = knotDepthsCm(phantom, knotStepCm);
      k = { depthCm, weights: depthCm.map(() => undefined) };
      cache.set(phantom, k);
    }
    const knots = k;
    const at = (i: number): Float64Array => {
      const cached = knots.weights[i];
      if (cached) return cached;
      const z = knots.depthCm[i]!;
      const side = (sideAtDepthCm * (ssdCm + z)) / (ssdCm + pointDepthCm);
      const w = exact(phantom, z, side);
      knots.weights[i] = w;
      return w;
    };
    const d = knots.depthCm;
    const z = Math.min(Math.max(pointDepthCm, 0), d[d.length - 1]!);
    let hi = 1;
    while (hi < d.length - 1 && d[hi]! < z) hi++;
    const lo = hi - 1;
    const t = d[hi]! > d[lo]! ? (z - d[lo]!) / (d[hi]! - d[lo]!) : 0;
    const w0 = at(lo);
    const w1 = at(hi);
    const out = new Float64Array(w0.length);
    for (let m = 0; m < out.length; m++) out[m] = (1 - t) * w0[m]! + t * w1[m]!;
    return out;
  };
}
