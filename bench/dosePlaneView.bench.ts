// Dose-plane view work on the main thread for the chest preset (superposition and pencil-beam
// planes, 2.5 mm grid): isodose lines at six levels, the raster pixels, the difference with
// bilinear resampling, and one lateral profile. The planes themselves are timed in typeB.bench.ts.
import { performance } from 'node:perf_hooks';
import { interpolateViridis } from 'd3-scale-chromatic';
import { computeApi } from '../src/compute/computeApi';
import { parseRgb, planeRaster } from '../src/plots/doseMapLayout';
import { indexMapper, isodoseLines } from '../src/plots/isodose';
import { centralAxisMax, planeDifferencePercent, rowAtDepth } from '../src/plots/planeGrid';
import { PRESETS } from '../src/state/presets';
import { gridOfTypeB } from '../src/ui/plane/planeSources';
import type { BenchFigure } from './lib/row';

export const repeats = 5;

export function run(): Promise<BenchFigure[]> {
  const c = PRESETS.find((p) => p.id === 'chest')!.make();
  const sup = computeApi.dosePlane(c, { method: 'superposition', profileDepthsCm: [] });
  const pb = computeApi.dosePlane(c, { method: 'pencil-beam', profileDepthsCm: [] });
  if (!sup.ok || !pb.ok) throw new Error('chest preset did not calculate');
  const a = gridOfTypeB(sup.plane);
  const b = gridOfTypeB(pb.plane);
  const norm = centralAxisMax(a);
  const toPx = indexMapper(a, (x, z) => [60 + 50 * z, 200 - 10 * x]);
  let t = performance.now();
  const lines = isodoseLines(a, norm, [20, 50, 80, 90, 95, 100], toPx, {
    left: 60,
    top: 0,
    right: 1100,
    bottom: 400,
  });
  const isoMs = performance.now() - t;
  const lut = Array.from({ length: 256 }, (_, i) => parseRgb(interpolateViridis(i / 255)));
  t = performance.now();
  planeRaster(a, (v) => lut[Math.max(0, Math.min(255, Math.round((v / norm) * 232)))]!);
  const rasterMs = performance.now() - t;
  t = performance.now();
  planeDifferencePercent(a, b, centralAxisMax(b));
  const diffMs = performance.now() - t;
  t = performance.now();
  rowAtDepth(a, 12.3);
  const profileMs = performance.now() - t;
  const size = `${a.depthCm.length} × ${a.xCm.length} nodes`;
  return Promise.resolve([
    {
      name: 'isodose lines, 6 levels (chest, superposition)',
      value: isoMs,
      unit: 'ms',
      note: `${size}, ${lines.filter((l) => l.label).length} labels`,
    },
    { name: 'dose-map raster pixels', value: rasterMs, unit: 'ms', note: size },
    { name: 'difference plane, bilinear resampling', value: diffMs, unit: 'ms', note: size },
    { name: 'lateral profile at one depth', value: profileMs, unit: 'ms' },
  ]);
}
