// Dose per MU from the two type-B engines: photon dose from the kernels plus the contaminant-
// electron term of the modelled beam (beam/contaminantElectrons.ts). Normalisation (ours): the
// dose per unit fluence of a case is divided by the same engine's water dose at d_max on the
// central axis for 10 × 10 cm² at SSD 100 cm (the calibration condition; d_max of the total
// dose), and multiplied by the modelled collimator-scatter factor S_c of the field and the
// reference dose rate (1 cGy/MU). Phantom scatter and inverse square follow from the kernels and
// the geometry.
import type { BeamEnergy } from '../beam/energies';
import { equivalentSquareCm } from '../beam/geometry';
import { modelledHeadScatter } from '../beam/headScatter';
import { contaminantElectronDose, contaminantElectronModel } from '../beam/contaminantElectrons';
import { waterPhantom, type SlabPhantom } from '../phantom/slabPhantom';
import { typeBModel } from './beamModel';
import { pencilBeamDose } from './pencilBeam';
import { superpositionDose, type SlabBeam, type SuperpositionOptions } from './slabSuperposition';

export type TypeBEngine = 'superposition' | 'pencil-beam';

/** Reference dose rate of the modelled beams at the calibration condition (cGy/MU). */
export const TYPE_B_REFERENCE_DOSE_PER_MU_CGY = 1;

/** Raw photon dose per unit energy fluence at 100 cm (cm²/g) from either engine (kernels only). */
export function typeBPhotonDose(
  engine: TypeBEngine,
  energy: BeamEnergy,
  phantom: SlabPhantom,
  beam: SlabBeam,
  depthsCm: ArrayLike<number>,
  lateralCm: ArrayLike<number>,
  options: SuperpositionOptions = {},
): Float64Array {
  const model = typeBModel(energy);
  if (engine === 'pencil-beam')
    return pencilBeamDose(model.pencil, phantom, beam, depthsCm, lateralCm);
  return superpositionDose(
    model.superpositionKernel(options.kernelComponent ?? 'total'),
    model.spectrum,
    phantom,
    beam,
    depthsCm,
    lateralCm,
    options,
  );
}

/**
 * Raw dose per unit energy fluence at 100 cm (cm²/g) from either engine: photons and contaminant
 * electrons.
 */
export function typeBRawDose(
  engine: TypeBEngine,
  energy: BeamEnergy,
  phantom: SlabPhantom,
  beam: SlabBeam,
  depthsCm: ArrayLike<number>,
  lateralCm: ArrayLike<number>,
  options: SuperpositionOptions = {},
): Float64Array {
  const photons = typeBPhotonDose(engine, energy, phantom, beam, depthsCm, lateralCm, options);
  // A part of the photon dose (one kernel component, the TERMA of one layer) carries no
  // contaminant electrons: they come neither from the kernel nor from the TERMA.
  const photonPart =
    (options.kernelComponent !== undefined && options.kernelComponent !== 'total') ||
    options.sourceLayerIndex !== undefined;
  if (photonPart) return photons;
  const electrons = contaminantElectronDose(
    contaminantElectronModel(energy),
    phantom,
    beam,
    equivalentSquareCm(beam.fieldXCm, beam.fieldYCm),
    photonReferencePoint(engine, energy).rawDose,
    depthsCm,
    lateralCm,
  );
  for (let i = 0; i < photons.length; i++)
    photons[i] = (photons[i] as number) + (electrons[i] as number);
  return photons;
}

export interface ReferencePoint {
  dMaxCm: number;
  /** Raw dose at d_max, 10 × 10 cm², SSD 100 cm, central axis (cm²/g per unit fluence). */
  rawDose: number;
}

const references = new Map<string, ReferencePoint>();

/** Depths searched for the maximum: 0–8 cm in 0.04 cm steps. */
export const REFERENCE_SEARCH_DEPTHS_CM: readonly number[] = Array.from(
  { length: 201 },
  (_, i) => i * 0.04,
);

/** Samples within this fraction of the largest are fitted around a maximum. */
const MAXIMUM_WINDOW = 0.005;

/**
 * Maximum of a dose curve on a depth grid: the vertex of the least-squares parabola through the
 * contiguous samples within 0.5 % of the largest one (at least its two neighbours). A fit, not the
 * largest sample, because the maxima of high-energy beams are flat to a few 0.01 % over several
 * millimetres, where the 0.2 cm source cells leave ripples of that size in the slope.
 */
