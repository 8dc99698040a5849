// Beam direction in the DICOM patient coordinate system (x to the patient's left, y posterior,
// z superior: PS3.3 C.7.6.2.1.1) from the IEC 61217 machine angles and the patient position.
//
// IEC 61217 fixed system f: X_f to the right of an observer at the foot of the couch facing the
// gantry, Y_f toward the gantry, Z_f up. At gantry angle 0 the source is above the isocentre
// (+Z_f); the gantry turns about Y_f, positive clockwise seen from the isocentre looking toward
// the gantry (a right-handed rotation about +Y_f), so the source lies along (sin θ, 0, cos θ).
// The patient support turns about the vertical, positive counter-clockwise seen from above (a
// right-handed rotation about +Z_f). DICOM PS3.3 C.8.8.25.6 carries these conventions into the
// RT Plan attributes Gantry Angle (300A,011E) and Patient Support Angle (300A,0122).
// Patient Position (0018,5100), PS3.3 C.7.3.1.1.2: HFS/HFP head toward the gantry, FFS/FFP feet
// toward it; supine faces up, prone faces down. The collimator angle turns the field about the
// beam axis and leaves the central axis, the only line Lamina follows, unchanged.
import type { Vec3 } from './vec3';

export const PATIENT_POSITIONS = ['HFS', 'HFP', 'FFS', 'FFP'] as const;
export type PatientPosition = (typeof PATIENT_POSITIONS)[number];

export function isPatientPosition(v: unknown): v is PatientPosition {
  return typeof v === 'string' && (PATIENT_POSITIONS as readonly string[]).includes(v);
}

export const PATIENT_POSITION_NAMES: Record<PatientPosition, string> = {
  HFS: 'head first, supine',
  HFP: 'head first, prone',
  FFS: 'feet first, supine',
  FFP: 'feet first, prone',
};

const rad = (deg: number) => (deg * Math.PI) / 180;

/**
 * Patient axes (x left, y posterior, z superior) expressed in the patient support system for each
 * position, with the support at angle 0 (then it coincides with the fixed system):
 * HFS: left = +X, posterior = −Z, superior = +Y; HFP: left = −X, posterior = +Z, superior = +Y;
 * FFS: left = −X, posterior = −Z, superior = −Y; FFP: left = +X, posterior = +Z, superior = −Y.
 */
const PATIENT_AXES_IN_SUPPORT: Record<PatientPosition, [Vec3, Vec3, Vec3]> = {
  HFS: [
    [1, 0, 0],
    [0, 0, -1],
    [0, 1, 0],
  ],
  HFP: [
    [-1, 0, 0],
    [0, 0, 1],
    [0, 1, 0],
  ],
  FFS: [
    [-1, 0, 0],
    [0, 0, -1],
    [0, -1, 0],
  ],
  FFP: [
    [1, 0, 0],
    [0, 0, 1],
    [0, -1, 0],
  ],
};

/** Unit vector from the isocentre toward the source, in the IEC fixed system. */
export function sourceDirectionFixed(gantryDeg: number): Vec3 {
  const g = rad(gantryDeg);
  return [Math.sin(g), 0, Math.cos(g)];
}

/** A fixed-system vector in the patient support system turned by couchDeg (inverse rotation about Z). */
export function fixedToSupport(v: Vec3, couchDeg: number): Vec3 {
  const c = Math.cos(rad(couchDeg));
  const s = Math.sin(rad(couchDeg));
  return [c * v[0] + s * v[1], -s * v[0] + c * v[1], v[2]];
}

/** A patient-support-system vector in patient coordinates (x left, y posterior, z superior). */
export function supportToPatient(v: Vec3, position: PatientPosition): Vec3 {
  const [l, p, s] = PATIENT_AXES_IN_SUPPORT[position];
  const d = (a: Vec3) => a[0] * v[0] + a[1] * v[1] + a[2] * v[2];
  return [d(l), d(p), d(s)];
}

/** Unit vector from the isocentre toward the source in patient coordinates. */
export function sourceDirectionPatient(
  gantryDeg: number,
  couchDeg: number,
  position: PatientPosition,
): Vec3 {
  const v = supportToPatient(fixedToSupport(sourceDirectionFixed(gantryDeg), couchDeg), position);
  // Round away floating dust so a 90° beam is exactly lateral.
  return v.map((c) => (Math.abs(c) < 1e-12 ? 0 : c)) as unknown as Vec3;
}
