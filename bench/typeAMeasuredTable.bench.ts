// Type-A speed with a measured-style table: import of the demo TMR table (CSV parse, validation,
// SHA-256) and calculateCase with every type-A method on the demo case (0.05 cm grid).
import { readFileSync } from 'node:fs';
import { performance } from 'node:perf_hooks';
import { calculateCase } from '../src/compute/calculateCase';
import { buildMeasuredWaterData } from '../src/engine/beam/measuredTable';
import { parseCaseText } from '../src/io/caseFile';
import type { BenchFigure } from './lib/row';

export const repeats = 5;

export function run(): Promise<BenchFigure[]> {
  const parsed = parseCaseText(readFileSync('public/cases/lung-slab-6mv.json', 'utf8'));
  if (!parsed.ok) throw new Error('demo case invalid');
  const csv = readFileSync('public/tables/demo-6mv-tmr.csv', 'utf8');
  const scatterCsv = readFileSync('public/tables/demo-6mv-scatter.csv', 'utf8');
  let t = performance.now();
  const table = buildMeasuredWaterData({
    kind: 'tmr',
    fileName: 'demo-6mv-tmr.csv',
    csv,
    scatterCsv,
  });
  const importMs = performance.now() - t;
  if (!table.ok) throw new Error(table.problems.join('\n'));
  t = performance.now();
  const report = calculateCase(parsed.value, { waterData: table.waterData });
  const calcMs = performance.now() - t;
  const n = report.methods.length;
  return Promise.resolve([
    { name: 'import demo TMR + scatter table', value: importMs, unit: 'ms' },
    {
      name: 'calculateCase, type-A methods, demo case',
      value: calcMs,
      unit: 'ms',
      note: `${n} methods × ${report.depthCm.length} depths`,
    },
  ]);
}
