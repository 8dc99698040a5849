// The depth-dose chart's layout on the page's main thread (scales, ticks, one SVG path per
// method), the work an edit's frame does before its curves are drawn: chest preset, dose per MU,
// on the full grid (0.05 cm) and on the preview grid (0.2 cm) a held boundary is drawn with.
import { performance } from 'node:perf_hooks';
import { calculateCaseRequest } from '../src/compute/calculationService';
import { curveChartLayout } from '../src/plots/curveLayout';
import { PRESETS } from '../src/state/presets';
import { doseSeries } from '../src/ui/series';
import type { BenchFigure } from './lib/row';

export const repeats = 5;

const FRAME = { width: 1000, height: 320, margin: { left: 64, right: 20, top: 12, bottom: 40 } };

function timeLayouts(purpose: 'full' | 'preview'): BenchFigure {
  const c = PRESETS.find((p) => p.id === 'chest')!.make();
  const answer = calculateCaseRequest({ purpose, case: c, water: { kind: 'case' } });
  if (!answer.ok) throw new Error('chest preset did not calculate');
  const report = answer.report;
  const s = doseSeries(report, [], 'dosePerMu');
  if (!s.ok) throw new Error(s.reason);
  const input = {
    depthCm: report.depthCm,
    maxDepthCm: report.layers.at(-1)!.bottomCm,
    series: s.series,
    frame: FRAME,
    interfacesCm: report.layers.slice(0, -1).map((l) => l.bottomCm),
    yInclude: [0],
  };
  const n = 50;
  curveChartLayout(input); // warm-up
  const t = performance.now();
  for (let i = 0; i < n; i++) curveChartLayout(input);
  return {
    name: `dose chart layout, ${purpose} grid`,
    value: (performance.now() - t) / n,
    unit: 'ms',
    note: `${s.series.length} curves × ${report.depthCm.length} depths, mean of ${n}`,
  };
}

export function run(): Promise<BenchFigure[]> {
  return Promise.resolve([timeLayouts('full'), timeLayouts('preview')]);
}
