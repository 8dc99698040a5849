// Variance reduction for the points of interest: the incident photon's first interaction forced
// into the depths that feed them (forced collision, Kahn 1956). Most of the dose at a point comes
// from electrons set in motion by the incident photons within an electron range upstream, where
// only a few per cent of the photons interact: in analogue transport most histories miss the point
// and a few hit it, and that lottery is most of the variance. Here the incident photon, on its
// straight path along the ray, is split exactly in two:
// - for each forcing interval, a copy that interacts inside it, with weight W = e^(−τ_before) ·
//   (1 − e^(−τ_in)) (the probability of that happening) at an optical depth drawn from the
//   exponential truncated to the interval; its scattered photon meets a roulette of survival W,
//   so that the copies add electrons near the points, not photons everywhere;
// - the photon itself, transported as usual except that it crosses every forcing interval
//   uncollided, its weight multiplied by e^(−τ_in) (memorylessness: its remaining optical depth
//   carries over).
// The two parts add up to the analogue expectation for every score, everywhere: the method is
// unbiased; the energy book holds exactly with the weight changes counted (EnergyTally.weightNet).
import type { DepthZone } from './chargedRoulette';
import type { McGeometry } from './geometry';
import { photonGridPosition } from './photonCrossSections';
import { PHOTON } from './particleStack';
import type { Rng } from './rng';
import type { Transport } from './transport';

/** The incident ray cut into pieces of one region each, marked when inside a forcing interval. */
export class ForcedRay {
  readonly startCm: Float64Array;
  readonly lengthCm: Float64Array;
  readonly region: Int32Array;
  /** Index of the forcing interval a piece belongs to, or −1. */
  readonly interval: Int32Array;
  readonly intervals: number;
  /** Optical depth of each piece for the photon in hand (scratch). */
  private readonly tau: Float64Array;

  constructor(
    geometry: McGeometry,
    readonly x: number,
    readonly y: number,
    readonly z: number,
    readonly u: number,
    readonly v: number,
    readonly w: number,
    region: number,
    forcedCm: readonly DepthZone[],
  ) {
    if (!(w > 0)) throw new RangeError('forced interactions need a ray entering downwards (w > 0)');
    // Region segments along the ray.
    const cuts: { s: number; region: number }[] = [];
    let s = 0;
    for (let r = region; r >= 0;) {
      const px = x + u * s,
        py = y + v * s,
        pz = z + w * s;
      const db = Math.max(0, geometry.distanceToBoundary(r, px, py, pz, u, v, w));
      cuts.push({ s, region: r });
      s += db;
      r = geometry.regionAfterCrossing(r, x + u * s, y + v * s, z + w * s, u, v, w);
    }
    const endS = s;
    // Forcing edges (depth → path length), merged intervals in depth order.
    const merged = [...forcedCm]
      .filter((f) => f.toCm > f.fromCm)
      .sort((a, b) => a.fromCm - b.fromCm)
      .reduce<DepthZone[]>((out, f) => {
        const last = out[out.length - 1];
        if (last && f.fromCm <= last.toCm) last.toCm = Math.max(last.toCm, f.toCm);
        else out.push({ ...f });
        return out;
      }, []);
    const edges = new Set<number>([0, endS, ...cuts.map((c) => c.s)]);
    for (const f of merged)
      for (const d of [f.fromCm, f.toCm]) {
        const se = (d - z) / w;
        if (se > 0 && se < endS) edges.add(se);
      }
    const sorted = [...edges].sort((a, b) => a - b);
    const start: number[] = [];
    const length: number[] = [];
    const regions: number[] = [];
    const interval: number[] = [];
    for (let k = 0; k + 1 < sorted.length; k++) {
      const a = sorted[k] as number;
      const b = sorted[k + 1] as number;
      if (!(b > a)) continue;
      const mid = 0.5 * (a + b);
      let c = 0;
      while (c + 1 < cuts.length && cuts[c + 1]!.s <= mid) c++;
      const depth = z + w * mid;
      start.push(a);
      length.push(b - a);
      regions.push(cuts[c]!.region);
      interval.push(merged.findIndex((f) => depth > f.fromCm && depth < f.toCm));
    }
    this.startCm = Float64Array.from(start);
    this.lengthCm = Float64Array.from(length);
    this.region = Int32Array.from(regions);
    this.interval = Int32Array.from(interval);
    this.intervals = merged.length;
    this.tau = new Float64Array(start.length);
  }

  /** Transports one incident photon of energy `e` along the ray with forced interactions. */
  run(tr: Transport, e: number, rng: Rng): void {
    tr.tally.incidentMeV += e;
    const pos = photonGridPosition(e);
    const n = this.tau.length;
    for (let k = 0; k < n; k++)
      this.tau[k] = tr.photonMuCm(this.region[k] as number, pos) * (this.lengthCm[k] as number);
    // Forced copies, one per interval.
    let before = 0;
    for (let k = 0; k < n;) {
      const iv = this.interval[k] as number;
      if (iv < 0) {
        before += this.tau[k] as number;
        k++;
        continue;
      }
      let end = k;
      let inside = 0;
      while (end < n && this.interval[end] === iv) inside += this.tau[end++] as number;
      const hit = -Math.expm1(-inside);
      const weight = Math.exp(-before) * hit;
      if (weight > 0) {
        // Optical depth into the interval, from the exponential truncated to it.
        let t = -Math.log1p(-rng.next() * hit);
        let j = k;
        while (j < end - 1 && t > (this.tau[j] as number)) t -= this.tau[j++] as number;
        const mu = (this.tau[j] as number) / (this.lengthCm[j] as number);
        const s = (this.startCm[j] as number) + Math.min(t / mu, this.lengthCm[j] as number);
        tr.tally.weightNetMeV += e * weight;
        tr.interact(
          e,
          this.x + this.u * s,
          this.y + this.v * s,
          this.z + this.w * s,
          this.u,
          this.v,
          this.w,
          this.region[j] as number,
          true,
          weight,
          rng,
          weight,
        );
      }
      before += inside;
      k = end;
    }
    // The photon itself: collides only outside the intervals, loses weight crossing them.
    let weight = 1;
    let t = -Math.log(rng.next());
    let k = 0;
    for (; k < n; k++) {
      const tk = this.tau[k] as number;
      if ((this.interval[k] as number) >= 0) {
        const kept = weight * Math.exp(-tk);
        tr.tally.weightNetMeV -= e * (weight - kept);
        weight = kept;
        continue;
      }
      if (t < tk) break;
      t -= tk;
    }
    if (k < n) {
      const mu = (this.tau[k] as number) / (this.lengthCm[k] as number);
      const s = (this.startCm[k] as number) + t / mu;
      tr.interact(
        e,
        this.x + this.u * s,
        this.y + this.v * s,
        this.z + this.w * s,
        this.u,
        this.v,
        this.w,
        this.region[k] as number,
        true,
        weight,
        rng,
      );
    } else {
      const s = n > 0 ? (this.startCm[n - 1] as number) + (this.lengthCm[n - 1] as number) : 0;
      tr.tally.escapedMeV += e * weight;
      tr.scorer.escape?.(PHOTON, e * weight, this.z + this.w * s, this.w, true);
    }
    tr.drainStack(rng);
  }
}
