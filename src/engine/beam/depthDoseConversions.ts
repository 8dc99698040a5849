// Conversions between percentage depth dose (fixed SSD) and tissue–maximum / tissue–air ratios
// on the central axis, and the Mayneord F factor. Formulas as given in Khan, The Physics of
// Radiation Therapy, TAR/TMR chapters (from memory); symbols: f = SSD, d_m = depth of maximum,
// s = field side at the surface, s_d = s·(f + d)/f its divergent size at depth d.

/** Field side at depth d of a field whose side at the surface (SSD f) is s: s·(f + d)/f. */
export function sideAtDepthFromSurfaceCm(
  surfaceSideCm: number,
  ssdCm: number,
  depthCm: number,
): number {
  return (surfaceSideCm * (ssdCm + depthCm)) / ssdCm;
}

/** Inverse-square ratio ((f + d)/(f + d_m))² carried by a PDD measured at fixed SSD. */
export function pddInverseSquareRatio(ssdCm: number, depthCm: number, dMaxCm: number): number {
  const r = (ssdCm + depthCm) / (ssdCm + dMaxCm);
  return r * r;
}

/**
 * PDD → TMR (Khan, from memory):
 * TMR(d, s_d) = [PDD(d, s, f)/100] · ((f + d)/(f + d_m))² · S_p(s_dm)/S_p(s_d).
 * `spRatio` is S_p(s_dm)/S_p(s_d) (1 when phantom-scatter factors are unknown).
 */
export function tmrFromPdd(
  pddPercent: number,
  ssdCm: number,
  depthCm: number,
  dMaxCm: number,
  spRatio: number,
): number {
  return (pddPercent / 100) * pddInverseSquareRatio(ssdCm, depthCm, dMaxCm) * spRatio;
}

/**
 * TMR → PDD (Khan, from memory):
 * PDD(d, s, f) = 100 · TMR(d, s_d) · ((f + d_m)/(f + d))² · S_p(s_d)/S_p(s_dm).
 * `spRatio` is S_p(s_d)/S_p(s_dm), the inverse of the ratio in `tmrFromPdd`.
 */
export function pddFromTmr(
  tmr: number,
  ssdCm: number,
  depthCm: number,
  dMaxCm: number,
  spRatio: number,
): number {
  return (100 * tmr * spRatio) / pddInverseSquareRatio(ssdCm, depthCm, dMaxCm);
}

/** TAR → TMR (Khan, from memory): TMR(d, s_d) = TAR(d, s_d)/PSF(s_d). */
export function tmrFromTar(tar: number, psf: number): number {
  return tar / psf;
}

/** TMR → TAR: TAR(d, s_d) = TMR(d, s_d)·PSF(s_d). */
export function tarFromTmr(tmr: number, psf: number): number {
  return tmr * psf;
}

/**
 * Mayneord F factor (Khan, from memory): PDD(d, s, f2) ≈ PDD(d, s, f1)·F with
 * F = [(f2 + d_m)/(f1 + d_m)]² · [(f1 + d)/(f2 + d)]². Ignores the change of scatter with the
 * divergent field; converting through TMR is the better route.
 */
export function mayneordF(ssd1Cm: number, ssd2Cm: number, depthCm: number, dMaxCm: number): number {
  const a = (ssd2Cm + dMaxCm) / (ssd1Cm + dMaxCm);
  const b = (ssd1Cm + depthCm) / (ssd2Cm + depthCm);
  return a * a * b * b;
}
