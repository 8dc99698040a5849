import { describe, expect, it } from 'vitest';
import { makeSpectrumSampler } from '../../../src/engine/montecarlo/spectrumSampler';
import { Rng } from '../../../src/engine/montecarlo/rng';
import { rotateDirection } from '../../../src/engine/montecarlo/direction';
import { slabGeometry, sphereGeometry } from '../../../src/engine/montecarlo/geometry';
import { makeSlabPhantom } from '../../../src/engine/phantom/slabPhantom';
import { BatchAccumulator, statistics } from '../../../src/engine/montecarlo/batchStatistics';
import { depthOfMaximum } from '../../../src/engine/montecarlo/depthDose';
import { binOfDepth, sampleBinsAtDepths } from '../../../src/engine/montecarlo/gridSampling';
import { sampleDivergentRay } from '../../../src/engine/montecarlo/beamSource';
import { planMonteCarlo } from '../../../src/engine/montecarlo/monteCarloPlan';
import { expectRelClose } from '../../helpers/expectClose';
import { DepthDoseScorer } from '../../../src/engine/montecarlo/depthDoseScorer';
import {
  DEFAULT_BINNING,
  scoringGrid,
  type McScenario,
} from '../../../src/engine/montecarlo/scenario';

describe('makeSpectrumSampler', () => {
  it('makeSpectrumSampler("6MV") samples the Mohan 6 MV spectrum: mean energy 1.90 MeV within 4σ', () => {
    // Fluence-weighted mean energy of the Mohan et al. (1985) 6 MV spectrum, bins uniform: 1.90 MeV
    // (derived, physics data §6d, to 3 digits).
    const s = makeSpectrumSampler('6MV');
    expectRelClose(s.meanEnergyMeV, 1.9, 0.005);
    const rng = new Rng(8, 0);
    const n = 50000;
    let sum = 0;
    let sum2 = 0;
    let outside = 0;
    for (let i = 0; i < n; i++) {
      const e = s.sample(rng);
      if (e < 0 || e > 6) outside++;
      sum += e;
      sum2 += e * e;
    }
    const mean = sum / n;
    const sd = Math.sqrt(sum2 / n - mean * mean);
    expect(outside).toBe(0);
    expect(Math.abs(mean - s.meanEnergyMeV)).toBeLessThan((4 * sd) / Math.sqrt(n));
  });

  it('makeSpectrumSampler("Co-60") puts about two thirds of photons in the two line bins', () => {
    // Rogers et al. in-beam Co-60: line bins 0.53814 each of a total 1.6237 counts → 0.663.
    const s = makeSpectrumSampler('Co-60');
    const rng = new Rng(9, 0);
    let lines = 0;
    const n = 20000;
    for (let i = 0; i < n; i++) {
      const e = s.sample(rng);
      if ((e > 1.165 && e <= 1.175) || (e > 1.325 && e <= 1.335)) lines++;
    }
    // Binomial σ ≈ 0.0033 on the fraction; bound 4σ.
    expect(Math.abs(lines / n - 0.663)).toBeLessThan(0.014);
    expect(makeSpectrumSampler('18MV').approximate).toBe(true);
  });
});

