// Coupled photon–electron transport for one history at a time (class-I condensed history).
// Photons: Compton (Klein–Nishina, Kahn), photoelectric (local deposit), pair production (kinetic
// energy E − 2m_ec² shared uniformly, both particles at θ = m_ec²/E; positrons annihilate at rest
// into two 0.511 MeV photons, back to back, isotropic). Distances by −ln ξ/μ with exact
// boundary crossing (memorylessness: the remaining optical depth carries over).
// Electrons/positrons: CSDA steps limited by a fractional energy loss, by a maximum length and
// at every boundary; collision loss deposited along the step (at its midpoint), radiative loss
// banked and emitted at the end of the track as one bremsstrahlung photon from the track's start
// along its initial direction (opened by θ = m_ec²/E); multiple scattering by Highland's
// formula (PDG form) applied at a random hinge point of each step.
import { ELECTRON_REST_ENERGY_MEV } from '../units';
import type { McGeometry } from './geometry';
import {
  photonTablesOf,
  photonGridPosition,
  atGrid,
  type PhotonTables,
} from './photonCrossSections';
import { electronTablesOf, electronGridPosition, type ElectronTables } from './electronTables';
import { getMaterial } from '../materials/materialLibrary';
import { sampleKleinNishinaKahn, type ComptonSample } from './kleinNishina';
import { rotateDirection, type Direction } from './direction';
import { ParticleStack, PHOTON, ELECTRON, POSITRON } from './particleStack';
import type { Rng } from './rng';

const M = ELECTRON_REST_ENERGY_MEV;
const TWO_PI = 2 * Math.PI;

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

export class Transport {
  readonly tally: EnergyTally = {
    incidentMeV: 0,
    depositedMeV: 0,
    escapedMeV: 0,
    belowCutoffMeV: 0,
  };
  private readonly stack = new ParticleStack();
  private readonly photonTables: PhotonTables[];
  private readonly electronTables: ElectronTables[];
  private readonly density: Float64Array;
  private readonly x0Cm: Float64Array;
  private readonly eCut: number;
  private readonly gCut: number;
  private readonly fLoss: number;
  private readonly maxStep: number;
  private readonly compton: ComptonSample = { scatteredMeV: 0, cosTheta: 1 };
  private readonly dir: Direction = { u: 0, v: 0, w: 1 };

  constructor(
    private readonly geometry: McGeometry,
    private readonly scorer: McScorer,
    options: TransportOptions = {},
  ) {
    const regions = geometry.regions;
    this.photonTables = regions.map((r) => photonTablesOf(r.materialId));
    this.electronTables = regions.map((r) => electronTablesOf(r.materialId));
    this.density = Float64Array.from(regions.map((r) => r.densityGPerCm3));
    this.x0Cm = Float64Array.from(
      regions.map((r) => getMaterial(r.materialId).radiationLengthGPerCm2 / r.densityGPerCm3),
    );
    this.eCut = options.electronCutoffMeV ?? 0.189;
    this.gCut = options.photonCutoffMeV ?? 0.01;
    this.fLoss = options.maxEnergyLossFraction ?? 0.08;
    this.maxStep = options.maxStepCm ?? 0.25;
  }

  /** Transports one incident photon (and everything it sets in motion) to the end. */
  runPhoton(
    energyMeV: number,
    x: number,
    y: number,
    z: number,
    u: number,
    v: number,
    w: number,
    region: number,
    rng: Rng,
  ): void {
    this.tally.incidentMeV += energyMeV;
    this.stack.push(PHOTON, energyMeV, x, y, z, u, v, w, region, true);
    this.drain(rng);
  }

  /** Forces the first interaction of a photon at (x, y, z) (kernel generation), then transports all. */
  runForcedInteraction(
    energyMeV: number,
    x: number,
    y: number,
    z: number,
    u: number,
    v: number,
    w: number,
    region: number,
    rng: Rng,
  ): void {
    this.tally.incidentMeV += energyMeV;
    this.interact(energyMeV, x, y, z, u, v, w, region, true, rng);
    this.drain(rng);
  }

