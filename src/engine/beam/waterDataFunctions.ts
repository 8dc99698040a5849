// Depth functions derived from any `WaterData`: TAR, PDD at a given SSD and the effective
// attenuation coefficient. Separate from the interface so both producers share one definition.
import { pddFromTmr, tarFromTmr } from './depthDoseConversions';
import type { LookupRecorder, WaterData } from './waterData';

/** TAR(d, s_d) = TMR(d, s_d)·PSF(s_d) (Khan, from memory). */
export function tarOf(
  wd: WaterData,
  depthCm: number,
  sideCm: number,
  recorder?: LookupRecorder,
): number {
  return tarFromTmr(wd.tmr(depthCm, sideCm, recorder), wd.psf(sideCm, recorder));
}

/**
 * PDD(d, s, f) in percent for a field of side s at the surface at SSD f, rebuilt from TMR:
 * PDD = 100·TMR(d, s_d)·((f + d_m)/(f + d))²·S_p(s_d)/S_p(s_dm) (Khan, from memory).
 */
export function pddOf(
  wd: WaterData,
  depthCm: number,
  surfaceSideCm: number,
  ssdCm: number,
  recorder?: LookupRecorder,
): number {
  const sd = (surfaceSideCm * (ssdCm + depthCm)) / ssdCm;
  const sdm = (surfaceSideCm * (ssdCm + wd.dMaxCm)) / ssdCm;
  const spRatio = wd.sp(sd, recorder) / wd.sp(sdm, recorder);
  return pddFromTmr(wd.tmr(depthCm, sd, recorder), ssdCm, depthCm, wd.dMaxCm, spRatio);
}

/**
 * Effective linear attenuation coefficient of the beam in water (cm⁻¹) from the TMR slope between
 * 10 and 20 cm for a 10 × 10 cm² field: μ_eff = ln(TMR(10)/TMR(20))/10.
 */
export function effectiveAttenuationPerCm(wd: WaterData): number {
  return Math.log(wd.tmr(10, 10) / wd.tmr(20, 10)) / 10;
}
