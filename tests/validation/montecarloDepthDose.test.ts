import { describe, expect, it } from 'vitest';
import { runBatch } from '../../src/engine/montecarlo/runBatch';
import { BatchAccumulator } from '../../src/engine/montecarlo/batchStatistics';
import {
  depthDoseFromStatistics,
  depthOfMaximum,
  type McDepthDose,
} from '../../src/engine/montecarlo/depthDose';
import { scoringGrid, type McBinning, type McScenario } from '../../src/engine/montecarlo/scenario';
import type { TransportOptions } from '../../src/engine/montecarlo/transport';
import { directColumnDose } from '../../src/engine/montecarlo/directColumn';

function simulate(
  scenario: McScenario,
  batches: number,
  perBatch: number,
  seed: number,
  binning: McBinning,
  transport?: TransportOptions,
): McDepthDose {
  const acc = new BatchAccumulator(batches);
  for (let b = 0; b < batches; b++)
    acc.add(
      runBatch({
        scenario,
        binning,
        seed,
        batchIndex: b,
        historiesPerBatch: perBatch,
        ...(transport ? { transport } : {}),
      }),
    );
  return depthDoseFromStatistics(scenario, scoringGrid(scenario, binning), acc.caxStatistics());
}

/** Mean dose and its 1σ over the bins whose centres lie in [fromCm, toCm]. */
function windowMean(d: McDepthDose, fromCm: number, toCm: number): { mean: number; sigma: number } {
  let s = 0;
  let v = 0;
  let n = 0;
  d.dosePerFluenceGyCm2.forEach((x, i) => {
    const c = ((d.edgesCm[i] as number) + (d.edgesCm[i + 1] as number)) / 2;
    if (c >= fromCm && c <= toCm) {
      s += x;
      v += (d.sigmaGyCm2[i] as number) ** 2;
      n++;
    }
  });
  return { mean: s / n, sigma: Math.sqrt(v) / n };
}

// 0.25 cm bins: 0.5 cm bins bias the fitted d_max deeper by ~0.4 cm at 6 MV (asymmetric build-up).
const PDD_BINS: McBinning = { depthBinCm: 0.25, lateralBinCm: 0.5, lateralMarginCm: 2 };
const water = (thicknessCm: number): McScenario['layers'] => [{ materialId: 'water', thicknessCm }];

