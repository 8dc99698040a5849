// Beam spectra as energy bins: bin-centre energy, photon fraction and energy-fluence fraction.
// Data: src/engine/data/spectra.json (Mohan, Chui & Lidofsky 1985 for 4–15 MV; a derived,
// approximate 18 MV stand-in whose stored weights are tilted by its fitted tuning parameter,
// see spectrumTuning.ts; Rogers et al. in-beam Co-60 spectrum). Every reader of the spectra
// (kernels, TERMA, Monte Carlo sampler) goes through spectrumBins(), so the tuning is applied once.
import spectraJson from '../data/spectra.json';
import type { BeamEnergy } from '../beam/energies';
import { tiltedWeights, type SpectrumTuning } from './spectrumTuning';

export interface Spectrum {
  label: string;
  /** Bin-centre energies (MeV), ascending, empty bins dropped. */
  energyMeV: Float64Array;
  /** Photon-fluence fraction per bin, Σ = 1. */
  photonFraction: Float64Array;
  /** Energy-fluence fraction per bin (∝ Φ_E·E), Σ = 1. */
  energyFluenceFraction: Float64Array;
  source: string;
}

interface SpectrumJson {
  upperEdgeMeV: number[];
  probability?: number[];
  countsPerBin?: number[];
  firstLowerEdgeMeV?: number;
  source: string;
  tuning?: SpectrumTuning;
}

const SPECTRA = spectraJson as unknown as Record<string, SpectrumJson>;

const KEY: Record<BeamEnergy, string> = {
  'Co-60': 'Co60',
  '4MV': '4MV',
  '6MV': '6MV',
  '10MV': '10MV',
  '15MV': '15MV',
  '18MV': '18MV',
};

/** The spectrum of a beam as stored: contiguous bins, weights as in the data file. */
export interface SpectrumBins {
  /** Bin edges (MeV), ascending, length = bins + 1. */
  edgesMeV: Float64Array;
  /** Bin-centre energies (MeV). */
  centreMeV: Float64Array;
  /** Photon weight per bin (not normalised; empty bins kept). */
  weight: Float64Array;
  /** Not a published spectrum (derived stand-in). */
  approximate: boolean;
  /** The tuning applied by spectrumBins(), if the spectrum has one. */
  tuning: SpectrumTuning | null;
  source: string;
}

/** The bins and weights exactly as stored in the data file (no tuning applied). */
export function storedSpectrumBins(energy: BeamEnergy): SpectrumBins {
  const s = SPECTRA[KEY[energy]];
  if (!s) throw new RangeError(`no spectrum for ${energy}`);
  const weights = s.probability ?? s.countsPerBin ?? [];
  const n = s.upperEdgeMeV.length;
  if (weights.length !== n) throw new RangeError(`spectrum ${energy}: weights and bins differ`);
  const edgesMeV = new Float64Array(n + 1);
  edgesMeV[0] = s.firstLowerEdgeMeV ?? 0;
  for (let i = 0; i < n; i++) edgesMeV[i + 1] = s.upperEdgeMeV[i] as number;
  return {
    edgesMeV,
    centreMeV: Float64Array.from({ length: n }, (_, i) => {
      return 0.5 * ((edgesMeV[i] as number) + (edgesMeV[i + 1] as number));
    }),
    weight: Float64Array.from(weights),
    approximate: energy === '18MV',
    tuning: s.tuning ?? null,
    source: s.source,
  };
}

/** The bins of a beam with its stored tuning applied (the spectrum every engine uses). */
export function spectrumBins(energy: BeamEnergy): SpectrumBins {
  const stored = storedSpectrumBins(energy);
  if (!stored.tuning) return stored;
  return {
    ...stored,
    weight: tiltedWeights(stored.centreMeV, stored.weight, stored.tuning.betaPerMeV),
  };
}

/** A spectrum from bin-centre energies and photon weights (normalised here). */
export function spectrumFromBins(
  label: string,
  energyMeV: ArrayLike<number>,
  photonWeight: ArrayLike<number>,
  source: string,
): Spectrum {
  const e: number[] = [];
  const w: number[] = [];
  for (let i = 0; i < energyMeV.length; i++) {
    const wi = photonWeight[i] as number;
    if (wi > 0) {
      e.push(energyMeV[i] as number);
      w.push(wi);
    }
  }
  if (e.length === 0) throw new RangeError(`spectrum ${label}: no bin has a positive weight`);
  const photonSum = w.reduce((a, b) => a + b, 0);
  const energySum = w.reduce((a, b, i) => a + b * (e[i] as number), 0);
  return {
    label,
    energyMeV: Float64Array.from(e),
    photonFraction: Float64Array.from(w, (x) => x / photonSum),
    energyFluenceFraction: Float64Array.from(w, (x, i) => (x * (e[i] as number)) / energySum),
    source,
  };
}

/** A single-energy beam (used by tests and by the monoenergetic kernels). */
export function monoenergeticSpectrum(energyMeV: number): Spectrum {
  return spectrumFromBins(`${energyMeV} MeV`, [energyMeV], [1], 'monoenergetic');
}

/** The spectrum of a nominal beam energy, one entry per bin at the bin centre (tuning applied). */
export function beamSpectrum(energy: BeamEnergy): Spectrum {
  const b = spectrumBins(energy);
  return spectrumFromBins(energy, b.centreMeV, b.weight, b.source);
}