describe('geometry and directions', () => {
  it('slabGeometry(...) measures distances to the layer faces along oblique directions', () => {
    const g = slabGeometry(
      makeSlabPhantom([
        { materialId: 'water', thicknessCm: 2 },
        { materialId: 'lung', thicknessCm: 3 },
      ]),
    );
    expect(g.distanceToBoundary(0, 0, 0, 0.5, 0, 0.6, 0.8)).toBeCloseTo(1.5 / 0.8, 12);
    expect(g.distanceToBoundary(1, 0, 0, 4, 0, 0, -1)).toBeCloseTo(2, 12);
    expect(g.distanceToBoundary(1, 0, 0, 4, 1, 0, 0)).toBe(Infinity);
    expect(g.regionAfterCrossing(0, 0, 0, 2, 0, 0, 1)).toBe(1);
    expect(g.regionAfterCrossing(1, 0, 0, 5, 0, 0, 1)).toBe(-1);
    expect(g.regionAfterCrossing(0, 0, 0, 0, 0, 0, -1)).toBe(-1);
    expect(g.snapZ(1, -1)).toBe(2);
  });

  it('sphereGeometry(...) gives the chord to the surface from an inside point', () => {
    const g = sphereGeometry(5, { materialId: 'water', densityGPerCm3: 1 });
    expect(g.distanceToBoundary(0, 0, 0, 0, 0, 0, 1)).toBeCloseTo(5, 12);
    expect(g.distanceToBoundary(0, 3, 0, 0, -1, 0, 0)).toBeCloseTo(8, 12);
  });

  it('rotateDirection(...) keeps unit length and turns by the requested angle', () => {
    const d = { u: 0.3, v: -0.4, w: Math.sqrt(1 - 0.25) };
    const before = { ...d };
    rotateDirection(d, 0.6, 1.1);
    expect(Math.hypot(d.u, d.v, d.w)).toBeCloseTo(1, 12);
    expect(d.u * before.u + d.v * before.v + d.w * before.w).toBeCloseTo(0.6, 12);
    const pole = { u: 0, v: 0, w: 1 };
    rotateDirection(pole, -0.2, 0.3);
    expect(pole.w).toBeCloseTo(-0.2, 12);
  });

  it('sampleDivergentRay(...) aims within the field at 100 cm and enters the surface at SSD scale', () => {
    const rng = new Rng(4, 0);
    const ray = { x: 0, y: 0, u: 0, v: 0, w: 1 };
    for (let i = 0; i < 200; i++) {
      sampleDivergentRay(90, 10, 6, rng, ray);
      // Projected to 100 cm from the source the ray lies in the 10 × 6 field.
      expect(Math.abs((ray.u / ray.w) * 100)).toBeLessThanOrEqual(5);
      expect(Math.abs((ray.v / ray.w) * 100)).toBeLessThanOrEqual(3);
      expect(ray.x).toBeCloseTo((ray.u / ray.w) * 90, 10);
    }
  });
});