describe('Monte Carlo water depth dose (typical published beams, from memory)', () => {
  it.each([
    // Typical published 10 × 10 cm², SSD 100 beams (from memory): 6 MV d_max 1.2–1.8 cm, PDD(10)
    // 64–69 %; 18 MV d_max 2.8–3.8 cm, PDD(10) 76–82 %. The 18 MV spectrum is a derived stand-in
    // tuned on PDD(10) and TPR20,10 (its one parameter fitted with the superposition engine), so
    // d_max is an independent check. The contaminant electrons from the head, which pull a
    // measured d_max shallower, are launched with the photons (fitted model).
    { energy: '6MV' as const, histories: 300000, dmax: [1.2, 1.8], pdd10: [64, 69] },
    { energy: '18MV' as const, histories: 200000, dmax: [2.8, 3.8], pdd10: [76, 82] },
  ])(
    '$energy 10 × 10 SSD 100: d_max and PDD(10) fall in the checked ranges',
    ({ energy, histories, dmax, pdd10 }) => {
      const d = simulate(
        { energy, ssdCm: 100, fieldXCm: 10, fieldYCm: 10, layers: water(25) },
        10,
        histories / 10,
        2026,
        PDD_BINS,
      );
      const max = depthOfMaximum(d);
      const at10 = windowMean(d, 9.5, 10.5); // dose is linear enough over ±0.5 cm for the mean to equal the centre value
      const pdd = (100 * at10.mean) / max.value;
      const pddSigma = pdd * Math.hypot(at10.sigma / at10.mean, max.sigma / max.value);
      // The statistics must be tight enough for the range check to mean something.
      expect(pddSigma).toBeLessThan(1.5);
      expect(max.depthCm).toBeGreaterThanOrEqual(dmax[0]!);
      expect(max.depthCm).toBeLessThanOrEqual(dmax[1]!);
      expect(pdd).toBeGreaterThanOrEqual(pdd10[0]!);
      expect(pdd).toBeLessThanOrEqual(pdd10[1]!);
    },
  );

  it("O'Connor's theorem: water composition at 0.25 g/cm³, field 10 at depth 20 gives the dose of water, field 2.5 at depth 5 (3σ)", () => {
    // O'Connor (1957) density scaling: D_ρ(d, s) = D_w(ρd, ρs) for the same fluence (parallel
    // beam). Independent seeds; the step limits (energy-loss fraction, maximum in g/cm²) are in
    // mass terms, so both runs take the same mass-thickness steps.
    const light = simulate(
      {
        energy: '6MV',
        ssdCm: 100,
        fieldXCm: 10,
        fieldYCm: 10,
        parallel: true,
        layers: [{ materialId: 'custom', thicknessCm: 40, densityGPerCm3: 0.25 }],
      },
      10,
      6000,
      11,
      { depthBinCm: 1, lateralBinCm: 1, lateralMarginCm: 1 },
    );
    const dense = simulate(
      {
        energy: '6MV',
        ssdCm: 100,
        fieldXCm: 2.5,
        fieldYCm: 2.5,
        parallel: true,
        layers: water(10),
      },
      10,
      6000,
      12,
      { depthBinCm: 0.25, lateralBinCm: 0.25, lateralMarginCm: 0.25 },
    );
    const a = windowMean(light, 18, 22);
    const b = windowMean(dense, 4.5, 5.5);
    expect(a.sigma / a.mean).toBeLessThan(0.03);
    expect(Math.abs(a.mean - b.mean)).toBeLessThanOrEqual(3 * Math.hypot(a.sigma, b.sigma));
  });

  it("O'Connor scaling holds history by history: with the same seed, water at 0.25 g/cm³ (field 8, bins 1 cm) scores what water does (field 2, bins 0.25 cm), to rounding", () => {
    // Derived: with every step limit in mass terms, each length of the light run is 4× that of
    // the dense one (a power of two: exact in binary floating point) and every random number is
    // used for the same decision, so the two runs are the same histories scaled. A step limit in
    // cm (0.25 cm in both media) breaks this: in the light medium it allows only 0.0625 g/cm².
    const scenario = (fieldCm: number, layers: McScenario['layers']): McScenario => ({
      energy: '6MV',
      ssdCm: 100,
      fieldXCm: fieldCm,
      fieldYCm: fieldCm,
      parallel: true,
      layers,
    });
    const light = simulate(
      scenario(8, [{ materialId: 'custom', thicknessCm: 40, densityGPerCm3: 0.25 }]),
      2,
      300,
      5,
      { depthBinCm: 1, lateralBinCm: 1, lateralMarginCm: 1 },
    );
    const dense = simulate(scenario(2, water(10)), 2, 300, 5, {
      depthBinCm: 0.25,
      lateralBinCm: 0.25,
      lateralMarginCm: 0.25,
    });
    expect(light.dosePerFluenceGyCm2).toHaveLength(40);
    light.dosePerFluenceGyCm2.forEach((d, i) => {
      const w = dense.dosePerFluenceGyCm2[i] as number;
      expect(Math.abs(d - w)).toBeLessThanOrEqual(1e-9 * Math.abs(w));
    });
    expect(Math.max(...dense.dosePerFluenceGyCm2)).toBeGreaterThan(0);
  });
});

describe('reciprocity scoring against direct simulation of the divergent beam', () => {
  it('the central-axis dose by reciprocity equals a directly simulated divergent 10 × 10 beam (6 MV, 2–18 cm) within 3σ + 1 %', () => {
    // Direct: rays from the point source over the field, energy scored in a central 4 × 4 cm²
    // column (at 100 cm). The 1 % allowance covers the column average being slightly below the
    // axis value (off-axis fall-off within 2 cm of the axis) and the reciprocity approximation
    // (ray obliquity ≤ 3°).
    const scenario: McScenario = {
      energy: '6MV',
      ssdCm: 100,
      fieldXCm: 10,
      fieldYCm: 10,
      layers: water(20),
    };
    const bins: McBinning = { depthBinCm: 1, lateralBinCm: 0.5, lateralMarginCm: 1 };
    const batches = 10;
    const direct = Array.from({ length: batches }, (_, b) =>
      directColumnDose(scenario, {
        histories: 12000,
        seed: 300 + b,
        depthBinCm: 1,
        columnSide100Cm: 4,
      }),
    );
    const windowOf = (d: number[]): number => d.slice(2, 18).reduce((s, v) => s + v, 0) / 16;
    const perBatch = direct.map(windowOf);
    const directMean = perBatch.reduce((s, v) => s + v, 0) / batches;
    const directSigma = Math.sqrt(
      perBatch.reduce((s, v) => s + (v - directMean) ** 2, 0) / (batches * (batches - 1)),
    );
    const recip = windowMean(simulate(scenario, 10, 4000, 301, bins), 2, 18);
    expect(directSigma / directMean).toBeLessThan(0.03);
    expect(Math.abs(directMean - recip.mean)).toBeLessThanOrEqual(
      3 * Math.hypot(directSigma, recip.sigma) + 0.01 * recip.mean,
    );
  });
});
