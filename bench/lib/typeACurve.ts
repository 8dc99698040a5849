// Type-A curve computation time: calculateCase with every available method for the demo case.
import { readFileSync } from 'node:fs';
import { calculateCase } from '../../src/compute/calculateCase';
import { describeProblems, parseCaseText } from '../../src/io/caseFile';
import { notMeasuredRow, type BenchRow } from './row';
import { timeMs } from './stats';

const DEMO_CASE = 'public/cases/lung-slab-6mv.json';
const GROUP = 'type-A curves';

export async function typeACurveRows(repeats = 10): Promise<BenchRow[]> {
  const parsed = parseCaseText(readFileSync(DEMO_CASE, 'utf8'));
  if (!parsed.ok) throw new Error(`${DEMO_CASE}: ${describeProblems(parsed.problems)}`);
  const probe = calculateCase(parsed.value);
  const typeA = probe.methods.filter((m) => m.methodClass === 'type A');
  if (typeA.length === 0)
    return [
      notMeasuredRow(
        GROUP,
        'calculateCase, all methods, demo case',
        'no type-A method is plugged into calculateCase yet',
      ),
    ];
  for (let i = 0; i < 2; i++) calculateCase(parsed.value); // warm-up (JIT)
  const samples: number[] = [];
  for (let i = 0; i < repeats; i++) samples.push(await timeMs(() => calculateCase(parsed.value)));
  return [
    {
      group: GROUP,
      name: 'calculateCase, all methods, demo case',
      unit: 'ms',
      samples,
      note: `${probe.methods.length} methods (${probe.methods.map((m) => m.id).join(', ')}) × ${probe.depthCm.length} depths`,
    },
  ];
}
