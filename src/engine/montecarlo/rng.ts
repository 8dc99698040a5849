// Counter-based seeding and a small fast generator for the Monte Carlo engine.
// Every history gets its own stream, seeded from (runSeed, historyIndex) by a splitmix32-style
// integer hash, so a run gives the same answer however its histories are split among workers.
// Generator: xoshiro128** (Blackman & Vigna, "Scrambled linear pseudorandom number generators",
// ACM TOMS 47 (2021)); 128-bit state, period 2^128 − 1, ample for one history.

/** One step of the splitmix32 mixer (a 32-bit finaliser in the MurmurHash3 family). */
export function mix32(x: number): number {
  let z = (x + 0x9e3779b9) | 0;
  z = Math.imul(z ^ (z >>> 16), 0x85ebca6b);
  z = Math.imul(z ^ (z >>> 13), 0xc2b2ae35);
  return (z ^ (z >>> 16)) >>> 0;
}

const TWO_POW_MINUS_32 = 1 / 4294967296;

/** A seedable uniform generator; `next()` returns a float strictly inside (0, 1). */
export class Rng {
  private s0 = 0;
  private s1 = 0;
  private s2 = 0;
  private s3 = 0;

  constructor(runSeed = 1, historyIndex = 0) {
    this.seedHistory(runSeed, historyIndex);
  }

  /** Re-seed for one history: the stream depends only on (runSeed, historyIndex). */
  seedHistory(runSeed: number, historyIndex: number): void {
    // historyIndex may exceed 2^32: fold its high part in separately.
    const lo = historyIndex >>> 0;
    const hi = Math.floor(historyIndex / 4294967296) >>> 0;
    let h = mix32((runSeed >>> 0) ^ 0x5bd1e995);
    h = mix32(h ^ hi);
    h = mix32(h ^ lo);
    this.s0 = mix32(h);
    this.s1 = mix32(this.s0 ^ 0x27d4eb2d);
    this.s2 = mix32(this.s1 ^ 0x165667b1);
    this.s3 = mix32(this.s2 ^ 0xd3a2646c);
    if ((this.s0 | this.s1 | this.s2 | this.s3) === 0) this.s0 = 1;
  }

  /** Next raw 32-bit output (unsigned). */
  nextUint32(): number {
    const s1 = this.s1;
    const x = Math.imul(s1, 5);
    const result = Math.imul((x << 7) | (x >>> 25), 9) >>> 0;
    const t = s1 << 9;
    this.s2 ^= this.s0;
    this.s3 ^= this.s1;
    this.s1 ^= this.s2;
    this.s0 ^= this.s3;
    this.s2 ^= t;
    this.s3 = (this.s3 << 11) | (this.s3 >>> 21);
    return result;
  }

  /** Uniform float in the open interval (0, 1), safe for −ln(ξ). */
  next(): number {
    return (this.nextUint32() + 0.5) * TWO_POW_MINUS_32;
  }
}
