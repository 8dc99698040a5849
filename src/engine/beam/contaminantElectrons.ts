// Contaminant electrons of the modelled beams: electrons (and the low-energy photons scattered in
// the head and air) that a phantom-only photon model misses, which set the surface dose and the
// shape of the build-up. The classic empirical term, exponential in depth and proportional to a
// field-size factor (Nilsson & Brahme; Ahnesjö & Andreo, PMB 34, 1451 (1989) for the form — from
// memory), added to the photon dose of both type-B engines:
//   D_ce(x, z) = R_ph · c₁₀ · g(s) · exp(−κ·d′(z)) · (100/(SSD + z))² · (ρ_e/ρ)(z) · L(x)
// R_ph: the engine's photon dose at its own reference point (10 × 10 at 100 cm, SSD 100, photon
// d_max), so c₁₀ is the contaminant dose at the surface of a 10 × 10 field as a fraction of the
// photon dose at d_max; d′: radiological depth (electrons slow down per g/cm²); κ = k/E_max,
// one constant k for every beam (MeV·cm²/g; the range of the contaminant electrons grows with the
// beam's end-point energy E_max); g(s) = (1 − e^(−s/λ))/(1 − e^(−10/λ)) of the equivalent square
// s at 100 cm (surface dose rises almost linearly with field side up to 20 × 20 and flattens
// beyond); L(x): the lateral shape across the field, the field at depth blurred by a Gaussian of
// σ = 0.5 cm, normalised to 1 on the axis. c₁₀ per beam, k and λ are fitted by
// scripts/fitContaminantElectrons.ts to published surface doses and typical d_max, stored with
// their sources in src/engine/data/contaminantElectrons.json. The Monte Carlo launches the same
// electrons as particles (montecarlo/contaminantSource.ts).
import contaminationJson from '../data/contaminantElectrons.json';
import type { BeamEnergy } from './energies';
import { FIELD_DEFINITION_DISTANCE_CM } from './geometry';
import { layerIndexAtDepth, radiologicalDepthCm, type SlabPhantom } from '../phantom/slabPhantom';

export interface ContaminantElectronModel {
  /** Contaminant dose at the surface, 10 × 10, per photon dose at d_max (reference point). */
  surfaceFraction10: number;
  /** Depth coefficient κ (cm²/g): dose ∝ exp(−κ·d′). */
  depthCoefficientCm2PerG: number;
  /** Field-size length λ of g(s) (cm). */
  fieldLengthCm: number;
}

export interface ContaminantElectronFile {
  format: 'lamina.contaminantElectrons';
  version: number;
  source: string;
  method: string;
  /** k of κ = k/E_max (MeV·cm²/g). */
  depthConstantMeVCm2PerG: number;
  fieldLengthCm: number;
  lateralSigmaCm: number;
  beams: Record<
    BeamEnergy,
    {
      endPointMeV: number;
      surfaceFraction10: number;
      /** R_ph: the superposition's photon dose at its reference point (cm²/g per unit energy fluence); the Monte Carlo source needs it in absolute terms. */
      photonReferenceDoseCm2PerG: number;
      targets: string;
      result: string;
    }
  >;
}

export const CONTAMINANT_ELECTRONS = contaminationJson as unknown as ContaminantElectronFile;

/** The stored model of a beam. */
export function contaminantElectronModel(energy: BeamEnergy): ContaminantElectronModel {
  const b = CONTAMINANT_ELECTRONS.beams[energy];
  return {
    surfaceFraction10: b.surfaceFraction10,
    depthCoefficientCm2PerG: CONTAMINANT_ELECTRONS.depthConstantMeVCm2PerG / b.endPointMeV,
    fieldLengthCm: CONTAMINANT_ELECTRONS.fieldLengthCm,
  };
}

/** g(s): field-size factor of the contaminant dose, 1 at 10 × 10 (s at 100 cm). */
export function contaminantFieldFactor(model: ContaminantElectronModel, sideCm: number): number {
  const f = (s: number) => 1 - Math.exp(-s / model.fieldLengthCm);
  return f(sideCm) / f(10);
}

// erf by Abramowitz & Stegun 7.1.26 (|error| ≤ 1.5e-7).
function erf(x: number): number {
  const t = 1 / (1 + 0.3275911 * Math.abs(x));
  const y =
    1 -
    ((((1.061405429 * t - 1.453152027) * t + 1.421413741) * t - 0.284496736) * t + 0.254829592) *
      t *
      Math.exp(-x * x);
  return Math.sign(x) * y;
}

/** L(x)/L(0): the field of half-width h blurred by a Gaussian of σ, 1 on the axis. */
function lateralShape(xCm: number, halfCm: number, sigmaCm: number): number {
  const k = 1 / (Math.SQRT2 * sigmaCm);
  const at = (x: number) => erf((halfCm - x) * k) + erf((halfCm + x) * k);
  return at(xCm) / at(0);
}

export interface ContaminantBeam {
  ssdCm: number;
  fieldXCm: number;
  fieldYCm: number;
}

/**
 * Contaminant-electron dose in the units of the engine's photon dose (photon reference dose
 * `photonReferenceRaw` = R_ph) on depthsCm × lateralCm, index iz·nx + ix.
 * `equivalentSquareCm`: the field's equivalent square at 100 cm.
 */
export function contaminantElectronDose(
  model: ContaminantElectronModel,
  phantom: SlabPhantom,
  beam: ContaminantBeam,
  equivalentSquareCm: number,
  photonReferenceRaw: number,
  depthsCm: ArrayLike<number>,
  lateralCm: ArrayLike<number>,
): Float64Array {
  const nz = depthsCm.length;
  const nx = lateralCm.length;
  const out = new Float64Array(nz * nx);
  const amplitude =
    photonReferenceRaw *
    model.surfaceFraction10 *
    contaminantFieldFactor(model, equivalentSquareCm);
  for (let iz = 0; iz < nz; iz++) {
    const z = depthsCm[iz] as number;
    const layer = phantom.layers[layerIndexAtDepth(phantom, z)]!;
    const toMedium = layer.relativeElectronDensity / layer.densityGPerCm3;
    const divergence = Number.isFinite(beam.ssdCm)
      ? (beam.ssdCm + z) / FIELD_DEFINITION_DISTANCE_CM
      : 1;
    const inverseSquare = 1 / (divergence * divergence);
    const axis =
      amplitude *
      Math.exp(-model.depthCoefficientCm2PerG * radiologicalDepthCm(phantom, z)) *
      inverseSquare *
      toMedium;
    const half = 0.5 * beam.fieldXCm * divergence;
    for (let ix = 0; ix < nx; ix++)
      out[iz * nx + ix] =
        axis * lateralShape(lateralCm[ix] as number, half, CONTAMINANT_ELECTRONS.lateralSigmaCm);
  }
  return out;
}