  private drain(rng: Rng): void {
    const s = this.stack;
    while (s.size > 0) {
      const i = --s.size;
      const kind = s.kind[i] as number;
      const e = s.energyMeV[i] as number;
      const region = s.region[i] as number;
      const flag = s.flag[i] === 1;
      const x = s.x[i] as number;
      const y = s.y[i] as number;
      const z = s.z[i] as number;
      const u = s.u[i] as number;
      const v = s.v[i] as number;
      const w = s.w[i] as number;
      if (kind === PHOTON) this.photon(e, x, y, z, u, v, w, region, flag, rng);
      else this.electron(kind === POSITRON, e, x, y, z, u, v, w, region, flag, rng);
    }
  }

  private photon(
    e: number,
    x: number,
    y: number,
    z: number,
    u: number,
    v: number,
    w: number,
    region: number,
    uncollided: boolean,
    rng: Rng,
  ): void {
    if (e < this.gCut) {
      this.tally.belowCutoffMeV += e;
      this.scorer.deposit(x, y, z, region, e, false);
      return;
    }
    const pos = photonGridPosition(e);
    let mu =
      atGrid((this.photonTables[region] as PhotonTables).muCm2PerG, pos) *
      (this.density[region] as number);
    let tau = -Math.log(rng.next());
    for (;;) {
      const dist = tau / mu;
      const db = Math.max(0, this.geometry.distanceToBoundary(region, x, y, z, u, v, w));
      if (dist < db) {
        x += u * dist;
        y += v * dist;
        z += w * dist;
        break;
      }
      x += u * db;
      y += v * db;
      z += w * db;
      const snap = this.geometry.snapZ(region, w);
      if (!Number.isNaN(snap)) z = snap;
      tau -= mu * db;
      region = this.geometry.regionAfterCrossing(region, x, y, z, u, v, w);
      if (region < 0) {
        this.tally.escapedMeV += e;
        this.scorer.escape?.(PHOTON, e, z, w, uncollided);
        return;
      }
      mu =
        atGrid((this.photonTables[region] as PhotonTables).muCm2PerG, pos) *
        (this.density[region] as number);
    }
    this.interact(e, x, y, z, u, v, w, region, uncollided, rng);
  }

  /** One photon interaction at a point; charged products are `primary` when the photon was uncollided. */
  private interact(
    e: number,
    x: number,
    y: number,
    z: number,
    u: number,
    v: number,
    w: number,
    region: number,
    primary: boolean,
    rng: Rng,
  ): void {
    const t = this.photonTables[region] as PhotonTables;
    const pos = photonGridPosition(e);
    const xi = rng.next();
    if (xi < atGrid(t.pCompton, pos)) {
      const c = this.compton;
      sampleKleinNishinaKahn(e, rng, c);
      const d = this.dir;
      d.u = u;
      d.v = v;
      d.w = w;
      rotateDirection(d, c.cosTheta, TWO_PI * rng.next());
      const te = e - c.scatteredMeV;
      // Electron momentum = incident − scattered photon momentum.
      const px = e * u - c.scatteredMeV * d.u;
      const py = e * v - c.scatteredMeV * d.v;
      const pz = e * w - c.scatteredMeV * d.w;
      const pn = Math.sqrt(px * px + py * py + pz * pz);
      if (pn > 0)
        this.stack.push(ELECTRON, te, x, y, z, px / pn, py / pn, pz / pn, region, primary);
      else this.localDeposit(x, y, z, region, te, primary);
      this.stack.push(PHOTON, c.scatteredMeV, x, y, z, d.u, d.v, d.w, region, false);
      return;
    }
    if (xi < atGrid(t.pComptonOrPhoto, pos) || e <= 2 * M) {
      this.tally.depositedMeV += e;
      this.scorer.deposit(x, y, z, region, e, primary);
      return;
    }
    const available = e - 2 * M;
    const tMinus = available * rng.next();
    const cosT = Math.cos(M / e);
    const phi = TWO_PI * rng.next();
    const d = this.dir;
    d.u = u;
    d.v = v;
    d.w = w;
    rotateDirection(d, cosT, phi);
    this.stack.push(ELECTRON, tMinus, x, y, z, d.u, d.v, d.w, region, primary);
    d.u = u;
    d.v = v;
    d.w = w;
    rotateDirection(d, cosT, phi + Math.PI);
    this.stack.push(POSITRON, available - tMinus, x, y, z, d.u, d.v, d.w, region, primary);
  }

  private localDeposit(
    x: number,
    y: number,
    z: number,
    region: number,
    e: number,
    primary: boolean,
  ): void {
    this.tally.belowCutoffMeV += e;
    this.scorer.deposit(x, y, z, region, e, primary);
  }

