// Electron stopping-power tables for condensed-history transport, per library material, on a
// log-spaced kinetic-energy grid. Source: NIST ESTAR (SRD 124) through
// collisionStoppingPowerMeVCm2PerG / radiativeStoppingPowerMeVCm2PerG (proxies per material as
// named in the material library). Positrons use the electron values (small difference at MV
// energies, common simplification).
import { type MaterialId } from '../materials/materialLibrary';
import {
  collisionStoppingPowerMeVCm2PerG,
  radiativeStoppingPowerMeVCm2PerG,
} from '../materials/electronStopping';

export const ELECTRON_GRID_MIN_MEV = 0.01;
export const ELECTRON_GRID_MAX_MEV = 20;
const GRID_POINTS = 400;
const LOG_MIN = Math.log(ELECTRON_GRID_MIN_MEV);
const LOG_STEP = (Math.log(ELECTRON_GRID_MAX_MEV) - LOG_MIN) / (GRID_POINTS - 1);

export interface ElectronTables {
  materialId: MaterialId;
  /** Total (collision + radiative) mass stopping power, MeV cm²/g. */
  totalMeVCm2PerG: Float64Array;
  /** Collision share S_col/S_tot of the energy lost. */
  collisionFraction: Float64Array;
  /**
   * CSDA range R(T) = ∫₀ᵀ dE / S_tot (g/cm²): log-trapezoid on the grid, with R(T_min) = T_min /
   * S_tot(T_min) below it (a bound: S rises towards low energy). The path a transported electron
   * can still travel, since its steps lose energy continuously at S_tot.
   */
  csdaRangeGPerCm2: Float64Array;
}

const cache = new Map<MaterialId, ElectronTables>();

export function electronTablesOf(id: MaterialId): ElectronTables {
  const hit = cache.get(id);
  if (hit) return hit;
  const total = new Float64Array(GRID_POINTS);
  const fraction = new Float64Array(GRID_POINTS);
  for (let i = 0; i < GRID_POINTS; i++) {
    const t = Math.exp(LOG_MIN + i * LOG_STEP);
    const col = collisionStoppingPowerMeVCm2PerG(id, t);
    const rad = radiativeStoppingPowerMeVCm2PerG(id, t);
    total[i] = col + rad;
    fraction[i] = col / (col + rad);
  }
  const range = new Float64Array(GRID_POINTS);
  range[0] = ELECTRON_GRID_MIN_MEV / (total[0] as number);
  for (let i = 1; i < GRID_POINTS; i++) {
    // dE = T d(ln T): trapezoid of T / S_tot over the log grid.
    const a = Math.exp(LOG_MIN + (i - 1) * LOG_STEP) / (total[i - 1] as number);
    const b = Math.exp(LOG_MIN + i * LOG_STEP) / (total[i] as number);
    range[i] = (range[i - 1] as number) + 0.5 * (a + b) * LOG_STEP;
  }
  const tables = {
    materialId: id,
    totalMeVCm2PerG: total,
    collisionFraction: fraction,
    csdaRangeGPerCm2: range,
  };
  cache.set(id, tables);
  return tables;
}

/** Fractional grid position of a kinetic energy (clamped), for atGrid(). */
export function electronGridPosition(kineticMeV: number): number {
  const t = (Math.log(kineticMeV) - LOG_MIN) / LOG_STEP;
  if (t <= 0) return 0;
  if (t >= GRID_POINTS - 1.000001) return GRID_POINTS - 1.000001;
  return t;
}
