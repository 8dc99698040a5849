// The factor view's worker calls on the demo lung case (6 MV, chest wall | lung | mediastinum):
// every method's factors at P1, and the default sweep (lung density 0.1–1 g/cm³, 19 values, 6 and
// 18 MV) with every deterministic method. Type-B tables are built before timing (first use is
// measured by typeB.bench.ts).
import { readFileSync } from 'node:fs';
import { performance } from 'node:perf_hooks';
import { cfSweepRequest } from '../src/compute/cfSweep';
import { explainPointRequest } from '../src/compute/explainPoint';
import type { BenchFigure } from './lib/row';

export const repeats = 3;

export function run(): Promise<BenchFigure[]> {
  const c: unknown = JSON.parse(readFileSync('public/cases/lung-slab-6mv.json', 'utf8'));
  const water = { kind: 'case' } as const;
  const sweep = () =>
    cfSweepRequest({
      case: c,
      water,
      variable: 'density',
      depthCm: 15,
      layerIndex: 1,
      from: 0.1,
      to: 1,
      count: 19,
      energies: ['6MV', '18MV'],
    });
  // Warm the type-B models and references of both energies.
  cfSweepRequest({
    ...{ case: c, water, variable: 'field', depthCm: 15, from: 5, to: 10, count: 2 },
    energies: ['6MV', '18MV'],
  });
  let t = performance.now();
  const e = explainPointRequest({ case: c, water, depthCm: 15 });
  const explainMs = performance.now() - t;
  if (!e.ok) throw new Error('demo case invalid');
  t = performance.now();
  const s = sweep();
  const sweepMs = performance.now() - t;
  if (!s.ok) throw new Error(JSON.stringify(s.problems));
  return Promise.resolve([
    {
      name: 'factors at a point, every method (demo case, P1)',
      value: explainMs,
      unit: 'ms',
      note: `${e.explanation.methods.length} methods`,
    },
    {
      name: 'CF sweep, lung density, 19 values × 6 and 18 MV',
      value: sweepMs,
      unit: 'ms',
      note: `${s.result.series.length} series`,
    },
  ]);
}
