// Cost of the equilibrium warnings per recalculation: caseWarnings for the demo case (mean of
// 200 calls) and for an 18 MV 5 × 5 variant, where the LED band search does the most work.
import { readFileSync } from 'node:fs';
import { phantomOfCase } from '../src/compute/calculateCase';
import { caseWarnings } from '../src/compute/caseWarnings';
import { parseCaseText } from '../src/io/caseFile';
import type { LaminaCase } from '../src/io/caseSchema';
import type { BenchFigure } from './lib/row';

export const repeats = 5;

function meanMs(c: LaminaCase, calls: number): { ms: number; count: number } {
  const phantom = phantomOfCase(c);
  let count = 0;
  const t0 = performance.now();
  for (let i = 0; i < calls; i++) count = caseWarnings(c, phantom, []).length;
  return { ms: (performance.now() - t0) / calls, count };
}

export function run(): Promise<BenchFigure[]> {
  const parsed = parseCaseText(readFileSync('public/cases/lung-slab-6mv.json', 'utf8'));
  if (!parsed.ok) throw new Error('demo case invalid');
  const demo = parsed.value;
  const small: LaminaCase = {
    ...demo,
    beam: { ...demo.beam, energy: '18MV', fieldXCm: 5, fieldYCm: 5 },
  };
  const a = meanMs(demo, 200);
  const b = meanMs(small, 200);
  return Promise.resolve([
    { name: 'warnings, demo case', value: a.ms, unit: 'ms', note: `${a.count} warnings` },
    {
      name: 'warnings, demo case at 18 MV 5 × 5',
      value: b.ms,
      unit: 'ms',
      note: `${b.count} warnings`,
    },
  ]);
}
