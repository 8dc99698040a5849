// Dose per monitor unit on the central axis with the full factor chain, TMR formalism of AAPM
// TG-71 (Gibbons et al. 2014, from memory), used for SSD and SAD set-ups alike:
//   D/MU = D′₀ · S_c(r_c) · S_p(r_d) · TMR(d, r_d) · ((SCD_ref)/(SSD + d))² · CF
// D′₀ = reference dose rate at d_max for 10 × 10 cm² at the reference distance SCD_ref = 100 + d_max
// (SSD-100 calibration), r_c = collimator field (equivalent square at 100 cm), r_d = field at the
// point's depth, CF = heterogeneity correction factor of the chosen method.
import { equivalentSquareCm, fieldAtDepthCm, FIELD_DEFINITION_DISTANCE_CM } from '../beam/geometry';
import type { LookupRecorder, WaterData } from '../beam/waterData';

export interface DosePerMuInput {
  waterData: WaterData;
  /** Source-to-surface distance (cm); for an SAD set-up, SAD − isocentre depth. */
  ssdCm: number;
  /** Geometric depth of the point (cm). */
  depthCm: number;
  /** Field sides at 100 cm from the source (cm). */
  fieldXCm: number;
  fieldYCm: number;
  /** Heterogeneity correction factor (1 for water). */
  cf: number;
  recorder?: LookupRecorder | undefined;
}

export interface DosePerMuFactors {
  referenceDosePerMuCGy: number;
  /** Collimator-scatter factor at the collimator field. */
  sc: number;
  /** Phantom-scatter factor at the field at depth. */
  sp: number;
  tmr: number;
  /** ((100 + d_max)/(SSD + d))². */
  inverseSquare: number;
  cf: number;
  dosePerMuCGy: number;
  /** Equivalent squares used: collimator (at 100 cm) and at the point's depth (cm). */
  collimatorSideCm: number;
  sideAtDepthCm: number;
  /** The chain as one line, e.g. for a printed record. */
  formula: string;
}

export const DOSE_PER_MU_FORMULA =
  'D/MU = D′₀ × S_c(r_c) × S_p(r_d) × TMR(d, r_d) × ((100 + d_max)/(SSD + d))² × CF';

export function dosePerMuFactors(input: DosePerMuInput): DosePerMuFactors {
  const { waterData: wd, ssdCm, depthCm, cf, recorder } = input;
  const collimatorSideCm = equivalentSquareCm(input.fieldXCm, input.fieldYCm);
  const sideAtDepthCm = equivalentSquareCm(
    fieldAtDepthCm(input.fieldXCm, ssdCm, depthCm),
    fieldAtDepthCm(input.fieldYCm, ssdCm, depthCm),
  );
  const sc = wd.sc(collimatorSideCm, recorder);
  const sp = wd.sp(sideAtDepthCm, recorder);
  const tmr = wd.tmr(depthCm, sideAtDepthCm, recorder);
  const r = (FIELD_DEFINITION_DISTANCE_CM + wd.dMaxCm) / (ssdCm + depthCm);
  const inverseSquare = r * r;
  const dosePerMuCGy = wd.referenceDosePerMuCGy * sc * sp * tmr * inverseSquare * cf;
  const formula = `${DOSE_PER_MU_FORMULA} = ${wd.referenceDosePerMuCGy.toFixed(4)} × ${sc.toFixed(4)} × ${sp.toFixed(4)} × ${tmr.toFixed(4)} × ${inverseSquare.toFixed(4)} × ${cf.toFixed(4)} = ${dosePerMuCGy.toFixed(4)} cGy/MU`;
  return {
    referenceDosePerMuCGy: wd.referenceDosePerMuCGy,
    sc,
    sp,
    tmr,
    inverseSquare,
    cf,
    dosePerMuCGy,
    collimatorSideCm,
    sideAtDepthCm,
    formula,
  };
}
