import { describe, expect, it } from 'vitest';
import { simulatePointKernel, radialBinIndex } from '../../src/engine/montecarlo/pointKernel';
import {
  muEnOverRhoCm2PerG,
  muOverRhoCm2PerG,
} from '../../src/engine/materials/photonCoefficients';
import { csdaRangeGPerCm2 } from '../../src/engine/materials/electronStopping';
import { ELECTRON_REST_ENERGY_MEV } from '../../src/engine/units';

const EDGES = [0.1, 0.2, 0.5, 1, 2, 5, 10, 30];
const sum = (a: Float64Array): number => a.reduce((s, v) => s + v, 0);

describe('simulatePointKernel', () => {
  it('simulatePointKernel(...) conserves energy: primary + scatter + escaped = 1 to 1e-9', () => {
    const r = simulatePointKernel({
      energyMeV: 6,
      histories: 2000,
      seed: 7,
      radialEdgesCm: EDGES,
      polarBins: 6,
    });
    expect(Math.abs(sum(r.primary) + sum(r.scatter) + r.escapedFraction - 1)).toBeLessThan(1e-9);
    expect(r.primary.length).toBe(EDGES.length * 6);
  });

  it('simulatePointKernel(...) gives the same kernel for the same seed and a different one for another seed', () => {
    const opts = { energyMeV: 2, histories: 500, radialEdgesCm: EDGES, polarBins: 4 };
    const a = simulatePointKernel({ ...opts, seed: 3 });
    const b = simulatePointKernel({ ...opts, seed: 3 });
    const c = simulatePointKernel({ ...opts, seed: 4 });
    expect(Array.from(a.primary)).toEqual(Array.from(b.primary));
    expect(Array.from(a.primary)).not.toEqual(Array.from(c.primary));
  });

  it('simulatePointKernel(...) primary energy fraction matches μ_en/μ of water at 2 MeV within 3σ + 1.5 %', () => {
    // Primary energy deposited per unit incident energy = μ_tr(1 − g)/μ = μ_en/μ for a forced
    // first interaction. NIST SRD 126 water: μ_en/ρ and μ/ρ at 2 MeV (library tables).
    // σ from 10 independent batches; the 1.5 % allowance covers the free-electron KN model
    // (−0.1 % vs XCOM incoherent) and the simplified bremsstrahlung yield.
    const fractions: number[] = [];
    for (let b = 0; b < 10; b++) {
      const r = simulatePointKernel({
        energyMeV: 2,
        histories: 800,
        seed: 100 + b,
        radialEdgesCm: EDGES,
        polarBins: 1,
      });
      fractions.push(sum(r.primary));
    }
    const mean = fractions.reduce((s, v) => s + v, 0) / fractions.length;
    const varMean =
      fractions.reduce((s, v) => s + (v - mean) ** 2, 0) /
      (fractions.length * (fractions.length - 1));
    const expected = muEnOverRhoCm2PerG('water', 2) / muOverRhoCm2PerG('water', 2);
    expect(Math.abs(mean - expected)).toBeLessThanOrEqual(
      3 * Math.sqrt(varMean) + 0.015 * expected,
    );
  });

  it('simulatePointKernel(...) deposits no primary energy beyond the CSDA range of the most energetic electron', () => {
    // A 2 MeV photon gives a Compton electron of at most E·2k/(1+2k); in CSDA transport the path
    // length is at most the ESTAR CSDA range, so nothing primary can land further out.
    const e = 2;
    const k = e / ELECTRON_REST_ENERGY_MEV;
    const tMax = (e * 2 * k) / (1 + 2 * k);
    const rangeCm = csdaRangeGPerCm2('water', tMax);
    const edges = [0.25, 0.5, rangeCm * 1.02, 2, 5, 20];
    const r = simulatePointKernel({
      energyMeV: e,
      histories: 3000,
      seed: 11,
      radialEdgesCm: edges,
      polarBins: 2,
    });
    const n = edges.length;
    for (let p = 0; p < 2; p++) for (let i = 3; i < n; i++) expect(r.primary[p * n + i]).toBe(0);
    expect(r.primary[0]).toBeGreaterThan(0);
  });

  it('simulatePointKernel(...) at 6 MeV puts more primary energy in the forward cone than backward', () => {
    const r = simulatePointKernel({
      energyMeV: 6,
      histories: 2000,
      seed: 5,
      radialEdgesCm: EDGES,
      polarBins: 6,
    });
    const n = EDGES.length;
    let forward = 0;
    let backward = 0;
    for (let i = 1; i < n; i++) {
      forward += r.primary[i] as number;
      backward += r.primary[5 * n + i] as number;
    }
    expect(forward).toBeGreaterThan(10 * backward);
  });

  it('radialBinIndex(...) puts a radius on an edge into the inner bin and clamps beyond the last edge', () => {
    expect(radialBinIndex([1, 2, 3], 0)).toBe(0);
    expect(radialBinIndex([1, 2, 3], 1)).toBe(0);
    expect(radialBinIndex([1, 2, 3], 1.0001)).toBe(1);
    expect(radialBinIndex([1, 2, 3], 2.5)).toBe(2);
    expect(radialBinIndex([1, 2, 3], 9)).toBe(2);
  });

  it('simulatePointKernel(...) rejects unordered edges', () => {
    expect(() =>
      simulatePointKernel({
        energyMeV: 1,
        histories: 1,
        seed: 1,
        radialEdgesCm: [1, 0.5],
        polarBins: 1,
      }),
    ).toThrow(/ascending/);
  });
});
