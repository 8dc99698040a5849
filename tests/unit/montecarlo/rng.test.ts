import { describe, expect, it } from 'vitest';
import { Rng, mix32 } from '../../../src/engine/montecarlo/rng';

describe('Rng', () => {
  it('Rng(seed, history) repeats the same stream for the same (seed, history)', () => {
    const a = new Rng(42, 1000);
    const b = new Rng(1, 1);
    b.seedHistory(42, 1000);
    for (let i = 0; i < 100; i++) expect(a.next()).toBe(b.next());
  });

  it('Rng streams differ between neighbouring histories and seeds', () => {
    const first = (seed: number, h: number): number => new Rng(seed, h).nextUint32();
    const seen = new Set<number>();
    for (let h = 0; h < 1000; h++) seen.add(first(9, h));
    for (let s = 0; s < 1000; s++) seen.add(first(s, 0));
    // 2000 draws of 32 bits: a collision has probability ~5e-4; allow at most one.
    expect(seen.size).toBeGreaterThanOrEqual(1999);
  });

  it('Rng.next() stays inside (0, 1) with mean 1/2 and variance 1/12', () => {
    const r = new Rng(3, 0);
    const n = 200000;
    let s = 0;
    let s2 = 0;
    let outside = 0;
    for (let i = 0; i < n; i++) {
      const x = r.next();
      if (!(x > 0 && x < 1)) outside++;
      s += x;
      s2 += x * x;
    }
    expect(outside).toBe(0);
    const mean = s / n;
    // Uniform(0,1): σ of the mean = √(1/12)/√n ≈ 6.5e-4; bound 4σ.
    expect(Math.abs(mean - 0.5)).toBeLessThan(4 * Math.sqrt(1 / 12 / n));
    // Variance 1/12: its sampling σ ≈ √(1/180)/√n ≈ 1.7e-4; bound 4σ.
    expect(Math.abs(s2 / n - mean * mean - 1 / 12)).toBeLessThan(4 * Math.sqrt(1 / 180 / n));
  });

  it('Rng.next() has no visible lag-1 correlation', () => {
    const r = new Rng(5, 77);
    const n = 100000;
    let prev = r.next();
    let sxy = 0;
    for (let i = 0; i < n; i++) {
      const x = r.next();
      sxy += (prev - 0.5) * (x - 0.5);
      prev = x;
    }
    // Independent uniforms: E[(x−½)(y−½)] = 0 with σ = (1/12)/√n; bound 4σ.
    expect(Math.abs(sxy / n)).toBeLessThan((4 * (1 / 12)) / Math.sqrt(n));
  });

  it('mix32(...) returns unsigned 32-bit integers', () => {
    for (const x of [0, 1, -1, 0x7fffffff, 123456789]) {
      const m = mix32(x);
      expect(Number.isInteger(m) && m >= 0 && m < 2 ** 32).toBe(true);
    }
  });
});
