// TERMA (total energy released per unit mass) along a ray through a slab phantom, energy bin by
// energy bin, so beam hardening with depth is automatic:
//   T(z) = (100/(SSD + z))² · Σ_E Ψ_E · (μ/ρ)(E, medium) · exp(−Σ_layers μ(E, m)·t_m / cos α)
// (standard form; e.g. Papanikolaou et al., Med. Phys. 20, 1327 (1993)). Ψ_E is the spectrum's
// energy-fluence fraction at 100 cm from the source on the ray; α is the ray's angle to the
// central axis. The engine scales kernels by relative electron density, so TERMA is returned per
// water-equivalent gram: T_e = T·ρ/ρ_e (equal to T for anything of water's composition).
import { muOverRhoCm2PerG } from '../materials/photonCoefficients';
import { layerIndexAtDepth, type SlabPhantom } from '../phantom/slabPhantom';
import { FIELD_DEFINITION_DISTANCE_CM } from '../beam/geometry';
import type { Spectrum } from './spectrum';

export interface TermaOptions {
  /** Source-to-surface distance (cm); Infinity for a parallel beam (no inverse square). */
  ssdCm: number;
  /** Off-axis distance of the ray at 100 cm from the source (cm); 0 on the central axis. */
  offAxisAt100Cm?: number;
}

/**
 * TERMA per water-equivalent gram (cm²/g per unit energy fluence at 100 cm) at each depth,
 * written into `out`. Depths must lie inside the phantom.
 */
export function termaAlongRay(
  phantom: SlabPhantom,
  spectrum: Spectrum,
  depthsCm: ArrayLike<number>,
  options: TermaOptions,
  out: Float64Array = new Float64Array(depthsCm.length),
): Float64Array {
  const nE = spectrum.energyMeV.length;
  const layers = phantom.layers;
  const nL = layers.length;
  const off = options.offAxisAt100Cm ?? 0;
  const obliquity = Math.hypot(FIELD_DEFINITION_DISTANCE_CM, off) / FIELD_DEFINITION_DISTANCE_CM;
  // μ (1/cm) per layer and energy, and the attenuation exponent at each layer's top.
  const mu = new Float64Array(nL * nE);
  const muOverRho = new Float64Array(nL * nE);
  const exponentAtTop = new Float64Array((nL + 1) * nE);
  for (let m = 0; m < nL; m++) {
    const layer = layers[m]!;
    for (let e = 0; e < nE; e++) {
      const mr = muOverRhoCm2PerG(layer.materialId, spectrum.energyMeV[e] as number);
      muOverRho[m * nE + e] = mr;
      mu[m * nE + e] = mr * layer.densityGPerCm3;
      exponentAtTop[(m + 1) * nE + e] =
        (exponentAtTop[m * nE + e] as number) +
        mr * layer.densityGPerCm3 * layer.thicknessCm * obliquity;
    }
  }
  for (let k = 0; k < depthsCm.length; k++) {
    const z = depthsCm[k] as number;
    const m = layerIndexAtDepth(phantom, z);
    const layer = layers[m]!;
    const within = Math.min(Math.max(z - layer.topCm, 0), layer.thicknessCm) * obliquity;
    let sum = 0;
    for (let e = 0; e < nE; e++) {
      const exponent = (exponentAtTop[m * nE + e] as number) + (mu[m * nE + e] as number) * within;
      sum +=
        (spectrum.energyFluenceFraction[e] as number) *
        (muOverRho[m * nE + e] as number) *
        Math.exp(-exponent);
    }
    const inverseSquare = Number.isFinite(options.ssdCm)
      ? (FIELD_DEFINITION_DISTANCE_CM / (options.ssdCm + z)) ** 2
      : 1;
    out[k] = (sum * inverseSquare * layer.densityGPerCm3) / layer.relativeElectronDensity;
  }
  return out;
}