  private electron(
    positron: boolean,
    t: number,
    x: number,
    y: number,
    z: number,
    u: number,
    v: number,
    w: number,
    region: number,
    primary: boolean,
    rng: Rng,
  ): void {
    const x0 = x,
      y0 = y,
      z0 = z,
      u0 = u,
      v0 = v,
      w0 = w,
      r0 = region,
      t0 = t;
    const d = this.dir;
    let bank = 0;
    let escaped = false;
    while (t > this.eCut) {
      const tables = this.electronTables[region] as ElectronTables;
      const rho = this.density[region] as number;
      let dE = this.fLoss * t;
      const mid = electronGridPosition(t - 0.5 * dE);
      const sTot = atGrid(tables.totalMeVCm2PerG, mid) * rho;
      const fCol = atGrid(tables.collisionFraction, mid);
      let step = dE / sTot;
      if (step > this.maxStep) {
        step = this.maxStep;
        dE = step * sTot;
      }
      const hinge = rng.next() * step;
      let crossed = false;
      // Two legs: hinge, deflect, rest. A boundary ends the step early (no deflection after it).
      for (let leg = 0; leg < 2; leg++) {
        const len = leg === 0 ? hinge : step - hinge;
        const db = Math.max(0, this.geometry.distanceToBoundary(region, x, y, z, u, v, w));
        const go = db < len ? db : len;
        const lost = (dE * go) / step;
        const col = lost * fCol;
        this.tally.depositedMeV += col;
        this.scorer.deposit(
          x + 0.5 * go * u,
          y + 0.5 * go * v,
          z + 0.5 * go * w,
          region,
          col,
          primary,
        );
        bank += lost - col;
        t -= lost;
        x += u * go;
        y += v * go;
        z += w * go;
        if (db < len) {
          const snap = this.geometry.snapZ(region, w);
          if (!Number.isNaN(snap)) z = snap;
          region = this.geometry.regionAfterCrossing(region, x, y, z, u, v, w);
          crossed = true;
          break;
        }
        if (leg === 0) {
          const tMid = t; // energy at the hinge
          const pc2 = tMid * (tMid + 2 * M);
          const betaCP = pc2 / (tMid + M);
          // Highland's log term is not additive over steps: evaluated per short step it loses
          // ~20 % of the angular variance over a track. Here the variance is additive in the
          // step (√(x/X0)) and the log term uses the residual path length t/S (track scale).
          const x0 = this.x0Cm[region] as number;
          const residual = Math.max(step, tMid / sTot) / x0;
          const theta0 =
            (13.6 / betaCP) * Math.sqrt(step / x0) * Math.max(0, 1 + 0.038 * Math.log(residual));
          const theta = theta0 * Math.sqrt(-2 * Math.log(rng.next()));
          d.u = u;
          d.v = v;
          d.w = w;
          rotateDirection(d, Math.cos(Math.min(theta, Math.PI)), TWO_PI * rng.next());
          u = d.u;
          v = d.v;
          w = d.w;
        }
      }
      if (crossed && region < 0) {
        escaped = true;
        break;
      }
    }
    if (escaped) {
      // An escaping positron carries its rest energy (2m_ec² was taken from the photon) away.
      const carried = positron ? t + 2 * M : t;
      this.tally.escapedMeV += carried;
      this.scorer.escape?.(positron ? POSITRON : ELECTRON, carried, z, w, false);
    } else {
      this.localDeposit(x, y, z, region, t, primary);
      if (positron) {
        const cosT = 2 * rng.next() - 1;
        const sinT = Math.sqrt(1 - cosT * cosT);
        const phi = TWO_PI * rng.next();
        const au = sinT * Math.cos(phi),
          av = sinT * Math.sin(phi);
        this.stack.push(PHOTON, M, x, y, z, au, av, cosT, region, false);
        this.stack.push(PHOTON, M, x, y, z, -au, -av, -cosT, region, false);
      }
    }
    if (bank > 0) {
      // One bremsstrahlung photon carrying the track's radiative loss.
      d.u = u0;
      d.v = v0;
      d.w = w0;
      rotateDirection(d, Math.cos(M / (t0 + M)), TWO_PI * rng.next());
      this.stack.push(PHOTON, bank, x0, y0, z0, d.u, d.v, d.w, r0, false);
    }
  }
}
