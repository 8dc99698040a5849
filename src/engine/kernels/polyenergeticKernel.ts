// Polyenergetic point kernel: the monoenergetic kernels weighted by each energy's share of the
// energy released, w_E ∝ Φ_E·E·(μ/ρ)(E) in water, Σ w = 1 (Mackie et al. 1988; Ahnesjö 1989,
// from memory). A spectrum bin between two kernel energies is split between them linearly in
// log E; below the lowest (above the highest) kernel energy it goes to that kernel.
import { muOverRhoCm2PerG } from '../materials/photonCoefficients';
import type { PointKernelTable } from './pointKernelTable';
import type { Spectrum } from './spectrum';

export interface MonoKernel extends PointKernelTable {
  energyMeV: number;
}

/** Weight of each monoenergetic kernel (same order as `kernels`, which ascend in energy). */
export function kernelWeights(kernels: readonly MonoKernel[], spectrum: Spectrum): Float64Array {
  const w = new Float64Array(kernels.length);
  const n = kernels.length;
  for (let i = 0; i < spectrum.energyMeV.length; i++) {
    const e = spectrum.energyMeV[i] as number;
    const released = (spectrum.energyFluenceFraction[i] as number) * muOverRhoCm2PerG('water', e);
    if (e <= kernels[0]!.energyMeV) {
      w[0] = (w[0] as number) + released;
      continue;
    }
    if (e >= kernels[n - 1]!.energyMeV) {
      w[n - 1] = (w[n - 1] as number) + released;
      continue;
    }
    let k = 0;
    while (kernels[k + 1]!.energyMeV < e) k++;
    const f =
      Math.log(e / kernels[k]!.energyMeV) /
      Math.log(kernels[k + 1]!.energyMeV / kernels[k]!.energyMeV);
    w[k] = (w[k] as number) + (1 - f) * released;
    w[k + 1] = (w[k + 1] as number) + f * released;
  }
  const sum = w.reduce((a, b) => a + b, 0);
  for (let k = 0; k < n; k++) w[k] = (w[k] as number) / sum;
  return w;
}

/** The weighted sum of monoenergetic kernels (all on the same bins) for a spectrum. */
export function polyenergeticKernel(
  kernels: readonly MonoKernel[],
  spectrum: Spectrum,
  label: string,
): PointKernelTable {
  const first = kernels[0];
  if (!first) throw new RangeError('polyenergeticKernel: no monoenergetic kernels');
  const w = kernelWeights(kernels, spectrum);
  const size = first.primary.length;
  const primary = new Float64Array(size);
  const scatter = new Float64Array(size);
  let escaped = 0;
  kernels.forEach((k, i) => {
    if (k.primary.length !== size || k.polarBins !== first.polarBins)
      throw new RangeError(`kernel ${k.label}: bins differ from ${first.label}`);
    const wi = w[i] as number;
    for (let b = 0; b < size; b++) {
      primary[b] = (primary[b] as number) + wi * (k.primary[b] as number);
      scatter[b] = (scatter[b] as number) + wi * (k.scatter[b] as number);
    }
    escaped += wi * k.escapedFraction;
  });
  return {
    label,
    radialEdgesCm: Float64Array.from(first.radialEdgesCm),
    polarBins: first.polarBins,
    primary,
    scatter,
    escapedFraction: escaped,
  };
}
