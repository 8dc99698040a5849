// Coupled photon–electron transport for one history at a time (class-I condensed history).
// Photons: Compton (Klein–Nishina, Kahn), photoelectric (local deposit), pair production (kinetic
// energy E − 2m_ec² shared uniformly, both particles at θ = m_ec²/E; positrons annihilate at rest
// into two 0.511 MeV photons, back to back, isotropic). Distances by −ln ξ/μ with exact
// boundary crossing (memorylessness: the remaining optical depth carries over).
// Electrons and positrons: electronTransport.ts.
import { ELECTRON_REST_ENERGY_MEV } from '../units';
import type { McGeometry } from './geometry';
import {
  photonTablesOf,
  photonGridPosition,
  atGrid,
  type PhotonTables,
} from './photonCrossSections';
import { electronTablesOf, type ElectronTables } from './electronTables';
import { getMaterial } from '../materials/materialLibrary';
import { sampleKleinNishinaKahn, type ComptonSample } from './kleinNishina';
import { rotateDirection, type Direction } from './direction';
import { ParticleStack, PHOTON, ELECTRON, POSITRON } from './particleStack';
import type { Rng } from './rng';
import type { EnergyTally, McScorer, TransportOptions } from './transportTypes';
import { transportElectron, type ElectronContext } from './electronTransport';
import type { ChargedRoulette } from './chargedRoulette';

const M = ELECTRON_REST_ENERGY_MEV;
const TWO_PI = 2 * Math.PI;

export type { EnergyTally, McScorer, TransportOptions } from './transportTypes';

export class Transport implements ElectronContext {
  readonly tally: EnergyTally = {
    incidentMeV: 0,
    depositedMeV: 0,
    escapedMeV: 0,
    belowCutoffMeV: 0,
    weightNetMeV: 0,
  };
  readonly stack = new ParticleStack();
  private readonly photonTables: PhotonTables[];
  readonly electronTables: ElectronTables[];
  readonly density: Float64Array;
  readonly x0Cm: Float64Array;
  readonly eCut: number;
  private readonly gCut: number;
  readonly fLoss: number;
  /** Maximum electron step in each region (cm): the mass-thickness limit over the density. */
  readonly maxStepCm: Float64Array;
  private readonly compton: ComptonSample = { scatteredMeV: 0, cosTheta: 1 };
  readonly dir: Direction = { u: 0, v: 0, w: 1 };

  constructor(
    readonly geometry: McGeometry,
    readonly scorer: McScorer,
    options: TransportOptions = {},
    /** Variance reduction: roulette of charged particles that cannot reach a zone of interest. */
    readonly roulette: ChargedRoulette | undefined = undefined,
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
    const maxStepGPerCm2 = options.maxStepGPerCm2 ?? 0.25;
    this.maxStepCm = this.density.map((rho) => maxStepGPerCm2 / rho);
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

  /** Transports one incident electron (a contaminant of the beam) and everything it sets in motion. */
  runElectron(
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
    this.stack.push(ELECTRON, energyMeV, x, y, z, u, v, w, region, false);
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
    this.interact(energyMeV, x, y, z, u, v, w, region, true, 1, rng);
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
      const weight = s.weight[i] as number;
      if (kind === PHOTON) this.photon(e, x, y, z, u, v, w, region, flag, weight, rng);
      else
        transportElectron(this, kind === POSITRON, e, x, y, z, u, v, w, region, flag, weight, rng);
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
    weight: number,
    rng: Rng,
  ): void {
    if (e < this.gCut) {
      this.localDeposit(x, y, z, region, e * weight, false);
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
        this.tally.escapedMeV += e * weight;
        this.scorer.escape?.(PHOTON, e * weight, z, w, uncollided);
        return;
      }
      mu =
        atGrid((this.photonTables[region] as PhotonTables).muCm2PerG, pos) *
        (this.density[region] as number);
    }
    this.interact(e, x, y, z, u, v, w, region, uncollided, weight, rng);
  }

  /** Linear attenuation coefficient (1/cm) of `region` at a photon grid position. */
  photonMuCm(region: number, gridPosition: number): number {
    return (
      atGrid((this.photonTables[region] as PhotonTables).muCm2PerG, gridPosition) *
      (this.density[region] as number)
    );
  }

  /** Transports everything on the stack to the end. */
  drainStack(rng: Rng): void {
    this.drain(rng);
  }

  /**
   * One photon interaction at a point; charged products are `primary` when the photon was
   * uncollided. With `photonSurvival` < 1 the scattered photon meets a Russian roulette (kept
   * with that probability, its weight divided by it).
   */
  interact(
    e: number,
    x: number,
    y: number,
    z: number,
    u: number,
    v: number,
    w: number,
    region: number,
    primary: boolean,
    weight: number,
    rng: Rng,
    photonSurvival = 1,
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
      const s = this.stack;
      if (pn > 0) s.push(ELECTRON, te, x, y, z, px / pn, py / pn, pz / pn, region, primary, weight);
      else this.localDeposit(x, y, z, region, te * weight, primary);
      if (photonSurvival >= 1)
        s.push(PHOTON, c.scatteredMeV, x, y, z, d.u, d.v, d.w, region, false, weight);
      else if (rng.next() < photonSurvival) {
        const kept = weight / photonSurvival;
        this.tally.weightNetMeV += c.scatteredMeV * (kept - weight);
        s.push(PHOTON, c.scatteredMeV, x, y, z, d.u, d.v, d.w, region, false, kept);
      } else this.tally.weightNetMeV -= c.scatteredMeV * weight;
      return;
    }
    if (xi < atGrid(t.pComptonOrPhoto, pos) || e <= 2 * M) {
      this.tally.depositedMeV += e * weight;
      this.scorer.deposit(x, y, z, region, e * weight, primary);
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
    this.stack.push(ELECTRON, tMinus, x, y, z, d.u, d.v, d.w, region, primary, weight);
    d.u = u;
    d.v = v;
    d.w = w;
    rotateDirection(d, cosT, phi + Math.PI);
    this.stack.push(POSITRON, available - tMinus, x, y, z, d.u, d.v, d.w, region, primary, weight);
  }

  /** Deposits energy (already weighted) on the spot, as below a cutoff. */
  localDeposit(x: number, y: number, z: number, region: number, e: number, primary: boolean): void {
    this.tally.belowCutoffMeV += e;
    this.scorer.deposit(x, y, z, region, e, primary);
  }
}
