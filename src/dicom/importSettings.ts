// The editable settings of an import: calibration curve, body threshold, segmentation and
// material tolerance, extra points along each ray.
import { DEFAULT_BODY_THRESHOLD_HU } from './bodyOutline';
import { defaultCalibration, type Calibration } from './calibration';
import { DEFAULT_MATERIAL_TOLERANCE_RHO_E } from './materialMapping';
import { DEFAULT_SEGMENTATION, type SegmentationOptions } from './segmentation';

export interface ImportSettings {
  calibration: Calibration;
  bodyThresholdHu: number;
  segmentation: SegmentationOptions;
  materialToleranceRhoE: number;
  /** Extra points on each beam's axis, as distances past the isocentre (cm; negative = upstream). */
  extraPointOffsetsCm: readonly number[];
}

export function defaultImportSettings(): ImportSettings {
  return {
    calibration: defaultCalibration(),
    bodyThresholdHu: DEFAULT_BODY_THRESHOLD_HU,
    segmentation: { ...DEFAULT_SEGMENTATION },
    materialToleranceRhoE: DEFAULT_MATERIAL_TOLERANCE_RHO_E,
    extraPointOffsetsCm: [],
  };
}

/** Problems with settings a user typed (each names the field). */
export function settingsProblems(s: ImportSettings): string[] {
  const p: string[] = [];
  if (!Number.isFinite(s.bodyThresholdHu) || s.bodyThresholdHu <= -1000 || s.bodyThresholdHu >= 0)
    p.push('body threshold: must lie between −1000 and 0 HU');
  if (!(s.segmentation.similarityRhoE >= 0 && s.segmentation.similarityRhoE <= 1))
    p.push('similarity threshold: must lie in 0…1 (relative electron density)');
  if (!(s.segmentation.minThicknessCm >= 0 && s.segmentation.minThicknessCm <= 10))
    p.push('minimum slab thickness: must lie in 0…10 cm');
  if (!(s.materialToleranceRhoE >= 0 && s.materialToleranceRhoE <= 1))
    p.push('material tolerance: must lie in 0…1 (relative electron density)');
  s.extraPointOffsetsCm.forEach((o, i) => {
    if (!Number.isFinite(o) || Math.abs(o) > 50)
      p.push(`extra point ${i + 1}: offset must lie within ±50 cm`);
  });
  return p;
}
