// A struct-of-arrays stack of particles waiting to be transported (no allocation per particle).

export const PHOTON = 0;
export const ELECTRON = 1;
export const POSITRON = 2;
export type ParticleKind = typeof PHOTON | typeof ELECTRON | typeof POSITRON;

export class ParticleStack {
  size = 0;
  private capacity: number;
  kind: Int8Array;
  region: Int32Array;
  /** For charged particles: set in motion by the first interaction of an incident photon. For photons: never interacted. */
  flag: Uint8Array;
  energyMeV: Float64Array;
  /** Statistical weight (1 unless variance reduction changed it); scores are energy × weight. */
  weight: Float64Array;
  x: Float64Array;
  y: Float64Array;
  z: Float64Array;
  u: Float64Array;
  v: Float64Array;
  w: Float64Array;

  constructor(capacity = 256) {
    this.capacity = capacity;
    this.kind = new Int8Array(capacity);
    this.region = new Int32Array(capacity);
    this.flag = new Uint8Array(capacity);
    this.energyMeV = new Float64Array(capacity);
    this.weight = new Float64Array(capacity);
    this.x = new Float64Array(capacity);
    this.y = new Float64Array(capacity);
    this.z = new Float64Array(capacity);
    this.u = new Float64Array(capacity);
    this.v = new Float64Array(capacity);
    this.w = new Float64Array(capacity);
  }

  push(
    kind: ParticleKind,
    energyMeV: number,
    x: number,
    y: number,
    z: number,
    u: number,
    v: number,
    w: number,
    region: number,
    flag: boolean,
    weight = 1,
  ): void {
    if (this.size === this.capacity) this.grow();
    const i = this.size++;
    this.kind[i] = kind;
    this.energyMeV[i] = energyMeV;
    this.x[i] = x;
    this.y[i] = y;
    this.z[i] = z;
    this.u[i] = u;
    this.v[i] = v;
    this.w[i] = w;
    this.region[i] = region;
    this.flag[i] = flag ? 1 : 0;
    this.weight[i] = weight;
  }

  private grow(): void {
    const c = this.capacity * 2;
    const g = <T extends Float64Array | Int32Array | Int8Array | Uint8Array>(
      a: T,
      make: (n: number) => T,
    ): T => {
      const b = make(c);
      b.set(a);
      return b;
    };
    this.kind = g(this.kind, (n) => new Int8Array(n));
    this.region = g(this.region, (n) => new Int32Array(n));
    this.flag = g(this.flag, (n) => new Uint8Array(n));
    this.energyMeV = g(this.energyMeV, (n) => new Float64Array(n));
    this.weight = g(this.weight, (n) => new Float64Array(n));
    this.x = g(this.x, (n) => new Float64Array(n));
    this.y = g(this.y, (n) => new Float64Array(n));
    this.z = g(this.z, (n) => new Float64Array(n));
    this.u = g(this.u, (n) => new Float64Array(n));
    this.v = g(this.v, (n) => new Float64Array(n));
    this.w = g(this.w, (n) => new Float64Array(n));
    this.capacity = c;
  }
}
