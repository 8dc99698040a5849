// Water/medium stopping-power ratio s_w,m for converting dose to medium into dose to water
// (Bragg–Gray: a water cavity small against the electrons' ranges sees the medium's electron
// fluence; Siebers et al., PMB 45, 983 (2000), eq. 1). Unrestricted collision stopping powers
// from NIST ESTAR (SRD 124) via the material library, averaged over the electron fluence:
//   s_w,m = ∫ Φ_m(T) (S_col/ρ)_w(T) dT / ∫ Φ_m(T) (S_col/ρ)_m(T) dT.
// Electron spectrum used: Compton electrons of every photon bin of the beam's primary spectrum
// (surface spectrum, no hardening), started at their mean Klein–Nishina energy T̄(E) and weighted
// by photon fluence × σ_KN(E), slowing down continuously in the medium (CSDA:
// Φ_m(T) ∝ 1/(S_tot/ρ)_m(T) below T̄), down to ESTAR's lowest energy, 10 keV. Pair production
// and delta-ray transport are left out (unrestricted ratio, no Spencer–Attix cut-off).
import { ELECTRON_REST_ENERGY_MEV } from '../units';
import {
  collisionStoppingPowerMeVCm2PerG,
  ESTAR_MIN_MEV,
  radiativeStoppingPowerMeVCm2PerG,
} from '../materials/electronStopping';
import type { MaterialId } from '../materials/materialLibrary';
import {
  kleinNishinaCrossSectionCm2,
  kleinNishinaDifferentialCm2PerSr,
} from '../montecarlo/kleinNishina';
import type { Spectrum } from '../kernels/spectrum';

const meanEnergyCache = new Map<number, number>();

/** Mean kinetic energy (MeV) of the Compton electron from a photon of energy E (Klein–Nishina). */
export function meanComptonElectronEnergyMeV(energyMeV: number): number {
  const known = meanEnergyCache.get(energyMeV);
  if (known !== undefined) return known;
  // ∫ (E − E′(μ)) dσ/dΩ 2π dμ / σ, Simpson's rule over μ = cos θ ∈ [−1, 1].
  const n = 400;
  const h = 2 / n;
  const k = energyMeV / ELECTRON_REST_ENERGY_MEV;
  let num = 0;
  let den = 0;
  for (let i = 0; i <= n; i++) {
    const mu = -1 + i * h;
    const w = i === 0 || i === n ? 1 : i % 2 === 1 ? 4 : 2;
    const d = kleinNishinaDifferentialCm2PerSr(energyMeV, mu);
    const scattered = energyMeV / (1 + k * (1 - mu));
    num += w * d * (energyMeV - scattered);
    den += w * d;
  }
  const t = num / den;
  meanEnergyCache.set(energyMeV, t);
  return t;
}

/** Electron source of a photon spectrum: start energies and weights (Σ = 1). */
export function comptonElectronSource(spectrum: Spectrum): {
  startMeV: number[];
  weight: number[];
} {
  const startMeV: number[] = [];
  const weight: number[] = [];
  let sum = 0;
  for (let i = 0; i < spectrum.energyMeV.length; i++) {
    const e = spectrum.energyMeV[i] as number;
    const w = (spectrum.photonFraction[i] as number) * kleinNishinaCrossSectionCm2(e);
    startMeV.push(meanComptonElectronEnergyMeV(e));
    weight.push(w);
    sum += w;
  }
  return { startMeV, weight: weight.map((w) => w / sum) };
}

/** Log-spaced energy grid of the cumulative integrals: 10 keV to 30 MeV, 100 steps per decade. */
const GRID_MAX_MEV = 30;
const STEPS = Math.ceil(100 * Math.log10(GRID_MAX_MEV / ESTAR_MIN_MEV));
const LOG_STEP = Math.log(GRID_MAX_MEV / ESTAR_MIN_MEV) / STEPS;

interface Cumulative {
  /** ∫ from 10 keV to T_k of (S_col/ρ)_water / (S_tot/ρ)_m dT, per grid node. */
  water: Float64Array;
  /** ∫ from 10 keV to T_k of (S_col/ρ)_m / (S_tot/ρ)_m dT. */
  medium: Float64Array;
}

const cumulativeCache = new Map<MaterialId, Cumulative>();

/** Running integrals on the grid (trapezoid in ln T: ∫ f dT = ∫ f T d ln T). */
function cumulativeOf(materialId: MaterialId): Cumulative {
  const known = cumulativeCache.get(materialId);
  if (known) return known;
  const water = new Float64Array(STEPS + 1);
  const medium = new Float64Array(STEPS + 1);
  let prevW = 0;
  let prevM = 0;
  for (let k = 0; k <= STEPS; k++) {
    const t = ESTAR_MIN_MEV * Math.exp(k * LOG_STEP);
    const total =
      collisionStoppingPowerMeVCm2PerG(materialId, t) +
      radiativeStoppingPowerMeVCm2PerG(materialId, t);
    const fW = (collisionStoppingPowerMeVCm2PerG('water', t) / total) * t;
    const fM = (collisionStoppingPowerMeVCm2PerG(materialId, t) / total) * t;
    if (k > 0) {
      water[k] = (water[k - 1] as number) + 0.5 * (prevW + fW) * LOG_STEP;
      medium[k] = (medium[k - 1] as number) + 0.5 * (prevM + fM) * LOG_STEP;
    }
    prevW = fW;
    prevM = fM;
  }
  const c = { water, medium };
  cumulativeCache.set(materialId, c);
  return c;
}

/** A running integral at energy T (linear between grid nodes in ln T). */
function at(table: Float64Array, tMeV: number): number {
  if (!(tMeV > ESTAR_MIN_MEV)) return 0;
  const p = Math.min(STEPS, Math.log(tMeV / ESTAR_MIN_MEV) / LOG_STEP);
  const i = Math.min(STEPS - 1, Math.floor(p));
  const f = p - i;
  return (1 - f) * (table[i] as number) + f * (table[i + 1] as number);
}

/** s_w,m for a material and a beam spectrum (1 for water). */
export function stoppingPowerRatioWaterToMedium(
  materialId: MaterialId,
  spectrum: Spectrum,
): number {
  if (materialId === 'water') return 1;
  const { startMeV, weight } = comptonElectronSource(spectrum);
  const c = cumulativeOf(materialId);
  let num = 0;
  let den = 0;
  startMeV.forEach((t0, i) => {
    const w = weight[i] as number;
    num += w * at(c.water, t0);
    den += w * at(c.medium, t0);
  });
  return den > 0 ? num / den : 1;
}

/** Mean start energy of the electron source (MeV), printed with the ratio. */
export function meanElectronStartMeV(spectrum: Spectrum): number {
  const { startMeV, weight } = comptonElectronSource(spectrum);
  return startMeV.reduce((s, t, i) => s + t * (weight[i] as number), 0);
}