export function maximumOnGrid(
  depthsCm: ArrayLike<number>,
  dose: ArrayLike<number>,
): ReferencePoint {
  let best = 1;
  for (let i = 1; i < depthsCm.length - 1; i++)
    if ((dose[i] as number) > (dose[best] as number)) best = i;
  const floor = (1 - MAXIMUM_WINDOW) * (dose[best] as number);
  let lo = best - 1;
  let hi = best + 1;
  while (lo > 0 && (dose[lo - 1] as number) >= floor) lo--;
  while (hi < depthsCm.length - 1 && (dose[hi + 1] as number) >= floor) hi++;
  // Least squares y = α + β·u + γ·u², u = x − x_best (normal equations, 3 × 3).
  const x0 = depthsCm[best] as number;
  const m = new Float64Array(9);
  const r = new Float64Array(3);
  for (let i = lo; i <= hi; i++) {
    const u = (depthsCm[i] as number) - x0;
    const y = dose[i] as number;
    const p = [1, u, u * u];
    for (let j = 0; j < 3; j++) {
      r[j] = (r[j] as number) + (p[j] as number) * y;
      for (let k = 0; k < 3; k++)
        m[3 * j + k] = (m[3 * j + k] as number) + (p[j] as number) * (p[k] as number);
    }
  }
  const [alpha, beta, gamma] = solve3(m, r);
  const u = gamma < 0 ? -beta / (2 * gamma) : 0;
  const inside = u >= (depthsCm[lo] as number) - x0 && u <= (depthsCm[hi] as number) - x0;
  if (!inside) return { dMaxCm: x0, rawDose: dose[best] as number };
  return { dMaxCm: x0 + u, rawDose: alpha + beta * u + gamma * u * u };
}

/** Solution of a 3 × 3 linear system (row-major matrix) by Cramer's rule. */
function solve3(m: Float64Array, r: Float64Array): [number, number, number] {
  const det = (a: ArrayLike<number>) =>
    (a[0] as number) * ((a[4] as number) * (a[8] as number) - (a[5] as number) * (a[7] as number)) -
    (a[1] as number) * ((a[3] as number) * (a[8] as number) - (a[5] as number) * (a[6] as number)) +
    (a[2] as number) * ((a[3] as number) * (a[7] as number) - (a[4] as number) * (a[6] as number));
  const d = det(m);
  const column = (j: number) => {
    const c = Float64Array.from(m);
    for (let i = 0; i < 3; i++) c[3 * i + j] = r[i] as number;
    return det(c) / d;
  };
  return [column(0), column(1), column(2)];
}

const photonReferences = new Map<string, ReferencePoint>();

/** Where the photon dose alone peaks (water, 10 × 10 cm², SSD 100 cm): R_ph of the electron term. */
export function photonReferencePoint(engine: TypeBEngine, energy: BeamEnergy): ReferencePoint {
  const key = `${engine}|${energy}`;
  const hit = photonReferences.get(key);
  if (hit) return hit;
  const ref = maximumOnGrid(
    REFERENCE_SEARCH_DEPTHS_CM,
    typeBPhotonDose(
      engine,
      energy,
      waterPhantom(40),
      { ssdCm: 100, fieldXCm: 10, fieldYCm: 10 },
      REFERENCE_SEARCH_DEPTHS_CM,
      [0],
    ),
  );
  photonReferences.set(key, ref);
  return ref;
}

/**
 * Depth and raw dose of the maximum of the total dose on the central axis in water, 10 × 10 cm²
 * at SSD 100 cm: the calibration point of the modelled beam.
 */
export function referencePoint(engine: TypeBEngine, energy: BeamEnergy): ReferencePoint {
  const key = `${engine}|${energy}`;
  const hit = references.get(key);
  if (hit) return hit;
  const dose = typeBRawDose(
    engine,
    energy,
    waterPhantom(40),
    { ssdCm: 100, fieldXCm: 10, fieldYCm: 10 },
    REFERENCE_SEARCH_DEPTHS_CM,
    [0],
  );
  const ref = maximumOnGrid(REFERENCE_SEARCH_DEPTHS_CM, dose);
  references.set(key, ref);
  return ref;
}

/** Dose per MU (cGy/MU) on depthsCm × lateralCm (index iz·nx + ix). */
export function typeBDosePerMu(
  engine: TypeBEngine,
  energy: BeamEnergy,
  phantom: SlabPhantom,
  beam: SlabBeam,
  depthsCm: ArrayLike<number>,
  lateralCm: ArrayLike<number>,
  options: SuperpositionOptions = {},
): Float64Array {
  const raw = typeBRawDose(engine, energy, phantom, beam, depthsCm, lateralCm, options);
  const scale =
    (TYPE_B_REFERENCE_DOSE_PER_MU_CGY *
      modelledHeadScatter(energy, equivalentSquareCm(beam.fieldXCm, beam.fieldYCm))) /
    referencePoint(engine, energy).rawDose;
  for (let i = 0; i < raw.length; i++) raw[i] = (raw[i] as number) * scale;
  return raw;
}
