// Beam spectra as energy bins: bin-centre energy, photon fraction and energy-fluence fraction.
// Data: src/engine/data/spectra.json (Mohan, Chui & Lidofsky 1985 for 4–15 MV; a derived,
// approximate 18 MV stand-in; Rogers et al. in-beam Co-60 spectrum).
import spectraJson from '../data/spectra.json';
import type { BeamEnergy } from '../beam/energies';

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

/** The spectrum of a nominal beam energy, one entry per bin at the bin centre. */
export function beamSpectrum(energy: BeamEnergy): Spectrum {
  const s = SPECTRA[KEY[energy]];
  if (!s) throw new RangeError(`no spectrum for ${energy}`);
  const weights = s.probability ?? s.countsPerBin ?? [];
  const centres = s.upperEdgeMeV.map((upper, i) => {
    const lower = i === 0 ? (s.firstLowerEdgeMeV ?? 0) : (s.upperEdgeMeV[i - 1] as number);
    return 0.5 * (lower + upper);
  });
  return spectrumFromBins(energy, centres, weights, s.source);
}
