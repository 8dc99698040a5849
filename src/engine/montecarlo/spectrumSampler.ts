// Sampling photon energies from the beam spectra: a bin by its probability, then uniform within
// the bin. Spectra: Mohan, Chui & Lidofsky, Med. Phys. 12, 592 (1985) for 4, 6, 10, 15 MV (lower
// edge of the first bin 0); 18 MV a derived stand-in (approximate, with its fitted tuning
// applied by spectrumBins()); Co-60 in-beam spectrum (Rogers et al., NRC 1987/88; first bin
// starts at 0.01 MeV).
import type { BeamEnergy } from '../beam/energies';
import { spectrumBins } from '../kernels/spectrum';
import type { Rng } from './rng';

export interface SpectrumSampler {
  /** Bin edges (MeV), length bins + 1. */
  edgesMeV: Float64Array;
  /** Normalised cumulative probability at each bin's upper edge. */
  cumulative: Float64Array;
  /** Fluence-weighted mean energy (MeV). */
  meanEnergyMeV: number;
  approximate: boolean;
  source: string;
  sample(rng: Rng): number;
}

export function makeSpectrumSampler(energy: BeamEnergy): SpectrumSampler {
  // The same bins and (tuned) weights as the kernels and TERMA use.
  const bins = spectrumBins(energy);
  const weights = bins.weight;
  const n = weights.length;
  const edges = bins.edgesMeV;
  const total = weights.reduce((a, b) => a + b, 0);
  const cumulative = new Float64Array(n);
  let acc = 0;
  let mean = 0;
  for (let i = 0; i < n; i++) {
    const p = (weights[i] as number) / total;
    acc += p;
    cumulative[i] = acc;
    mean += (p * ((edges[i] as number) + (edges[i + 1] as number))) / 2;
  }
  cumulative[n - 1] = 1;
  return {
    edgesMeV: edges,
    cumulative,
    meanEnergyMeV: mean,
    approximate: bins.approximate,
    source: bins.source,
    sample(rng) {
      const xi = rng.next();
      let lo = 0;
      let hi = n - 1;
      while (lo < hi) {
        const mid = (lo + hi) >> 1;
        if (xi <= (cumulative[mid] as number)) hi = mid;
        else lo = mid + 1;
      }
      const a = edges[lo] as number;
      return a + ((edges[lo + 1] as number) - a) * rng.next();
    },
  };
}
