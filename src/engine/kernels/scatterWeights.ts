// Kernel-based layer weights for the ETAR effective density: the share of the scatter dose at a
// point P that comes from each layer, computed in water (the ETAR idea of Sontag & Cunningham,
// 1978, from memory; weights from the scatter part of the point kernel instead of CT slice
// weights):
//   w_m ∝ ∫_{layer m} T_w(z′) · ∫∫_field h_scatter(z_P − z′, x′, y′) dx′ dy′ dz′,  Σ w_m = 1
// T_w is the beam's water TERMA (parallel beam, per energy bin); the field is the square of side
// s at the depth of P. The effective density is then ρ̃ = Σ w_m ρ_e,m.
import type { BeamEnergy } from '../beam/energies';
import { waterPhantom, type SlabPhantom } from '../phantom/slabPhantom';
import { typeBModel } from '../superposition/beamModel';
import { cylinderAt } from './cylinderCumulative';
import { quadrantFromRadial } from './quadrant';
import { termaAlongRay } from './terma';

/** Scatter-dose weight of each layer for a point at `pointDepthCm` and a square field (Σ = 1). */
export function etarScatterWeights(
  energy: BeamEnergy,
  phantom: SlabPhantom,
  pointDepthCm: number,
  fieldSideCm: number,
  cellStepCm = 0.2,
): Float64Array {
  const model = typeBModel(energy);
  const q = model.cylinder('scatter');
  const half = 0.5 * fieldSideCm;
  const weights = new Float64Array(phantom.layers.length);
  const water = waterPhantom(phantom.totalThicknessCm);
  phantom.layers.forEach((layer, m) => {
    const n = Math.max(1, Math.ceil(layer.thicknessCm / cellStepCm - 1e-9));
    const centres = Float64Array.from(
      { length: n },
      (_, i) => layer.topCm + ((i + 0.5) * layer.thicknessCm) / n,
    );
    const terma = termaAlongRay(water, model.spectrum, centres, { ssdCm: Infinity });
    let sum = 0;
    for (let i = 0; i < n; i++) {
      const a = layer.topCm + (i * layer.thicknessCm) / n;
      const b = layer.topCm + ((i + 1) * layer.thicknessCm) / n;
      const hi = pointDepthCm - a;
      const lo = pointDepthCm - b;
      const radial = (s: number) => cylinderAt(q, hi, s) - cylinderAt(q, lo, s);
      sum += (terma[i] as number) * 4 * quadrantFromRadial(radial, half, half);
    }
    weights[m] = sum;
  });
  const total = weights.reduce((x, y) => x + y, 0);
  for (let m = 0; m < weights.length; m++) weights[m] = (weights[m] as number) / total;
  return weights;
}

/** ETAR effective relative electron density ρ̃ = Σ w_m ρ_e,m with the kernel weights above. */
export function etarWeightedDensity(
  energy: BeamEnergy,
  phantom: SlabPhantom,
  pointDepthCm: number,
  fieldSideCm: number,
): number {
  const w = etarScatterWeights(energy, phantom, pointDepthCm, fieldSideCm);
  return phantom.layers.reduce((s, l, m) => s + (w[m] as number) * l.relativeElectronDensity, 0);
}
