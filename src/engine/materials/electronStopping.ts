// Electron stopping powers (MeV cm²/g) and CSDA ranges (g/cm²).
// Source: NIST ESTAR (SRD 124), ICRU Report 37 method, as in src/engine/data/estar*.json.
// Media without their own ESTAR table use the proxies named in the material library.
// Interpolated log–log in kinetic energy; clamped to 0.01–20 MeV.
import waterTable from '../data/estarWater.json';
import otherTable from '../data/estarOtherMedia.json';
import { logLogInterpolate } from '../units';
import { getMaterial, type MaterialId, type StoppingTableId } from './materialLibrary';

interface StoppingColumns {
  collisionMeVCm2PerG: number[];
  radiativeMeVCm2PerG: number[];
  csdaRangeGPerCm2: number[];
}

const WATER = waterTable as StoppingColumns & { kineticEnergyMeV: number[]; source: string };
const OTHER = otherTable;

export const ESTAR_SOURCE = `${WATER.source}; ${OTHER.source}`;
export const ESTAR_MIN_MEV = WATER.kineticEnergyMeV[0] as number;
export const ESTAR_MAX_MEV = WATER.kineticEnergyMeV[WATER.kineticEnergyMeV.length - 1] as number;

function columns(table: StoppingTableId): { energies: number[]; cols: StoppingColumns } {
  return table === 'water'
    ? { energies: WATER.kineticEnergyMeV, cols: WATER }
    : { energies: OTHER.kineticEnergyMeV, cols: OTHER.media[table] };
}

function mixed(id: MaterialId, pick: (c: StoppingColumns) => number[], kineticMeV: number): number {
  let sum = 0;
  for (const part of getMaterial(id).stopping) {
    const { energies, cols } = columns(part.table);
    sum += part.massFraction * logLogInterpolate(energies, pick(cols), kineticMeV);
  }
  return sum;
}

/** Unrestricted collision stopping power S_col/ρ (MeV cm²/g) at kinetic energy T (MeV). */
export function collisionStoppingPowerMeVCm2PerG(id: MaterialId, kineticMeV: number): number {
  return mixed(id, (c) => c.collisionMeVCm2PerG, kineticMeV);
}

/** Radiative stopping power S_rad/ρ (MeV cm²/g) at kinetic energy T (MeV). */
export function radiativeStoppingPowerMeVCm2PerG(id: MaterialId, kineticMeV: number): number {
  return mixed(id, (c) => c.radiativeMeVCm2PerG, kineticMeV);
}

/** CSDA range (g/cm²) of an electron of kinetic energy T (MeV). */
export function csdaRangeGPerCm2(id: MaterialId, kineticMeV: number): number {
  return mixed(id, (c) => c.csdaRangeGPerCm2, kineticMeV);
}
