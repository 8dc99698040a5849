// DICOM import speed: a synthetic 512 × 512 CT series of 120 slices (Explicit VR Little Endian,
// written by the test generator) and a four-beam RT Plan, through the same importDicom the page's
// worker runs (parse, HU, volume, four rays), then each beam's analysis and the plan assembly.
import { performance } from 'node:perf_hooks';
import { analyseAll, planOfAnalysed } from '../src/dicom/importPipeline';
import { importDicom } from '../src/dicom/importDicom';
import { defaultImportSettings } from '../src/dicom/importSettings';
import { gridCovering, writeCtSeries, writeRtPlan } from '../tests/helpers/dicomPhantom';
import { boxPhantomHu } from '../tests/helpers/phantomShapes';
import type { BenchFigure } from './lib/row';

export const repeats = 3;

export async function run(): Promise<BenchFigure[]> {
  const grid = gridCovering([-255.5, -255.5, -178.5], [255.5, 255.5, 178.5], {
    rowMm: 1,
    colMm: 1,
    sliceMm: 3,
  });
  const ct = writeCtSeries({
    grid,
    huAt: boxPhantomHu([
      { minMm: [-150, -100, -200], maxMm: [150, 100, 200], hu: 0 },
      { minMm: [20, -40, -200], maxMm: [100, 40, 200], hu: -740 },
    ]),
    patientPosition: 'HFS',
  });
  const plan = writeRtPlan({
    label: 'BENCH',
    patientPosition: 'HFS',
    beams: [0, 90, 180, 270].map((g, i) => ({
      number: i + 1,
      name: `G${g}`,
      energyMV: 6,
      gantryDeg: g,
      isoMm: [0, 0, 0] as const,
    })),
  });
  const files = [...ct, plan];
  const megabytes = files.reduce((s, f) => s + f.bytes.length, 0) / 1e6;
  let t = performance.now();
  const r = await importDicom(files.map((f) => ({ name: f.name, read: () => f.bytes })));
  const importMs = performance.now() - t;
  if (!r.ok) throw new Error(r.problems.join('; '));
  const s = defaultImportSettings();
  t = performance.now();
  const analysed = analyseAll(r.value, s);
  const assembled = planOfAnalysed(r.value, analysed, s);
  const analyseMs = performance.now() - t;
  if (!assembled.ok) throw new Error(assembled.problems.join('; '));
  return [
    {
      name: `importDicom, ${grid.columns} × ${grid.rows} × ${grid.slices} CT + 4-beam plan`,
      value: importMs,
      unit: 'ms',
      note: `${megabytes.toFixed(0)} MB of files`,
    },
    { name: 'analyse 4 rays + assemble the plan', value: analyseMs, unit: 'ms' },
  ];
}
