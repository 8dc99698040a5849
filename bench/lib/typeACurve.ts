// Type-A curve computation time: calculateCase with every available method for the demo case.
// Uses the default (modelled) water data when calculateCase has one; otherwise the demo measured
// TMR table shipped in public/tables.
import { readFileSync } from 'node:fs';
import { calculateCase, type CalcOptions } from '../../src/compute/calculateCase';
import { buildMeasuredWaterData } from '../../src/engine/beam/measuredTable';
import { describeProblems, parseCaseText } from '../../src/io/caseFile';
import { notMeasuredRow, type BenchRow } from './row';
import { timeMs } from './stats';

const DEMO_CASE = 'public/cases/lung-slab-6mv.json';
const GROUP = 'type-A curves';

export async function typeACurveRows(repeats = 10): Promise<BenchRow[]> {
  const parsed = parseCaseText(readFileSync(DEMO_CASE, 'utf8'));
  if (!parsed.ok) throw new Error(`${DEMO_CASE}: ${describeProblems(parsed.problems)}`);
  let options: CalcOptions = {};
  let probe = calculateCase(parsed.value, options);
  let waterNote = 'default water data';
  if (!probe.methods.some((m) => m.methodClass === 'type A')) {
    const table = buildMeasuredWaterData({
      kind: 'tmr',
      fileName: 'demo-6mv-tmr.csv',
      csv: readFileSync('public/tables/demo-6mv-tmr.csv', 'utf8'),
      scatterCsv: readFileSync('public/tables/demo-6mv-scatter.csv', 'utf8'),
    });
    if (table.ok) {
      options = { waterData: table.waterData };
      probe = calculateCase(parsed.value, options);
      waterNote = 'demo measured TMR table';
    }
  }
  const typeA = probe.methods.filter((m) => m.methodClass === 'type A');
  if (typeA.length === 0)
    return [
      notMeasuredRow(
        GROUP,
        'calculateCase, all methods, demo case',
        'no type-A method is plugged into calculateCase yet',
      ),
    ];
  for (let i = 0; i < 2; i++) calculateCase(parsed.value, options); // warm-up (JIT)
  const samples: number[] = [];
  for (let i = 0; i < repeats; i++)
    samples.push(await timeMs(() => calculateCase(parsed.value, options)));
  return [
    {
      group: GROUP,
      name: 'calculateCase, all methods, demo case',
      unit: 'ms',
      samples,
      note: `${waterNote}, 2 warm-up runs; ${probe.methods.length} methods (${probe.methods.map((m) => m.id).join(', ')}) × ${probe.depthCm.length} depths`,
    },
  ];
}
