// Sampling photon energies from the beam spectra: a bin by its probability, then uniform within
// the bin. Spectra: Mohan, Chui & Lidofsky, Med. Phys. 12, 592 (1985) for 4, 6, 10, 15 MV (lower
// edge of the first bin 0); 18 MV a derived stand-in (approximate); Co-60 in-beam spectrum
// (Rogers et al., NRC 1987/88; first bin starts at 0.01 MeV).
import spectra from '../data/spectra.json';
import type { BeamEnergy } from '../beam/energies';
import type { Rng } from './rng';

interface SpectrumJson {
  upperEdgeMeV: number[];
  probability?: number[];
  countsPerBin?: number[];
  firstLowerEdgeMeV?: number;
  source: string;
}

const SPECTRUM_KEY: Record<BeamEnergy, string> = {
  'Co-60': 'Co60',
  '4MV': '4MV',
  '6MV': '6MV',
  '10MV': '10MV',
  '15MV': '15MV',
  '18MV': '18MV',
};

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
  const s = (spectra as Record<string, SpectrumJson>)[SPECTRUM_KEY[energy]];
  if (!s) throw new RangeError(`no spectrum for ${energy}`);
  const weights = s.probability ?? s.countsPerBin ?? [];
  const n = s.upperEdgeMeV.length;
  const edges = new Float64Array(n + 1);
  edges[0] = s.firstLowerEdgeMeV ?? 0;
  for (let i = 0; i < n; i++) edges[i + 1] = s.upperEdgeMeV[i] as number;
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
    approximate: energy === '18MV',
    source: s.source,
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
