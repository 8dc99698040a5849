import { describe, expect, it } from 'vitest';
import {
  accumulatorsOf,
  batchTasksOf,
  runMonteCarlo,
} from '../../../src/engine/montecarlo/runMonteCarlo';
import { planMonteCarlo } from '../../../src/engine/montecarlo/monteCarloPlan';
import {
  finalizeMonteCarlo,
  MC_SIGMA_UNKNOWN,
} from '../../../src/engine/montecarlo/monteCarloResult';
import { statistics } from '../../../src/engine/montecarlo/batchStatistics';
import { runBatch } from '../../../src/engine/montecarlo/runBatch';
import { lateralProfileAtDepth } from '../../../src/engine/montecarlo/planeProfile';
import { stoppingPowerRatioWaterToMedium } from '../../../src/engine/dose/stoppingPowerRatio';
import { beamSpectrum } from '../../../src/engine/kernels/spectrum';
import type { McCaseInput } from '../../../src/engine/montecarlo/monteCarloPlan';
import { expectRelClose } from '../../helpers/expectClose';

const CASE: McCaseInput = {
  beam: { energy: '6MV', setup: { kind: 'SSD', ssdCm: 100 }, fieldXCm: 10, fieldYCm: 6 },
  layers: [
    { materialId: 'water', thicknessCm: 3 },
    { materialId: 'corticalBone', thicknessCm: 2 },
    { materialId: 'water', thicknessCm: 5 },
  ],
  points: [],
};
const GRID = [1, 4, 8];

describe('Monte Carlo result extras', () => {
  it('doseTo water converts bone dose by s_water,bone and leaves water alone', () => {
    const medium = runMonteCarlo(CASE, { histories: 2000, seed: 9 }, GRID);
    const water = runMonteCarlo(CASE, { histories: 2000, seed: 9, doseTo: 'water' }, GRID);
    // Same seed, same histories: only the conversion differs (dose/doseConversion.ts).
    const spr = stoppingPowerRatioWaterToMedium('corticalBone', beamSpectrum('6MV'));
    const at = (r: typeof medium, depthCm: number) =>
      r.method.curve.dosePerMuCGy[GRID.indexOf(depthCm)] as number;
    // Depth 4 cm is bone, 1 cm water.
    expectRelClose(at(water, 4) / at(medium, 4), spr, 1e-12);
    expect(at(water, 1) / at(medium, 1)).toBe(1);
    expect(spr).toBeGreaterThan(1.05);
    expect(water.method.dose?.quantity).toBe('water');
    expect(medium.method.dose?.conversion).toBe('native');
  });

  it('lateralProfileAtDepth(...) is flat in the field centre and falls outside the field', () => {
    const r = runMonteCarlo(CASE, { histories: 4000, seed: 2 }, GRID);
    const p = lateralProfileAtDepth(r.plane, 8);
    expect(p.binDepthCm).toBeCloseTo(7.875, 9);
    const at = (x: number) => p.dosePerMuCGy[p.xCm.indexOf(x)]!;
    // Field 10 cm wide at 100 cm → 10.8 cm at 8 cm depth: ±2 cm is inside, ±8 cm well outside.
    expect(at(8)).toBeLessThan(0.2 * at(0));
    expect(at(-8)).toBeLessThan(0.2 * at(0));
    expect(Math.abs(at(2) - at(-2)) / at(0)).toBeLessThan(0.15);
  });
});

describe('Monte Carlo points with an unknown 1σ', () => {
  it('a partial run of one batch gives no point value (σ unknown), never a value with σ = 0', () => {
    const c: McCaseInput = { ...CASE, points: [{ id: 'P', depthCm: 4 }] };
    const plan = planMonteCarlo(c, { histories: 2000, seed: 5 });
    const acc = accumulatorsOf(plan);
    // Only the first batch of each scenario has arrived (as in the page's pool after one batch).
    for (const { scenarioIndex, task } of batchTasksOf(plan).filter((t) => t.task.batchIndex === 0))
      acc[scenarioIndex]!.add(runBatch(task));
    const one = finalizeMonteCarlo(plan, acc, GRID).method.points[0]!;
    expect(one.dosePerMuCGy).toBeNull();
    expect(one.flags).toContain(MC_SIGMA_UNKNOWN);
    // With every batch the value and a positive σ are there.
    const all = runMonteCarlo(c, { histories: 2000, seed: 5 }, GRID).method.points[0]!;
    expect(all.dosePerMuCGy).toBeGreaterThan(0);
    expect(all.sigmaDosePerMuCGy).toBeGreaterThan(0);
  });
});

describe('Monte Carlo with too few histories for an uncertainty', () => {
  it('runMonteCarlo(...) with 10 histories gives null values with the reason, never 0 ± 0', () => {
    // 10 histories in 10 batches: most depth bins are scored by at most one batch (the CLI
    // used to print a curve of 0 ± 0 here).
    const grid = Array.from({ length: 21 }, (_, i) => i * 0.5);
    const r = runMonteCarlo(
      { ...CASE, points: [{ id: 'P', depthCm: 8 }] },
      { histories: 10, seed: 1 },
      grid,
    );
    const { dosePerMuCGy, cf, sigmaDosePerMuCGy } = r.method.curve;
    let withheld = 0;
    dosePerMuCGy.forEach((d, i) => {
      if (d === null) withheld++;
      // A value is shown only with a positive 1σ: zero dose with zero σ never appears.
      else expect(sigmaDosePerMuCGy![i]).toBeGreaterThan(0);
    });
    cf.forEach((v, i) => {
      if (v !== null) expect(r.method.curve.sigmaCf![i]).toBeGreaterThan(0);
    });
    expect(withheld).toBeGreaterThan(dosePerMuCGy.length / 2);
    for (const p of r.method.points) {
      if (p.dosePerMuCGy === null) expect(p.flags).toContain(MC_SIGMA_UNKNOWN);
      else expect(p.sigmaDosePerMuCGy).toBeGreaterThan(0);
    }
  });

  it('statistics(...) gives σ unknown in a bin scored by fewer than two batches', () => {
    const batch = (v: number[]) => ({ values: Float64Array.from(v), histories: 10 });
    const s = statistics([batch([0, 1, 2]), batch([0, 0, 3]), batch([0, 0, 1])]);
    expect(Number.isNaN(s.sigma[0])).toBe(true); // nobody scored: not 0 ± 0
    expect(Number.isNaN(s.sigma[1])).toBe(true); // one batch scored
    expect(s.sigma[2]).toBeGreaterThan(0);
    expect(s.mean[1]).toBeCloseTo(1 / 30, 12);
  });
});
