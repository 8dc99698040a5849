// Slab phantoms of known geometry written as DICOM CT + RT Plan (tests/helpers/dicomPhantom.ts),
// read back through the import: SSD, isocentre depth and slab boundaries must come out within one
// voxel of the geometry, for every patient position, several gantry and couch angles, isocentre
// positions, image orientations and both little-endian transfer syntaxes.
//
// Beam directions are stated from the conventions, not computed by the code under test (common
// practice, IEC 61217 and DICOM PS3.3 C.8.8.25.6; patient axes x left, y posterior, z superior):
// the source lies, for gantry angle g and couch 0, at
//   HFS (sin g, −cos g, 0)   HFP (−sin g, cos g, 0)   FFS (−sin g, −cos g, 0)   FFP (sin g, cos g, 0)
// (HFS: g 0 anterior, 90 the patient's left; prone turns anterior to posterior and swaps left
// and right; feet first swaps left and right). With the couch at 90° (counter-clockwise seen
// from above) the fixed X axis points to the foot end of a head-first patient and to the head of
// a feet-first one, so the source (sin g, 0, cos g)_fixed lies at
//   HFS (0, −cos g, −sin g)   FFS (0, −cos g, sin g)   (derived).
import { describe, expect, it } from 'vitest';
import { rhoEOfHu, defaultCalibration } from '../../src/dicom/calibration';
import { analyseScenario, type SlabScenario } from '../helpers/dicomScenario';
import type { PatientPosition, Vec3 } from '../helpers/dicomPhantom';
import type { SlabLayer } from '../helpers/phantomShapes';

const rad = (d: number) => (d * Math.PI) / 180;
function sourceAt(position: PatientPosition, g: number, couch: 0 | 90): Vec3 {
  const s = Math.sin(rad(g));
  const c = Math.cos(rad(g));
  if (couch === 90) return position === 'HFS' ? [0, -c, -s] : [0, -c, s];
  return {
    HFS: [s, -c, 0] as Vec3,
    HFP: [-s, c, 0] as Vec3,
    FFS: [-s, -c, 0] as Vec3,
    FFP: [s, c, 0] as Vec3,
  }[position];
}

const LAYERS: SlabLayer[] = [
  { thicknessMm: 30, hu: 0 },
  { thicknessMm: 50, hu: -740 },
  { thicknessMm: 15, hu: 1500 },
  { thicknessMm: 60, hu: 0 },
];
const ISO_DEPTH_MM = 100;
const SAD_MM = 1000;

interface Case {
  position: PatientPosition;
  gantryDeg: number;
  couchDeg?: 0 | 90;
  isoMm: Vec3;
  rowCos?: Vec3;
  colCos?: Vec3;
  syntax?: 'implicit' | 'explicit';
}

const CASES: (Case & { couchDeg: 0 | 90 })[] = (
  [
    { position: 'HFS', gantryDeg: 0, isoMm: [10, 20, -30] },
    { position: 'HFS', gantryDeg: 90, isoMm: [0, 0, 0], syntax: 'implicit' },
    { position: 'HFS', gantryDeg: 180, isoMm: [-15, 5, 40] },
    { position: 'HFS', gantryDeg: 270, isoMm: [25, -10, 0] },
    { position: 'HFS', gantryDeg: 45, isoMm: [5, 5, 5] },
    { position: 'HFP', gantryDeg: 0, isoMm: [0, 30, -20], rowCos: [-1, 0, 0], colCos: [0, -1, 0] },
    {
      position: 'HFP',
      gantryDeg: 90,
      isoMm: [-20, 0, 10],
      rowCos: [-1, 0, 0],
      colCos: [0, -1, 0],
      syntax: 'implicit',
    },
    { position: 'FFS', gantryDeg: 90, isoMm: [15, -5, 60], rowCos: [-1, 0, 0], colCos: [0, 1, 0] },
    { position: 'FFS', gantryDeg: 300, isoMm: [0, 0, -40] },
    { position: 'FFP', gantryDeg: 90, isoMm: [0, 10, 0], rowCos: [1, 0, 0], colCos: [0, -1, 0] },
    { position: 'FFP', gantryDeg: 135, isoMm: [-5, -5, 20] },
    { position: 'HFS', gantryDeg: 90, couchDeg: 90, isoMm: [0, 0, 0] },
    { position: 'HFS', gantryDeg: 45, couchDeg: 90, isoMm: [10, -10, 5] },
    { position: 'FFS', gantryDeg: 60, couchDeg: 90, isoMm: [0, 5, -10], syntax: 'implicit' },
  ] as Case[]
).map((c) => ({ ...c, couchDeg: c.couchDeg ?? 0 }));

describe('imported slab phantoms: SSD, isocentre depth and slabs within one voxel', () => {
  it.each(CASES)('$position gantry $gantryDeg° couch $couchDeg° isocentre $isoMm', async (c) => {
    const src = sourceAt(c.position, c.gantryDeg, c.couchDeg);
    const spacing = { rowMm: 2.5, colMm: 2.5, sliceMm: 3 };
    const voxelCm = 0.3; // the largest voxel dimension
    const scenario: SlabScenario = {
      position: c.position,
      gantryDeg: c.gantryDeg,
      couchDeg: c.couchDeg,
      isoMm: c.isoMm,
      dir: [-src[0], -src[1], -src[2]],
      isoDepthMm: ISO_DEPTH_MM,
      layers: LAYERS,
      spacing,
      ...(c.rowCos ? { rowCos: c.rowCos, colCos: c.colCos } : {}),
      ...(c.syntax ? { syntax: c.syntax } : {}),
    };
    const { analysis: a } = await analyseScenario(scenario);
    expect(Math.abs(a.ssdCm - (SAD_MM - ISO_DEPTH_MM) / 10)).toBeLessThanOrEqual(voxelCm);
    expect(Math.abs(a.isoDepthCm - ISO_DEPTH_MM / 10)).toBeLessThanOrEqual(voxelCm);
    expect(a.ssdCm + a.isoDepthCm).toBeCloseTo(SAD_MM / 10, 9);
    expect(a.slabs.map((s) => s.materialId)).toEqual(['water', 'lung', 'corticalBone', 'water']);
    // Slab boundaries at 3, 8 and 9.5 cm below the true surface (the layers above).
    const bounds = a.slabs
      .slice(0, 3)
      .map((_, i) => a.slabs.slice(0, i + 1).reduce((t, s) => t + s.thicknessCm, 0));
    [3, 8, 9.5].forEach((z, i) => expect(Math.abs(bounds[i]! - z)).toBeLessThanOrEqual(voxelCm));
    // Water-equivalent depth of the isocentre through the calibration: within one voxel of water.
    const cal = defaultCalibration();
    const truth =
      3 * rhoEOfHu(cal, 0) +
      5 * rhoEOfHu(cal, -740) +
      1.5 * rhoEOfHu(cal, 1500) +
      0.5 * rhoEOfHu(cal, 0);
    let epl = 0;
    let top = 0;
    for (const s of a.slabs) {
      const t = Math.max(0, Math.min(s.thicknessCm, a.isoDepthCm - top));
      epl += t * s.rhoE;
      top += s.thicknessCm;
    }
    expect(Math.abs(epl - truth)).toBeLessThanOrEqual(voxelCm);
  });
});
