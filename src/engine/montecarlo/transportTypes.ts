// Types shared by the photon and electron transport and the scorers.

/** Receives energy deposits (MeV) at a point; `primary` marks first-interaction charged particles. */
export interface McScorer {
  deposit(
    x: number,
    y: number,
    z: number,
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
  /** Maximum electron step (cm); default 0.25. */
  maxStepCm?: number;
}

/** Energy book of a run (MeV): deposited + escaped + belowCutoff = incident. */
export interface EnergyTally {
  incidentMeV: number;
  depositedMeV: number;
  escapedMeV: number;
  belowCutoffMeV: number;
}
