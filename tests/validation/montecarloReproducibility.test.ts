import { describe, expect, it } from 'vitest';
import { planMonteCarlo, type McCaseInput } from '../../src/engine/montecarlo/monteCarloPlan';
import {
  accumulatorsOf,
  batchTasksOf,
  runMonteCarlo,
} from '../../src/engine/montecarlo/runMonteCarlo';
import { runBatch } from '../../src/engine/montecarlo/runBatch';
import { finalizeMonteCarlo } from '../../src/engine/montecarlo/monteCarloResult';

const CASE: McCaseInput = {
  beam: { energy: '6MV', setup: { kind: 'SSD', ssdCm: 100 }, fieldXCm: 8, fieldYCm: 12 },
  layers: [
    { materialId: 'water', thicknessCm: 3 },
    { materialId: 'lung', thicknessCm: 5, densityGPerCm3: 0.26 },
    { materialId: 'water', thicknessCm: 4 },
  ],
  points: [{ id: 'P', depthCm: 10 }],
};
const GRID = Array.from({ length: 25 }, (_, i) => i * 0.5);
const OPTIONS = { histories: 6000, seed: 77, batches: 12 };

describe('Monte Carlo reproducibility', () => {
  it('the same seed gives the same result whether the batches run in 1 chunk or 3 chunks in any order', () => {
    const single = runMonteCarlo(CASE, OPTIONS, GRID);
    const plan = planMonteCarlo(CASE, OPTIONS);
    const tasks = batchTasksOf(plan);
    // Three "workers" take every third task; their results arrive interleaved in reverse.
    const chunks = [0, 1, 2].map((k) => tasks.filter((_, i) => i % 3 === k));
    const results = chunks.map((chunk) =>
      chunk.map((t) => ({ s: t.scenarioIndex, tally: runBatch(t.task) })),
    );
    const acc = accumulatorsOf(plan);
    for (const r of results.reverse().flat().reverse()) acc[r.s]!.add(r.tally);
    const merged = finalizeMonteCarlo(plan, acc, GRID);
    expect(merged.method).toEqual(single.method);
    expect(merged.depthDose).toEqual(single.depthDose);
  });

  it('a different seed gives a different result', () => {
    const a = runMonteCarlo(CASE, { ...OPTIONS, histories: 2000 }, GRID);
    const b = runMonteCarlo(CASE, { ...OPTIONS, histories: 2000, seed: 78 }, GRID);
    expect(a.method.curve.dosePerMuCGy).not.toEqual(b.method.curve.dosePerMuCGy);
  });

  it('runMonteCarlo(...) returns a type C MethodResult on the given grid with σ, points and a CF of 1 for water', () => {
    const waterCase: McCaseInput = { ...CASE, layers: [{ materialId: 'water', thicknessCm: 12 }] };
    const r = runMonteCarlo(waterCase, { histories: 3000, seed: 1 }, GRID);
    expect(r.method.id).toBe('monte-carlo');
    expect(r.method.methodClass).toBe('type C');
    expect(r.method.curve.depthCm).toEqual(GRID);
    expect(r.method.curve.sigmaDosePerMuCGy).toHaveLength(GRID.length);
    // Water case: the CF run is the case itself (one scenario), so CF is exactly 1.
    for (const cf of r.method.curve.cf) expect(cf).toBe(1);
    expect(r.method.points[0]!.sigmaDosePerMuCGy).toBeGreaterThan(0);
    expect(r.method.variant).toMatch(/0\.250 cm depth bins/);
  });
});
