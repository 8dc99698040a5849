// Modelled water data of a beam, computed with the superposition engine in water (no measured
// data): PDD at SSD 100 cm, TMR at a fixed source–point distance of 100 cm, peak-scatter factor,
// S_p and the modelled S_c, for square fields 2–40 cm and depths 0–40 cm.
// Definitions (standard, Khan, from memory): PDD(d, s) = 100·D(d)/D(d_max) at SSD 100, field s
// at the surface; TMR(d, s) = D(d)/D(d_max) with the point at 100 cm from the source and field s
// there; PSF(s) = TAR(d_max, s) = D(d_max, s)/D_air, where D_air is the dose at the same point
// in a mini-phantom of water just large enough for electronic equilibrium. Model choices (ours):
// the mini-phantom is a water cylinder of radius r_LCPE = 5.973·TPR20,10 − 2.688 g/cm² (the
// lateral equilibrium radius of Li et al., Med. Phys. 22, 1167 (1995)), modelled as the square
// field of equal area on a water slab d_max + r_LCPE thick with the point at d_max, photons only
// (its wall stops the contaminant electrons, as a build-up cap does). Its dose includes the
// photons scattered inside it — as a measured D_air does — which is why PSF(10 × 10) of 6 MV is
// about 1.04 and not the 1.08 of total over first-generation-electron dose at d_max.
// S_p(s) = PSF(s)/PSF(10).
import type { BeamEnergy } from './energies';
import { modelledHeadScatter } from './headScatter';
import { squareOfEquivalentCircleCm } from './geometry';
import { lateralEquilibriumRangeGPerCm2 } from '../equilibrium/lateralRange';
import { waterPhantom } from '../phantom/slabPhantom';
import { typeBModel } from '../superposition/beamModel';
import { superpositionDose } from '../superposition/slabSuperposition';
import { referencePoint, typeBRawDose } from '../superposition/typeBDose';

export const MODELLED_FIELDS_CM = [2, 3, 4, 5, 6, 7, 8, 10, 12, 15, 20, 25, 30, 35, 40];

function steps(from: number, to: number, step: number): number[] {
  const n = Math.round((to - from) / step);
  return Array.from({ length: n + 1 }, (_, i) => Number((from + i * step).toFixed(4)));
}

/** 0–5 cm in 0.2 cm steps (build-up), then 0.5 cm steps to 40 cm. */
export const MODELLED_DEPTHS_CM = [...steps(0, 5, 0.2), ...steps(5.5, 40, 0.5)];

/** Depth of the water phantom the data are computed in (backscatter below 40 cm included). */
const PHANTOM_CM = 50;

export interface ModelledBeamTables {
  energy: BeamEnergy;
  dMaxCm: number;
  fieldsCm: number[];
  depthsCm: number[];
  /** PDD (%) per field, over depthsCm. */
  pdd: number[][];
  /** TMR per field (side at the depth of the point), over depthsCm. */
  tmr: number[][];
  psf: number[];
  sp: number[];
  sc: number[];
  /** Quality indices of 10 × 10 at SSD 100: PDD(10) (%), PDD20,10 and TPR20,10. */
  pdd10: number;
  pdd2010: number;
  tpr2010: number;
}

/**
 * D_air of the peak-scatter factor: photon dose at d_max on the axis of a water mini-phantom of
 * radius r_LCPE (from the beam's TPR20,10), the point 100 cm from the source (see the header).
 */
export function miniPhantomDose(energy: BeamEnergy, dMaxCm: number, tpr2010: number): number {
  const radiusCm = lateralEquilibriumRangeGPerCm2(tpr2010);
  const side = squareOfEquivalentCircleCm(radiusCm);
  const model = typeBModel(energy);
  return superpositionDose(
    model.superpositionKernel('total'),
    model.spectrum,
    waterPhantom(dMaxCm + radiusCm),
    { ssdCm: 100 - dMaxCm, fieldXCm: side, fieldYCm: side },
    [dMaxCm],
    [0],
  )[0] as number;
}

export function computeModelledBeamTables(
  energy: BeamEnergy,
  fieldsCm: readonly number[] = MODELLED_FIELDS_CM,
  depthsCm: readonly number[] = MODELLED_DEPTHS_CM,
): ModelledBeamTables {
  const phantom = waterPhantom(PHANTOM_CM);
  const dMaxCm = referencePoint('superposition', energy).dMaxCm;
  const pdd: number[][] = [];
  const tmr: number[][] = [];
  const atDMax: number[] = [];
  for (const s of fieldsCm) {
    const field = { fieldXCm: s, fieldYCm: s };
    const ssd = typeBRawDose(
      'superposition',
      energy,
      phantom,
      { ssdCm: 100, ...field },
      [dMaxCm, ...depthsCm],
      [0],
    );
    pdd.push(depthsCm.map((_, i) => (100 * (ssd[i + 1] as number)) / (ssd[0] as number)));
    const atDepth = (d: number) =>
      typeBRawDose(
        'superposition',
        energy,
        phantom,
        { ssdCm: 100 - d, ...field },
        [d],
        [0],
      )[0] as number;
    const reference = atDepth(dMaxCm);
    tmr.push(depthsCm.map((d) => atDepth(d) / reference));
    atDMax.push(reference);
  }
  const i10 = fieldsCm.indexOf(10);
  const depthIndex = (d: number) => depthsCm.indexOf(d);
  const pdd10 = pdd[i10]![depthIndex(10)] as number;
  const pdd20 = pdd[i10]![depthIndex(20)] as number;
  const tmr10 = tmr[i10]![depthIndex(10)] as number;
  const tmr20 = tmr[i10]![depthIndex(20)] as number;
  const tpr2010 = tmr20 / tmr10;
  const dAir = miniPhantomDose(energy, dMaxCm, tpr2010);
  const psf = atDMax.map((d) => d / dAir);
  const psf10 = psf[i10] as number;
  return {
    energy,
    dMaxCm,
    fieldsCm: [...fieldsCm],
    depthsCm: [...depthsCm],
    pdd,
    tmr,
    psf,
    sp: psf.map((p) => p / psf10),
    sc: fieldsCm.map((s) => modelledHeadScatter(energy, s)),
    pdd10,
    pdd2010: pdd20 / pdd10,
    tpr2010,
  };
}
