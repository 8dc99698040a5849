// Condensed-history transport of one electron or positron (class I): CSDA steps limited by a
// fractional energy loss, by a maximum mass thickness (g/cm², see TransportOptions) and at every
// boundary; collision loss deposited along each straight leg (spread over it when the scorer can,
// else at its midpoint), radiative loss banked and
// emitted at the end of the track as one bremsstrahlung photon from the track's start along its
// initial direction (opened by θ = m_ec²/E); multiple scattering by Highland's formula (PDG form)
// at a random hinge point of each step; positrons annihilate at rest into two 0.511 MeV photons,
// back to back, isotropic. A particle that cannot reach a zone of interest first meets the
// roulette (chargedRoulette.ts), when the run uses one; scores carry the particle's weight.
import { ELECTRON_REST_ENERGY_MEV } from '../units';
import type { McGeometry } from './geometry';
import { atGrid } from './photonCrossSections';
import { electronGridPosition, type ElectronTables } from './electronTables';
import { rotateDirection, type Direction } from './direction';
import { ELECTRON, PHOTON, POSITRON, type ParticleStack } from './particleStack';
import type { EnergyTally, McScorer } from './transportTypes';
import type { Rng } from './rng';
import type { ChargedRoulette } from './chargedRoulette';

const M = ELECTRON_REST_ENERGY_MEV;
const TWO_PI = 2 * Math.PI;

/** What electron transport shares with the photon transport of the same history. */
export interface ElectronContext {
  readonly geometry: McGeometry;
  readonly scorer: McScorer;
  readonly stack: ParticleStack;
  readonly tally: EnergyTally;
  readonly electronTables: readonly ElectronTables[];
  readonly density: Float64Array;
  readonly x0Cm: Float64Array;
  readonly eCut: number;
  readonly fLoss: number;
  readonly maxStepCm: Float64Array;
  readonly dir: Direction;
  readonly roulette: ChargedRoulette | undefined;
  localDeposit(x: number, y: number, z: number, region: number, e: number, primary: boolean): void;
}

export function transportElectron(
  ctx: ElectronContext,
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
  weight: number,
  rng: Rng,
): void {
  const rr = ctx.roulette;
  // A particle that already won a roulette (weight above 1) plays no more: weights stay ≤ 1/p.
  if (rr && weight <= 1 && !rr.canReach(z, region, t)) {
    // A positron's book includes the 2m_ec² its annihilation (or escape) gives back.
    const carried = weight * (positron ? t + 2 * M : t);
    if (rng.next() >= rr.survival) {
      ctx.tally.weightNetMeV -= carried;
      return;
    }
    ctx.tally.weightNetMeV += carried * (rr.weightGain - 1);
    weight *= rr.weightGain;
  }
  const x0 = x,
    y0 = y,
    z0 = z,
    u0 = u,
    v0 = v,
    w0 = w,
    r0 = region,
    t0 = t;
  const d = ctx.dir;
  const alongLeg = ctx.scorer.depositAlong !== undefined;
  let bank = 0;
  let escaped = false;
  while (t > ctx.eCut) {
    const tables = ctx.electronTables[region] as ElectronTables;
    const rho = ctx.density[region] as number;
    let dE = ctx.fLoss * t;
    const mid = electronGridPosition(t - 0.5 * dE);
    const sTot = atGrid(tables.totalMeVCm2PerG, mid) * rho;
    const fCol = atGrid(tables.collisionFraction, mid);
    let step = dE / sTot;
    const maxStep = ctx.maxStepCm[region] as number;
    if (step > maxStep) {
      step = maxStep;
      dE = step * sTot;
    }
    const hinge = rng.next() * step;
    let crossed = false;
    // Two legs: hinge, deflect, rest. A boundary ends the step early (no deflection after it).
    for (let leg = 0; leg < 2; leg++) {
      const len = leg === 0 ? hinge : step - hinge;
      const db = Math.max(0, ctx.geometry.distanceToBoundary(region, x, y, z, u, v, w));
      const go = db < len ? db : len;
      const lost = (dE * go) / step;
      const colUnweighted = lost * fCol;
      const col = colUnweighted * weight;
      ctx.tally.depositedMeV += col;
      if (alongLeg) ctx.scorer.depositAlong!(x, y, z, u, v, w, go, region, col, primary);
      else
        ctx.scorer.deposit(
          x + 0.5 * go * u,
          y + 0.5 * go * v,
          z + 0.5 * go * w,
          region,
          col,
          primary,
        );
      bank += lost - colUnweighted;
      t -= lost;
      x += u * go;
      y += v * go;
      z += w * go;
      if (db < len) {
        const snap = ctx.geometry.snapZ(region, w);
        if (!Number.isNaN(snap)) z = snap;
        region = ctx.geometry.regionAfterCrossing(region, x, y, z, u, v, w);
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
        const x0 = ctx.x0Cm[region] as number;
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
    const carried = (positron ? t + 2 * M : t) * weight;
    ctx.tally.escapedMeV += carried;
    ctx.scorer.escape?.(positron ? POSITRON : ELECTRON, carried, z, w, false);
  } else {
    ctx.localDeposit(x, y, z, region, t * weight, primary);
    if (positron) {
      const cosT = 2 * rng.next() - 1;
      const sinT = Math.sqrt(1 - cosT * cosT);
      const phi = TWO_PI * rng.next();
      const au = sinT * Math.cos(phi),
        av = sinT * Math.sin(phi);
      ctx.stack.push(PHOTON, M, x, y, z, au, av, cosT, region, false, weight);
      ctx.stack.push(PHOTON, M, x, y, z, -au, -av, -cosT, region, false, weight);
    }
  }
  if (bank > 0) {
    // One bremsstrahlung photon carrying the track's radiative loss.
    d.u = u0;
    d.v = v0;
    d.w = w0;
    rotateDirection(d, Math.cos(M / (t0 + M)), TWO_PI * rng.next());
    ctx.stack.push(PHOTON, bank, x0, y0, z0, d.u, d.v, d.w, r0, false, weight);
  }
}
