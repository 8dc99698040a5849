// Dose per MU from the two type-B engines. Normalisation (ours): the dose per unit fluence of a
// case is divided by the same engine's water dose at d_max on the central axis for 10 × 10 cm²
// at SSD 100 cm (the calibration condition), and multiplied by the modelled collimator-scatter
// factor S_c of the field and the reference dose rate (1 cGy/MU). Phantom scatter and inverse
// square follow from the kernels and the geometry.
import type { BeamEnergy } from '../beam/energies';
import { equivalentSquareCm } from '../beam/geometry';
import { modelledHeadScatter } from '../beam/headScatter';
import { waterPhantom, type SlabPhantom } from '../phantom/slabPhantom';
import { typeBModel } from './beamModel';
import { pencilBeamDose } from './pencilBeam';
import { superpositionDose, type SlabBeam, type SuperpositionOptions } from './slabSuperposition';

export type TypeBEngine = 'superposition' | 'pencil-beam';

/** Reference dose rate of the modelled beams at the calibration condition (cGy/MU). */
export const TYPE_B_REFERENCE_DOSE_PER_MU_CGY = 1;

/** Raw dose per unit energy fluence at 100 cm (cm²/g) from either engine. */
export function typeBRawDose(
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
    model.quadrant(options.kernelComponent ?? 'total'),
    model.spectrum,
    phantom,
    beam,
    depthsCm,
    lateralCm,
    options,
  );
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

/** Maximum of a dose curve on an evenly spaced depth grid: parabola through the 3 samples around it. */
export function maximumOnGrid(
  depthsCm: ArrayLike<number>,
  dose: ArrayLike<number>,
): ReferencePoint {
  const stepCm = (depthsCm[1] as number) - (depthsCm[0] as number);
  let best = 1;
  for (let i = 1; i < depthsCm.length - 1; i++)
    if ((dose[i] as number) > (dose[best] as number)) best = i;
  const a = dose[best - 1] as number;
  const b = dose[best] as number;
  const c = dose[best + 1] as number;
  const denom = a - 2 * b + c;
  const shift = denom < 0 ? (0.5 * (a - c)) / denom : 0;
  return {
    dMaxCm: (depthsCm[best] as number) + shift * stepCm,
    rawDose: b - 0.25 * (a - c) * shift,
  };
}

/** Depth and raw dose of the maximum on the central axis in water, 10 × 10 cm² at SSD 100 cm. */
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
      modelledHeadScatter(equivalentSquareCm(beam.fieldXCm, beam.fieldYCm))) /
    referencePoint(engine, energy).rawDose;
  for (let i = 0; i < raw.length; i++) raw[i] = (raw[i] as number) * scale;
  return raw;
}
