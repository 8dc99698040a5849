// Photon mass attenuation μ/ρ (coherent included) and mass energy-absorption μ_en/ρ, in cm²/g.
// Source: NIST SRD 126 (Hubbell & Seltzer), Table 4, as in src/engine/data/*.json.
// Interpolated log–log in energy; clamped to the table's 0.01–20 MeV range.
import muTable from '../data/muOverRhoCm2PerG.json';
import muEnTable from '../data/muEnOverRhoCm2PerG.json';
import { logLogInterpolate } from '../units';
import { getMaterial, type CoefficientTableId, type MaterialId } from './materialLibrary';

interface CoefficientTable {
  source: string;
  energyMeV: number[];
  materials: Record<CoefficientTableId, number[]>;
}

const MU = muTable;
const MU_EN = muEnTable;

export const PHOTON_TABLE_MIN_MEV = MU.energyMeV[0] as number;
export const PHOTON_TABLE_MAX_MEV = MU.energyMeV[MU.energyMeV.length - 1] as number;
export const PHOTON_COEFFICIENT_SOURCE = MU.source;

function mixed(table: CoefficientTable, id: MaterialId, energyMeV: number): number {
  let sum = 0;
  for (const part of getMaterial(id).coefficients) {
    sum +=
      part.massFraction *
      logLogInterpolate(table.energyMeV, table.materials[part.table], energyMeV);
  }
  return sum;
}

/** Mass attenuation coefficient μ/ρ (cm²/g) of a library material at a photon energy (MeV). */
export function muOverRhoCm2PerG(id: MaterialId, energyMeV: number): number {
  return mixed(MU, id, energyMeV);
}

/** Mass energy-absorption coefficient μ_en/ρ (cm²/g) of a library material (MeV). */
export function muEnOverRhoCm2PerG(id: MaterialId, energyMeV: number): number {
  return mixed(MU_EN, id, energyMeV);
}

/** Linear attenuation coefficient μ (1/cm) at a given mass density. */
export function linearAttenuationPerCm(
  id: MaterialId,
  densityGPerCm3: number,
  energyMeV: number,
): number {
  return muOverRhoCm2PerG(id, energyMeV) * densityGPerCm3;
}
