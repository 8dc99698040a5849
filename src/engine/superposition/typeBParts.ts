// The parts of a type-B dose at one depth on the central axis, each computed by the engines'
// own dose function (typeBDose.ts) with one option changed: the heterogeneous and the water dose
// whose ratio is the CF, the primary and the scatter part of the kernel (superposition), and the
// dose from the TERMA released in each layer (superposition). The kernels are linear in both, so
// the photon parts add up to the photon dose (to rounding; tests check it); the total also holds
// the contaminant electrons, which are neither kernel nor TERMA.
import type { BeamEnergy } from '../beam/energies';
import { waterPhantom, type SlabPhantom } from '../phantom/slabPhantom';
import type { SlabBeam } from './slabSuperposition';
import { typeBDosePerMu, type TypeBEngine } from './typeBDose';

export interface TypeBParts {
  engine: TypeBEngine;
  depthCm: number;
  /** Dose per MU (cGy/MU, native: dose to medium) in the slabs and in water of the same thickness. */
  dosePerMuCGy: number;
  waterDosePerMuCGy: number;
  /** Superposition only: primary and scatter kernel parts, slabs and water (cGy/MU). */
  primary?: { dosePerMuCGy: number; waterDosePerMuCGy: number };
  scatter?: { dosePerMuCGy: number; waterDosePerMuCGy: number };
  /** Superposition only: dose per MU from the TERMA released in each layer (slabs). */
  byLayerOfOrigin?: Float64Array;
}

/** Dose parts at one depth (cm) of a slab phantom from one type-B engine. */
export function typeBPartsAtDepth(
  engine: TypeBEngine,
  energy: BeamEnergy,
  phantom: SlabPhantom,
  beam: SlabBeam,
  depthCm: number,
): TypeBParts {
  const water = waterPhantom(phantom.totalThicknessCm);
  const at = (p: SlabPhantom, options = {}) =>
    typeBDosePerMu(engine, energy, p, beam, [depthCm], [0], options)[0] as number;
  const parts: TypeBParts = {
    engine,
    depthCm,
    dosePerMuCGy: at(phantom),
    waterDosePerMuCGy: at(water),
  };
  if (engine !== 'superposition') return parts;
  const component = (kernelComponent: 'primary' | 'scatter') => ({
    dosePerMuCGy: at(phantom, { kernelComponent }),
    waterDosePerMuCGy: at(water, { kernelComponent }),
  });
  parts.primary = component('primary');
  parts.scatter = component('scatter');
  parts.byLayerOfOrigin = Float64Array.from(phantom.layers, (_, sourceLayerIndex) =>
    at(phantom, { sourceLayerIndex }),
  );
  return parts;
}
