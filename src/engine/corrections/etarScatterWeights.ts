// Default layer weights for ETAR's effective density ρ̃ (our design, not from the ETAR papers):
// W_j = ∫_layer j ∫∫_field k(r) dx dy dz with an isotropic exponential scatter kernel
// k(r) = e^(−r/λ)/(4πr²) centred on the point, the field taken as the disc of equal area at the
// point's depth. The lateral integral is closed-form, G(t) = ½[E₁(|t|/λ) − E₁(√(R² + t²)/λ)]
// (t = z − d), and the depth integral uses Gauss–Legendre quadrature (a u² substitution removes
// the logarithmic singularity at t = 0). Distances are geometric; layers downstream of the point
// count too (backscatter). A kernel-based weighting can replace this through the same signature.
import { layerIndexAtDepth, type SlabLayer, type SlabPhantom } from '../phantom/slabPhantom';
import { expIntegralE1 } from '../util/exponentialIntegral';
import type { ScatterWeightFunction } from './correctionTypes';

// 16-point Gauss–Legendre nodes and weights on [−1, 1] (Abramowitz & Stegun table 25.4).
const GL_X = [
  0.0950125098376374, 0.2816035507792589, 0.4580167776572274, 0.6178762444026438, 0.755404408355003,
  0.8656312023878318, 0.9445750230732326, 0.9894009349916499,
];
const GL_W = [
  0.1894506104550685, 0.1826034150449236, 0.1691565193950025, 0.1495959888165767,
  0.1246289712555339, 0.0951585116824928, 0.0622535239386479, 0.0271524594117541,
];

/** ∫_0^T G(t) dt for T > 0, with t = T·u² so the integrand is smooth in u. */
function integralFromPoint(tCm: number, radiusCm: number, lambdaCm: number): number {
  if (tCm < 1e-9) return 0; // the integrand is O(t ln t): nothing below a nanometre
  const g = (u: number) => {
    const t = tCm * u * u;
    const e = expIntegralE1(Math.sqrt(radiusCm * radiusCm + t * t) / lambdaCm);
    return 0.5 * (expIntegralE1(t / lambdaCm) - e) * 2 * tCm * u;
  };
  let sum = 0;
  for (let k = 0; k < GL_X.length; k++) {
    const dx = (GL_X[k] as number) * 0.5;
    sum += (GL_W[k] as number) * (g(0.5 + dx) + g(0.5 - dx));
  }
  return 0.5 * sum;
}

/** Radius (cm) of the disc with the area of a square field of this side: s/√π. */
export function equalAreaRadiusCm(sideCm: number): number {
  return sideCm / Math.sqrt(Math.PI);
}

/** Weights from the exponential scatter kernel with attenuation length λ (cm). */
export function exponentialKernelWeights(lambdaCm: number): ScatterWeightFunction {
  return (phantom: SlabPhantom, pointDepthCm: number, sideAtDepthCm: number) => {
    const radiusCm = equalAreaRadiusCm(sideAtDepthCm);
    const n = phantom.layers.length;
    const out = new Float64Array(n);
    const reach = 20 * lambdaCm;
    const pointLayer = layerIndexAtDepth(phantom, pointDepthCm);
    for (let j = 0; j < n; j++) {
      const layer = phantom.layers[j] as SlabLayer;
      const a = Math.max(layer.topCm - pointDepthCm, -reach);
      const b = Math.min(layer.bottomCm - pointDepthCm, reach);
      if (b <= a) continue;
      // ∫_a^b G = H(b) − H(a) with H odd, H(t) = sign(t)·∫_0^|t| G.
      const h = (t: number) => Math.sign(t) * integralFromPoint(Math.abs(t), radiusCm, lambdaCm);
      out[j] = h(b) - h(a);
    }
    if (out.every((w) => w === 0)) out[pointLayer] = 1;
    return out;
  };
}

/** ρ̃ = Σ W_j ρ_j / Σ W_j over the layers (relative electron densities). */
export function weightedDensity(phantom: SlabPhantom, weights: Float64Array): number {
  let num = 0;
  let den = 0;
  phantom.layers.forEach((l, j) => {
    const w = weights[j] as number;
    num += w * l.relativeElectronDensity;
    den += w;
  });
  return num / den;
}
