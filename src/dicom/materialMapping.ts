// A slab's mean relative electron density to a material of the library: the material whose
// nominal ρ_e (at its default density) is nearest, with the mass density that gives the slab's
// ρ_e (ρ = ρ_e·(Z/A)_water/(Z/A)_material, rounded to 0.001 g/cm³ and left out when that is the
// material's default); a custom density (water composition) when no material lies within the
// tolerance.
import {
  MATERIAL_IDS,
  WATER_Z_OVER_A,
  getMaterial,
  relativeElectronDensity,
  type MaterialId,
} from '../engine/materials/materialLibrary';
import { LIMITS } from '../io/caseSchema';

export const DEFAULT_MATERIAL_TOLERANCE_RHO_E = 0.1;

export interface SlabMaterial {
  materialId: MaterialId;
  /** Mass density override (g/cm³); undefined = the material's default density. */
  densityGPerCm3: number | undefined;
  /** The density was held at the case's limits (g/cm³). */
  clamped: boolean;
}

const LIBRARY_IDS = MATERIAL_IDS.filter((id) => id !== 'custom');

export function nominalRhoE(id: MaterialId): number {
  return relativeElectronDensity(id, getMaterial(id).defaultDensityGPerCm3);
}

/** Mass density of a material that gives the relative electron density ρ_e. */
export function densityForRhoE(id: MaterialId, rhoE: number): number {
  return (rhoE * WATER_Z_OVER_A) / getMaterial(id).zOverA;
}

export function materialForRhoE(
  rhoE: number,
  toleranceRhoE: number = DEFAULT_MATERIAL_TOLERANCE_RHO_E,
): SlabMaterial {
  let best: MaterialId = 'water';
  let diff = Infinity;
  for (const id of LIBRARY_IDS) {
    const d = Math.abs(nominalRhoE(id) - rhoE);
    if (d < diff) {
      diff = d;
      best = id;
    }
  }
  const materialId: MaterialId = diff <= toleranceRhoE ? best : 'custom';
  const raw = densityForRhoE(materialId, rhoE);
  const min = LIMITS.minDensityGPerCm3;
  const max = LIMITS.maxDensityGPerCm3;
  const clamped = raw < min || raw > max;
  const density = Math.round(Math.min(max, Math.max(min, raw)) * 1000) / 1000;
  const isDefault =
    materialId !== 'custom' &&
    density === Math.round(getMaterial(materialId).defaultDensityGPerCm3 * 1000) / 1000;
  return { materialId, densityGPerCm3: isDefault ? undefined : density, clamped };
}

/** ρ_e of a material at a density (its default when none is given). */
export function rhoEOfMaterial(id: MaterialId, densityGPerCm3: number | undefined): number {
  return relativeElectronDensity(id, densityGPerCm3 ?? getMaterial(id).defaultDensityGPerCm3);
}
