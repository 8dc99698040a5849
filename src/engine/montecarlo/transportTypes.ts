// Types shared by the photon and electron transport and the scorers.

/**
 * Receives energy deposits (MeV, times the particle's statistical weight) at a point; `primary`
 * marks first-interaction charged particles.
 */
export interface McScorer {
  deposit(
    x: number,
    y: number,
    z: number,
    region: number,
    energyMeV: number,
    primary: boolean,
  ): void;
  /**
   * Optional: energy lost uniformly along a straight electron leg from (x, y, z) in direction
   * (u, v, w), `lengthCm` long (continuous slowing down). Without it the leg's energy goes to
   * deposit() at the leg's midpoint.
   */
  depositAlong?(
    x: number,
    y: number,
    z: number,
    u: number,
    v: number,
    w: number,
    lengthCm: number,
    region: number,
    energyMeV: number,
    primary: boolean,
  ): void;
  /** Optional: a particle leaving the geometry (`uncollided` for photons that never interacted). */
  escape?(kind: number, energyMeV: number, z: number, w: number, uncollided: boolean): void;
}

export interface TransportOptions {
  /** Electron/positron kinetic-energy cutoff (MeV); default 0.189 (0.700 MeV total energy). */
  electronCutoffMeV?: number;
  /** Photon cutoff (MeV); default 0.01. */
  photonCutoffMeV?: number;
  /** Maximum fractional energy loss per electron step; default 0.08. */
  maxEnergyLossFraction?: number;
  /**
   * Maximum electron step as mass thickness (g/cm²); default 0.25, i.e. 0.25 cm in water, one
   * depth bin, and 0.96 cm in lung at 0.26 g/cm³. In mass terms because the multiple-scattering
   * angle of a step depends on its length over the radiation length (s/X₀, X₀ ∝ 1/ρ) and the
   * energy lost on it on s·ρ: every medium then gets steps of the same angular and energy size.
   */
  maxStepGPerCm2?: number;
}

/**
 * Energy book of a run (MeV, weighted): deposited + escaped + belowCutoff = incident + weightNet
 * exactly. weightNet is what variance reduction added (roulette survivors' extra weight, forced
 * interactions) minus what it took away (ended particles, weight a photon lost by crossing a
 * forcing zone uncollided); its expectation is 0, and it is 0 in analogue transport.
 */
export interface EnergyTally {
  incidentMeV: number;
  depositedMeV: number;
  escapedMeV: number;
  belowCutoffMeV: number;
  weightNetMeV: number;
}
