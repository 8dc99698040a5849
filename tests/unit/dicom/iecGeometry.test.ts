// Beam direction from IEC 61217 angles and the patient position. Facts checked (common practice,
// consistent with IEC 61217 and DICOM PS3.3 C.8.8.25.6): for a head-first supine patient gantry 0
// is an anterior beam, gantry 90 enters from the patient's left, 180 from posterior, 270 from the
// right; prone turns anterior into posterior and swaps left and right; feet first swaps left and
// right and superior and inferior. The couch turns counter-clockwise seen from above for positive
// angles (IEC 61217), so with gantry 90 and couch 90 the source sits at the foot end of a
// head-first patient.
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { sourceDirectionPatient, PATIENT_POSITIONS } from '../../../src/dicom/iecGeometry';
import { norm, type Vec3 } from '../../../src/dicom/vec3';

// Patient axes: +x left, +y posterior, +z superior (PS3.3 C.7.6.2.1.1).
const LEFT: Vec3 = [1, 0, 0];
const RIGHT: Vec3 = [-1, 0, 0];
const POSTERIOR: Vec3 = [0, 1, 0];
const ANTERIOR: Vec3 = [0, -1, 0];
const SUPERIOR: Vec3 = [0, 0, 1];
const INFERIOR: Vec3 = [0, 0, -1];

const close = (a: Vec3, b: Vec3) => a.forEach((v, i) => expect(v).toBeCloseTo(b[i] as number, 12));

describe('sourceDirectionPatient (isocentre → source)', () => {
  it.each([
    ['HFS', 0, 0, ANTERIOR],
    ['HFS', 90, 0, LEFT],
    ['HFS', 180, 0, POSTERIOR],
    ['HFS', 270, 0, RIGHT],
    ['HFP', 0, 0, POSTERIOR],
    ['HFP', 90, 0, RIGHT],
    ['FFS', 0, 0, ANTERIOR],
    ['FFS', 90, 0, RIGHT],
    ['FFP', 0, 0, POSTERIOR],
    ['FFP', 90, 0, LEFT],
    ['HFS', 90, 90, INFERIOR],
    ['HFS', 90, 270, SUPERIOR],
    ['FFS', 90, 90, SUPERIOR],
    ['HFS', 0, 45, ANTERIOR],
  ] as const)('%s, gantry %d°, couch %d°: source toward %j', (pos, g, c, expected) => {
    close(sourceDirectionPatient(g, c, pos), expected);
  });

  it('HFS gantry 45: source between anterior and left', () => {
    const s = Math.SQRT1_2;
    close(sourceDirectionPatient(45, 0, 'HFS'), [s, -s, 0]);
  });

  it('is a unit vector for every angle and position', () => {
    fc.assert(
      fc.property(
        fc.double({ min: -360, max: 720, noNaN: true }),
        fc.double({ min: -180, max: 360, noNaN: true }),
        fc.constantFrom(...PATIENT_POSITIONS),
        (g, c, p) => Math.abs(norm(sourceDirectionPatient(g, c, p)) - 1) < 1e-12,
      ),
    );
  });
});
