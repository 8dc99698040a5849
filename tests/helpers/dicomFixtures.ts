// A four-field box phantom plan as DICOM files (CT series + RT Plan), for the command line and
// the page journeys: a water box 30 cm wide (x), 20 cm deep (y) and 12 cm long (z) centred on the
// origin with a lung box (−740 HU) from x = 2 to 10 cm and y = −4 to 4 cm, isocentre at the
// origin, head first supine. Along each beam the slabs are known from the boxes:
//   AP (gantry 0):   water 10 cm to the isocentre (SSD 90 cm);
//   left (gantry 90): water 5 cm, lung 8 cm, water 2 cm to the isocentre (SSD 85 cm);
//   PA (gantry 180): water 10 cm (SSD 90 cm);  right (gantry 270): water 15 cm (SSD 85 cm).
// Planning MU and doses are invented for the journeys (50 cGy a beam, MU of a typical 6 MV beam).
import { mkdirSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { gridCovering, writeCtSeries, writeRtPlan, type NamedBytes } from './dicomPhantom';
import { boxPhantomHu } from './phantomShapes';

export const BOX_BEAMS = [
  { number: 1, name: 'AP', gantryDeg: 0, ssdCm: 90, isoDepthCm: 10, meterset: 63, doseGy: 0.5 },
  { number: 2, name: 'LEFT', gantryDeg: 90, ssdCm: 85, isoDepthCm: 15, meterset: 61, doseGy: 0.5 },
  { number: 3, name: 'PA', gantryDeg: 180, ssdCm: 90, isoDepthCm: 10, meterset: 63, doseGy: 0.5 },
  {
    number: 4,
    name: 'RIGHT',
    gantryDeg: 270,
    ssdCm: 85,
    isoDepthCm: 15,
    meterset: 140,
    doseGy: 0.5,
  },
] as const;

export const BOX_SPACING = { rowMm: 4, colMm: 4, sliceMm: 4 };

export function boxPlanFiles(): NamedBytes[] {
  const grid = gridCovering([-170, -120, -60], [170, 120, 60], BOX_SPACING);
  const ct = writeCtSeries({
    grid,
    huAt: boxPhantomHu([
      { minMm: [-150, -100, -60], maxMm: [150, 100, 60], hu: 0 },
      { minMm: [20, -40, -60], maxMm: [100, 40, 60], hu: -740 },
    ]),
    patientPosition: 'HFS',
    syntax: 'implicit',
  });
  const plan = writeRtPlan({
    label: 'BOX 4F',
    patientPosition: 'HFS',
    beams: BOX_BEAMS.map((b) => ({
      number: b.number,
      name: b.name,
      energyMV: 6,
      gantryDeg: b.gantryDeg,
      isoMm: [0, 0, 0],
      jawXMm: [-50, 50],
      jawYMm: [-50, 50],
      meterset: b.meterset,
      doseGy: b.doseGy,
      ssdMm: b.ssdCm * 10,
    })),
  });
  return [...ct, plan];
}

export function writeFiles(dir: string, files: readonly NamedBytes[]): void {
  mkdirSync(dir, { recursive: true });
  for (const f of files) writeFileSync(join(dir, f.name), f.bytes);
}
