// Photon interaction tables for the Monte Carlo engine, per library material, on a log-spaced
// energy grid (fast lookup in the transport loop).
// Total: NIST SRD 126 μ/ρ (muOverRhoCm2PerG) minus coherent scattering, which this engine skips
// (< 0.1 % of μ above 1 MeV in water; ≤ 3 % at 0.1 MeV; its small-angle deflection barely moves
// energy). Partials for water: XCOM (NIST SRD 8) incoherent, photoelectric and pair (nuclear +
// electron field, triplet treated as pair). Other media: Compton = water incoherent × electrons
// per gram relative to water; photoelectric likewise scaled; the remainder of the total above
// 2m_ec² is pair production, below it photoelectric (approximate split, fine for sampling).
import partials from '../data/waterPartialCrossSections.json';
import { getMaterial, WATER_Z_OVER_A, type MaterialId } from '../materials/materialLibrary';
import { muOverRhoCm2PerG } from '../materials/photonCoefficients';
import { ELECTRON_REST_ENERGY_MEV, logLogInterpolate } from '../units';

interface WaterPartials {
  energyMeV: number[];
  coherent: number[];
  incoherent: number[];
  photoelectric: number[];
  pairNuclear: number[];
  pairElectron: number[];
}
const XCOM = partials as WaterPartials;
const PAIR_WATER = XCOM.pairNuclear.map((v, i) => v + (XCOM.pairElectron[i] as number));

export const PHOTON_GRID_MIN_MEV = 0.01;
export const PHOTON_GRID_MAX_MEV = 20;
const GRID_POINTS = 600;
const LOG_MIN = Math.log(PHOTON_GRID_MIN_MEV);
const LOG_STEP = (Math.log(PHOTON_GRID_MAX_MEV) - LOG_MIN) / (GRID_POINTS - 1);

/** Interaction data of one material on the grid; multiply mass coefficients by density. */
export interface PhotonTables {
  materialId: MaterialId;
  /** μ/ρ without coherent (cm²/g). */
  muCm2PerG: Float64Array;
  /** Probability that an interaction is Compton. */
  pCompton: Float64Array;
  /** Probability that an interaction is Compton or photoelectric (the rest is pair). */
  pComptonOrPhoto: Float64Array;
}

/** Partial mass coefficients (cm²/g) of a material at one energy, split as described above. */
export function photonPartialsCm2PerG(
  id: MaterialId,
  energyMeV: number,
): { compton: number; photoelectric: number; pair: number; coherent: number } {
  const eRatio = getMaterial(id).zOverA / WATER_Z_OVER_A;
  const waterOf = (col: number[]): number => logLogInterpolate(XCOM.energyMeV, col, energyMeV);
  const compton = waterOf(XCOM.incoherent) * eRatio;
  const coherent = waterOf(XCOM.coherent) * eRatio;
  const total = muOverRhoCm2PerG(id, energyMeV);
  if (id === 'water' || id === 'custom') {
    const pair = energyMeV > 2 * ELECTRON_REST_ENERGY_MEV ? waterOf(PAIR_WATER) : 0;
    return { compton, photoelectric: waterOf(XCOM.photoelectric), pair, coherent };
  }
  const photoScaled = waterOf(XCOM.photoelectric) * eRatio;
  const rest = Math.max(0, total - compton - coherent);
  if (energyMeV <= 2 * ELECTRON_REST_ENERGY_MEV) {
    return { compton, photoelectric: rest, pair: 0, coherent };
  }
  const photoelectric = Math.min(rest, photoScaled);
  return { compton, photoelectric, pair: rest - photoelectric, coherent };
}

const cache = new Map<MaterialId, PhotonTables>();

/** Tables for a material, built once and cached. */
export function photonTablesOf(id: MaterialId): PhotonTables {
  const hit = cache.get(id);
  if (hit) return hit;
  const mu = new Float64Array(GRID_POINTS);
  const pC = new Float64Array(GRID_POINTS);
  const pCP = new Float64Array(GRID_POINTS);
  for (let i = 0; i < GRID_POINTS; i++) {
    const e = Math.exp(LOG_MIN + i * LOG_STEP);
    const p = photonPartialsCm2PerG(id, e);
    const sum = p.compton + p.photoelectric + p.pair;
    mu[i] = sum;
    pC[i] = p.compton / sum;
    pCP[i] = (p.compton + p.photoelectric) / sum;
  }
  const tables = { materialId: id, muCm2PerG: mu, pCompton: pC, pComptonOrPhoto: pCP };
  cache.set(id, tables);
  return tables;
}

/**
 * Grid position of an energy: integer part = lower grid index, fractional part = weight of the
 * upper point (linear in log E). Clamped to the grid.
 */
export function photonGridPosition(energyMeV: number): number {
  const t = (Math.log(energyMeV) - LOG_MIN) / LOG_STEP;
  if (t <= 0) return 0;
  if (t >= GRID_POINTS - 1.000001) return GRID_POINTS - 1.000001;
  return t;
}

/** Linear interpolation of a grid column at a position from photonGridPosition. */
export function atGrid(column: Float64Array, position: number): number {
  const i = Math.floor(position);
  const f = position - i;
  const a = column[i] as number;
  return a + f * ((column[i + 1] as number) - a);
}
