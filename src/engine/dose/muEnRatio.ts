// Mass energy-absorption ratio medium/water, (μ_en/ρ)_medium/(μ_en/ρ)_water, weighted by the
// beam's energy fluence, Σ ψ_E (μ_en/ρ)_m(E) / Σ ψ_E (μ_en/ρ)_w(E): the ratio of dose to medium
// to dose to water in the same photon fluence under charged-particle equilibrium (large-photon-
// detector ratio, Attix, from memory). Coefficients: NIST (Hubbell & Seltzer) via the material
// library. The primary spectrum at the surface is used (no hardening with depth).
import type { BeamEnergy } from '../beam/energies';
import { beamSpectrum, type Spectrum } from '../kernels/spectrum';
import type { MaterialId } from '../materials/materialLibrary';
import { muEnOverRhoCm2PerG } from '../materials/photonCoefficients';
import type { SlabLayer } from '../phantom/slabPhantom';

export function muEnRatioToWater(materialId: MaterialId, spectrum: Spectrum): number {
  let num = 0;
  let den = 0;
  for (let i = 0; i < spectrum.energyMeV.length; i++) {
    const e = spectrum.energyMeV[i] as number;
    const psi = spectrum.energyFluenceFraction[i] as number;
    num += psi * muEnOverRhoCm2PerG(materialId, e);
    den += psi * muEnOverRhoCm2PerG('water', e);
  }
  return num / den;
}

/** The per-layer ratio for a nominal beam, cached per material. */
export function muEnRatioOfLayerForBeam(energy: BeamEnergy): (layer: SlabLayer) => number {
  const spectrum = beamSpectrum(energy);
  const cache = new Map<MaterialId, number>();
  return (layer) => {
    let r = cache.get(layer.materialId);
    if (r === undefined) {
      r = muEnRatioToWater(layer.materialId, spectrum);
      cache.set(layer.materialId, r);
    }
    return r;
  };
}
