// Contaminant electrons of the Monte Carlo beam: the same model as the type-B engines use
// (beam/contaminantElectrons.ts), realised as particles. After each photon history, a divergent
// scenario launches on average p electrons along the central pencil (reciprocity scoring, as for
// the photons), with kinetic energies from an exponential spectrum truncated at the beam's
// end-point energy. Derivations (ours):
//  - spectrum: if each electron of energy E gives a dose roughly constant in depth down to its
//    half-value depth R₅₀ and R₅₀ ≈ E/2.33 cm per MeV in water (the electron-beam rule
//    E₀ = 2.33·R₅₀, from memory), a spectrum ∝ exp(−E/E₀) gives a depth dose ∝ P(R₅₀(E) > z) =
//    exp(−2.33·z/E₀); E₀ = 1/(0.429·κ) matches the engines' exp(−κ·d′);
//  - rate: the engines' contaminant dose integrates over depth to R_ph·c₁₀·g(s)/κ of energy per
//    unit energy fluence, so per photon of mean energy Ē_γ the electrons must bring
//    Ē_γ·R_ph·c₁₀·g(s)/κ: p = Ē_γ·R_ph·c₁₀·g(s)/(κ·Ē_e), Ē_e the mean of the spectrum.
// The shape follows exp(−κ·d′) only approximately (tests/validation/montecarloContaminantElectrons
// .test.ts states how well). Parallel (validation) scenarios have no contaminant electrons.
import {
  CONTAMINANT_ELECTRONS,
  contaminantElectronModel,
  contaminantFieldFactor,
} from '../beam/contaminantElectrons';
import { equivalentSquareCm } from '../beam/geometry';
import { makeSpectrumSampler } from './spectrumSampler';
import type { McScenario } from './scenario';
import type { Rng } from './rng';

/** Half-value depth per MeV of an electron in water, 1/2.33 (cm/MeV; see above). */
export const RANGE_PER_MEV_CM = 1 / 2.33;

export interface ContaminantSource {
  /** Mean number of electrons launched per photon history. */
  electronsPerPhoton: number;
  /** E₀ of the exponential spectrum (MeV). */
  spectrumMeV: number;
  /** Truncation of the spectrum: the beam's end-point energy (MeV). */
  endPointMeV: number;
  /** Mean kinetic energy of the truncated spectrum (MeV). */
  meanEnergyMeV: number;
}

/** Mean of exp(−E/E₀) on [0, E_max]. */
function truncatedMean(e0: number, eMax: number): number {
  const q = Math.exp(-eMax / e0);
  return e0 - (eMax * q) / (1 - q);
}

/** The contaminant-electron source of a scenario, or null (parallel beams, nothing to launch). */
export function contaminantSourceOf(scenario: McScenario): ContaminantSource | null {
  if (scenario.parallel) return null;
  const model = contaminantElectronModel(scenario.energy);
  const beam = CONTAMINANT_ELECTRONS.beams[scenario.energy];
  if (!(model.surfaceFraction10 > 0)) return null;
  const e0 = 1 / (RANGE_PER_MEV_CM * model.depthCoefficientCm2PerG);
  const eMax = beam.endPointMeV;
  const meanEnergyMeV = truncatedMean(e0, eMax);
  const side = equivalentSquareCm(scenario.fieldXCm, scenario.fieldYCm);
  const photonMeanMeV = makeSpectrumSampler(scenario.energy).meanEnergyMeV;
  const electronsPerPhoton =
    (photonMeanMeV *
      beam.photonReferenceDoseCm2PerG *
      model.surfaceFraction10 *
      contaminantFieldFactor(model, side)) /
    (model.depthCoefficientCm2PerG * meanEnergyMeV);
  return { electronsPerPhoton, spectrumMeV: e0, endPointMeV: eMax, meanEnergyMeV };
}

/** Kinetic energy from exp(−E/E₀) truncated to [0, E_max] (inverse of its cumulative). */
export function sampleContaminantEnergyMeV(source: ContaminantSource, rng: Rng): number {
  const q = 1 - Math.exp(-source.endPointMeV / source.spectrumMeV);
  return -source.spectrumMeV * Math.log(1 - rng.next() * q);
}