describe('statistics and binned curves', () => {
  it('statistics(...) returns the history-weighted mean and the batch standard error', () => {
    const b = (x: number): { values: Float64Array; histories: number } => ({
      values: Float64Array.of(x * 10),
      histories: 10,
    });
    const s = statistics([b(1), b(2), b(3), b(4)]);
    expect(s.mean[0]).toBeCloseTo(2.5, 12);
    // Batch means 1..4: s² = 5/3, s_x̄ = √(5/3/4).
    expect(s.sigma[0]).toBeCloseTo(Math.sqrt(5 / 12), 12);
    expect(Number.isNaN(statistics([b(1)]).sigma[0])).toBe(true);
  });

  it('caxPairStatistics(...) is the batch statistics of a·bin i + b·bin j (derived)', () => {
    const acc = new BatchAccumulator(3);
    const tally = (b: number, x: number, y: number) => ({
      batchIndex: b,
      histories: 10,
      caxMeV: Float64Array.of(x * 10, y * 10),
      lateralMeV: new Float64Array(0),
      energy: {
        incidentMeV: 0,
        depositedMeV: 0,
        escapedMeV: 0,
        belowCutoffMeV: 0,
        weightNetMeV: 0,
      },
      elapsedMs: 0,
    });
    acc.add(tally(0, 1, 3));
    acc.add(tally(1, 2, 1));
    acc.add(tally(2, 3, 2));
    // Per batch 0.5·x + 0.5·y = 2, 1.5, 2.5: mean 2, s² = 0.25, s_x̄ = √(0.25/3).
    const s = acc.caxPairStatistics(0, 0.5, 1, 0.5);
    expect(s.mean).toBeCloseTo(2, 12);
    expect(s.sigma).toBeCloseTo(Math.sqrt(0.25 / 3), 12);
    // The two bins alone have σ 1/√3 each: a reading between them that ignored their
    // (negative) correlation would report √(0.5²+0.5²)/√3 = 0.41 instead of 0.29.
    expect(s.sigma).toBeLessThan(Math.SQRT1_2 / Math.sqrt(3));
  });

  it('depthOfMaximum(...) recovers the vertex of a parabolic peak between bin centres', () => {
    const edges = Array.from({ length: 21 }, (_, i) => i * 0.25);
    const dose = edges.slice(0, 20).map((_, i) => 10 - ((i + 0.5) * 0.25 - 2.3) ** 2);
    const m = depthOfMaximum({
      edgesCm: edges,
      dosePerFluenceGyCm2: dose,
      sigmaGyCm2: dose.map(() => 0),
    });
    expect(m.depthCm).toBeCloseTo(2.3, 9);
    expect(m.value).toBeCloseTo(10, 9);
  });

  it('sampleBinsAtDepths(...) interpolates inside a layer and steps at an interface', () => {
    const phantom = makeSlabPhantom([
      { materialId: 'water', thicknessCm: 1 },
      { materialId: 'lung', thicknessCm: 1 },
    ]);
    const values = [1, 2, 3, 4];
    const r = sampleBinsAtDepths(
      phantom,
      0.5,
      values,
      [0, 0, 0, 0],
      [0, 0.5, 0.6, 1.0, 1.25, 1.5, 2],
    );
    // 0 → first bin (clamped); 0.5 → between centres 0.25 and 0.75 (both water) = 1.5;
    // 0.6 → 1.7; 1.0 on the interface belongs upstream (bin 1, water, neighbour across) = 2;
    // 1.25 → bin 2 centre = 3; 1.5 → between 1.25 and 1.75 = 3.5; 2 → last bin = 4.
    expect(r.value.map((v) => Math.round(v * 1e9) / 1e9)).toEqual([1, 1.5, 1.7, 2, 3, 3.5, 4]);
    expect(binOfDepth(1.0, 0.5, 4)).toBe(1);
  });

  it('planMonteCarlo(...) simulates a water case once and rejects too few histories', () => {
    const plan = planMonteCarlo(
      {
        beam: { energy: '6MV', setup: { kind: 'SSD', ssdCm: 100 }, fieldXCm: 10, fieldYCm: 10 },
        layers: [{ materialId: 'water', thicknessCm: 30 }],
        points: [],
      },
      { histories: 100000, seed: 1 },
    );
    // Water, 10 × 10, SSD 100, 30 cm: case = water run = calibration run.
    expect(plan.scenarios).toHaveLength(1);
    expect(plan.batches).toBe(10);
    expect(() =>
      planMonteCarlo(
        {
          ...plan.scenarios[0]!,
          beam: { energy: '6MV', setup: { kind: 'SSD', ssdCm: 100 }, fieldXCm: 10, fieldYCm: 10 },
          points: [],
        },
        { histories: 5, seed: 1 },
      ),
    ).toThrow(/histories/);
  });
});

describe('depth scoring', () => {
  const scenario: McScenario = {
    energy: '6MV',
    ssdCm: 100,
    fieldXCm: 10,
    fieldYCm: 10,
    layers: [{ materialId: 'water', thicknessCm: 10 }],
  };

  it('depositAlong(...) spreads a leg over the bins it crosses in proportion to its path in each (derived)', () => {
    const scorer = new DepthDoseScorer(scoringGrid(scenario, DEFAULT_BINNING));
    // From z = 0.1 to 0.85 cm straight down: 0.15, 0.25, 0.25, 0.10 cm in bins 0–3 of 0.25 cm.
    scorer.depositAlong(0, 0, 0.1, 0, 0, 1, 0.75, 0, 7.5);
    const firstFour = [...scorer.caxMeV.slice(0, 4)].map((v) => Math.round(v * 1e9) / 1e9);
    expect(firstFour).toEqual([1.5, 2.5, 2.5, 1]);
    // Upwards, obliquely (w = −0.5): 1 cm of path covers 0.5 cm of depth, from 1.0 to 0.5 cm.
    const up = new DepthDoseScorer(scoringGrid(scenario, DEFAULT_BINNING));
    up.depositAlong(0, 0, 1.0, Math.sqrt(0.75), 0, -0.5, 1, 0, 4);
    expect([...up.caxMeV.slice(0, 4)].map((v) => Math.round(v * 1e9) / 1e9)).toEqual([0, 0, 2, 2]);
  });
});
