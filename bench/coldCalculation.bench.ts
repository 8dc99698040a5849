// The compute worker's first calculation: what a page load waits for after the worker starts.
// Each run is a fresh Node process (cold JIT, empty caches): decode the generated data, then
// the chest demo case with every method on the page's grid, first cold (type-B tables built for
// the beam, code not yet optimised), then warm.
import { spawnSync } from 'node:child_process';
import type { BenchFigure } from './lib/row';

export const repeats = 3;

export function run(): Promise<BenchFigure[]> {
  const r = spawnSync(process.execPath, ['--import', 'tsx', 'bench/lib/coldCalculationOnce.ts'], {
    encoding: 'utf8',
  });
  if (r.status !== 0) throw new Error(`cold calculation failed: ${r.stderr.trim().split('\n')[0]}`);
  const t = JSON.parse(r.stdout) as { decodeMs: number; firstMs: number; secondMs: number };
  const note = 'chest demo case, all methods, 0.05 cm grid, modelled 6 MV; fresh process';
  return Promise.resolve([
    { name: 'generated data decoded (kernels, modelled beams)', value: t.decodeMs, unit: 'ms' },
    {
      name: 'first calculation, cold (includes type-B table set-up)',
      value: t.firstMs,
      unit: 'ms',
      note,
    },
    { name: 'second calculation, warm', value: t.secondMs, unit: 'ms' },
  ]);
}
