// Beam geometry on the central axis: source-to-surface distance, field size at depth and the
// equivalent square of a rectangle.

/** Reference distance at which the field is defined (cm from the source). */
export const FIELD_DEFINITION_DISTANCE_CM = 100;

export type Setup =
  { kind: 'SSD'; ssdCm: number } | { kind: 'SAD'; sadCm: number; isocentreDepthCm: number };

/** Source-to-surface distance (cm) of a set-up. SAD: SSD = SAD − depth of the isocentre. */
export function ssdCmOf(setup: Setup): number {
  return setup.kind === 'SSD' ? setup.ssdCm : setup.sadCm - setup.isocentreDepthCm;
}

/**
 * Field side at a depth (cm), from the side defined at 100 cm from the source, by divergence
 * from a point source: s_d = s_100 · (SSD + d)/100.
 */
export function fieldAtDepthCm(side100Cm: number, ssdCm: number, depthCm: number): number {
  return (side100Cm * (ssdCm + depthCm)) / FIELD_DEFINITION_DISTANCE_CM;
}

/** Equivalent square of an a × b rectangle by the area/perimeter rule, s = 2ab/(a + b) (common practice). */
export function equivalentSquareCm(aCm: number, bCm: number): number {
  return (2 * aCm * bCm) / (aCm + bCm);
}

/**
 * Side of the square field equivalent to a circle of radius R: R = 0.561·s (equivalent circle of
 * a square field, common practice; seen as such on a public BJR figure caption).
 */
export function squareOfEquivalentCircleCm(radiusCm: number): number {
  return radiusCm / 0.561;
}
