// Compton scattering on free electrons (Klein–Nishina): Kahn's rejection sampler and the
// analytic forms used to test it.
// Kahn, "Applications of Monte Carlo", RAND report for the US AEC (1954), as the recipe in the
// physics data notes: η = E/E′, k = E/m_ec².
import { CLASSICAL_ELECTRON_RADIUS_CM, ELECTRON_REST_ENERGY_MEV } from '../units';
import type { Rng } from './rng';

/** Result holder reused by the sampler (no allocation in the hot loop). */
export interface ComptonSample {
  /** Scattered photon energy E′ (MeV). */
  scatteredMeV: number;
  /** Cosine of the photon scattering angle. */
  cosTheta: number;
}

/** Kahn's method: samples E′ and cos θ for a photon of energy E; writes into `out`. */
export function sampleKleinNishinaKahn(energyMeV: number, rng: Rng, out: ComptonSample): void {
  const k = energyMeV / ELECTRON_REST_ENERGY_MEV;
  const twoK = 2 * k;
  const branch = (twoK + 1) / (twoK + 9);
  for (;;) {
    const x1 = rng.next();
    const x2 = rng.next();
    const x3 = rng.next();
    let eta: number;
    let accept: boolean;
    if (x1 <= branch) {
      eta = 1 + twoK * x2;
      accept = x3 <= 4 * (1 / eta - 1 / (eta * eta));
    } else {
      eta = (twoK + 1) / (1 + twoK * x2);
      const mu = 1 - (eta - 1) / k;
      accept = x3 <= 0.5 * (mu * mu + 1 / eta);
    }
    if (accept) {
      out.scatteredMeV = energyMeV / eta;
      out.cosTheta = 1 - (eta - 1) / k;
      return;
    }
  }
}

/** Klein–Nishina total cross section per electron (cm²). */
export function kleinNishinaCrossSectionCm2(energyMeV: number): number {
  const k = energyMeV / ELECTRON_REST_ENERGY_MEV;
  const a = 1 + 2 * k;
  const l = Math.log(a);
  const re2 = CLASSICAL_ELECTRON_RADIUS_CM * CLASSICAL_ELECTRON_RADIUS_CM;
  return (
    2 *
    Math.PI *
    re2 *
    (((1 + k) / (k * k)) * ((2 * (1 + k)) / a - l / k) + l / (2 * k) - (1 + 3 * k) / (a * a))
  );
}

/** Klein–Nishina dσ/dΩ per electron (cm²/sr) at scattering cosine μ. */
export function kleinNishinaDifferentialCm2PerSr(energyMeV: number, cosTheta: number): number {
  const k = energyMeV / ELECTRON_REST_ENERGY_MEV;
  const ratio = 1 / (1 + k * (1 - cosTheta));
  const re2 = CLASSICAL_ELECTRON_RADIUS_CM * CLASSICAL_ELECTRON_RADIUS_CM;
  return 0.5 * re2 * ratio * ratio * (ratio + 1 / ratio - (1 - cosTheta * cosTheta));
}
