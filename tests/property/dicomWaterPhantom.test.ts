// Property: a homogeneous water CT (any patient position, gantry and couch angle, isocentre and
// depth) imports as one water slab, with SSD = SAD − isocentre depth and both within one voxel of
// the geometry. The phantom is oriented with the import's own beam direction: what is checked is
// the ray sampling, skin detection and segmentation, not the angle conventions (see
// tests/validation/dicomSlabGeometry.test.ts for those).
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { sourceDirectionPatient, PATIENT_POSITIONS } from '../../src/dicom/iecGeometry';
import { analyseScenario } from '../helpers/dicomScenario';

describe('homogeneous water CT', () => {
  it('gives one water slab with SSD = SAD − depth, within one voxel of the geometry', async () => {
    await fc.assert(
      fc.asyncProperty(
        fc.constantFrom(...PATIENT_POSITIONS),
        fc.integer({ min: 0, max: 359 }),
        fc.constantFrom(0, 10, 90, 270, 345),
        fc.tuple(
          fc.integer({ min: -60, max: 60 }),
          fc.integer({ min: -60, max: 60 }),
          fc.integer({ min: -60, max: 60 }),
        ),
        fc.integer({ min: 20, max: 150 }),
        fc.integer({ min: 20, max: 100 }),
        fc.constantFrom('implicit' as const, 'explicit' as const),
        async (position, gantryDeg, couchDeg, iso, depthMm, beyondMm, syntax) => {
          const s = sourceDirectionPatient(gantryDeg, couchDeg, position);
          const { analysis: a } = await analyseScenario({
            position,
            gantryDeg,
            couchDeg,
            isoMm: iso,
            dir: [-s[0], -s[1], -s[2]],
            isoDepthMm: depthMm,
            layers: [{ thicknessMm: depthMm + beyondMm, hu: 0 }],
            radiusMm: 30,
            spacing: { rowMm: 3, colMm: 3, sliceMm: 4 },
            syntax,
          });
          const voxelCm = 0.4;
          expect(a.slabs).toHaveLength(1);
          expect(a.slabs[0]!.materialId).toBe('water');
          // The slab runs from skin to exit at the body threshold, so the partial-volume voxels at
          // both surfaces lower its mean ρe (ρe 0.980 over a 4.2 cm path was seen): the
          // water-equivalent thickness, not the mean, is what stays within one voxel.
          const slab = a.slabs[0]!;
          expect(Math.abs(slab.rhoE - 1) * slab.thicknessCm).toBeLessThanOrEqual(voxelCm);
          expect(Math.abs(slab.rhoE - 1)).toBeLessThan(0.1);
          expect(a.ssdCm + a.isoDepthCm).toBeCloseTo(100, 9);
          expect(Math.abs(a.isoDepthCm - depthMm / 10)).toBeLessThanOrEqual(voxelCm);
          expect(Math.abs(a.ssdCm - (100 - depthMm / 10))).toBeLessThanOrEqual(voxelCm);
        },
      ),
      { numRuns: 30 },
    );
  });
});
