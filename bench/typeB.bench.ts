// Type-B engine speed: superposition central-axis curve + x–z plane (30 cm deep, 2.5 mm grid,
// 10 × 10 cm², 6 MV, water | lung | water), the pencil-beam curve on the same grid, and the
// one-off table set-up of a beam (cylinder + quadrant tables). Medians of repeated calls.
import { makeSlabPhantom } from '../src/engine/phantom/slabPhantom';
import { typeBDosePerMu } from '../src/engine/superposition/typeBDose';
import { typeBDosePlane } from '../src/engine/superposition/typeBMethods';
import { beamPointKernel } from '../src/engine/superposition/beamModel';
import { cylinderCumulative } from '../src/engine/kernels/cylinderCumulative';
import { quadrantTable } from '../src/engine/kernels/quadrant';
import type { BenchFigure } from './lib/row';

export const repeats = 3;

function medianMs(calls: number, fn: () => void): number {
  const times: number[] = [];
  for (let i = 0; i < calls; i++) {
    const t0 = performance.now();
    fn();
    times.push(performance.now() - t0);
  }
  times.sort((a, b) => a - b);
  return times[Math.floor(times.length / 2)] as number;
}

export function run(): Promise<BenchFigure[]> {
  const phantom = makeSlabPhantom([
    { materialId: 'softTissue', thicknessCm: 5 },
    { materialId: 'lung', thicknessCm: 10 },
    { materialId: 'softTissue', thicknessCm: 15 },
  ]);
  const beam = { ssdCm: 100, fieldXCm: 10, fieldYCm: 10 };
  const depths = Array.from({ length: 121 }, (_, i) => i * 0.25);
  // Warm-up builds and caches the 6 MV tables and references.
  typeBDosePerMu('superposition', '6MV', phantom, beam, depths, [0]);
  typeBDosePerMu('pencil-beam', '6MV', phantom, beam, depths, [0]);
  let planeSize = '';
  const superposition = medianMs(7, () => {
    typeBDosePerMu('superposition', '6MV', phantom, beam, depths, [0]);
    const plane = typeBDosePlane('6MV', phantom, beam, { stepCm: 0.25 });
    planeSize = `${plane.depthCm.length} × ${plane.lateralCm.length}`;
  });
  const pencil = medianMs(21, () => {
    typeBDosePerMu('pencil-beam', '6MV', phantom, beam, depths, [0]);
  });
  const kernel = beamPointKernel('18MV');
  const setup = medianMs(3, () => {
    quadrantTable(cylinderCumulative(kernel, 'total'));
  });
  return Promise.resolve([
    {
      name: 'superposition CAX + x–z plane, 30 cm, 2.5 mm, 10 × 10 (target < 150 ms)',
      value: superposition,
      unit: 'ms',
      note: `plane ${planeSize} points`,
    },
    {
      name: 'pencil-beam CAX curve, 30 cm, 2.5 mm (target < 5 ms)',
      value: pencil,
      unit: 'ms',
      note: '121 depths',
    },
    {
      name: 'type-B table set-up for one beam (first use)',
      value: setup,
      unit: 'ms',
      note: 'cylinder + quadrant tables',
    },
  ]);
}
