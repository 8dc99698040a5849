// What every type-A correction method takes and returns. A method is a pure function of the
// phantom, the point's geometric depth, the field side at that depth and the water data.
import type { MethodId } from '../methodRegistry';
import type { ExtrapolationFlag, LookupRecorder, WaterData } from '../beam/waterData';
import type { SlabPhantom } from '../phantom/slabPhantom';
import type { CorrectionExplanation } from './correctionExplanation';

/** Relative scatter weight of each layer for a point (ETAR's ρ̃); one entry per layer. */
export type ScatterWeightFunction = (
  phantom: SlabPhantom,
  pointDepthCm: number,
  sideAtDepthCm: number,
) => Float64Array;

export interface CorrectionOptions {
  /** SSD (cm): needed by EPL with PDD. */
  ssdCm?: number | undefined;
  /** Batho depth function: TMR (default) or TAR = TMR·PSF. */
  bathoTable?: 'tmr' | 'tar' | undefined;
  /** ETAR: a fixed effective density ρ̃ entered by the user (teaching); wins over weights. */
  etarRhoTilde?: number | undefined;
  /** ETAR: layer weights for ρ̃; the analytic exponential-kernel weighting when absent. */
  etarWeights?: ScatterWeightFunction | undefined;
  /** What the supplied ETAR weights are, for the variant text (e.g. "scatter part of the water kernel"). */
  etarWeightsSource?: string | undefined;
  /**
   * Also return the terms the CF was multiplied from (correctionExplanation.ts): the factor view.
   * The CF is the same either way; the curves leave it off (no per-depth allocations).
   */
  explain?: boolean | undefined;
  /** ETAR default weighting: scatter attenuation length λ (cm); 1/μ_eff of the water data when absent. */
  etarScatterLengthCm?: number | undefined;
}

export interface CorrectionResult {
  /** D_het/D_water at the point, or null where the method gives no value. */
  cf: number | null;
  flags: string[];
  /** The terms the CF was multiplied from (correctionExplanation.ts); absent where none were read. */
  explanation?: CorrectionExplanation;
}

export interface TypeAMethod {
  /** Stable id from the method registry: water, rtmr, epl-pdd, batho, batho-modified, etar. */
  id: MethodId;
  label: string;
  variant(options: CorrectionOptions): string;
  /** Whether the method reads PSF with these options (its variant then names a PSF approximation). */
  usesPsf?: (options: CorrectionOptions) => boolean;
  correct(
    phantom: SlabPhantom,
    pointDepthCm: number,
    sideAtDepthCm: number,
    waterData: WaterData,
    options: CorrectionOptions,
  ): CorrectionResult;
}

/** A recorder that keeps the clamp events of one evaluation as short flag strings. */
export function collectingRecorder(): { recorder: LookupRecorder; flags: () => string[] } {
  const seen = new Set<string>();
  const recorder: LookupRecorder = {
    flag(f: ExtrapolationFlag) {
      const unit = 'cm';
      seen.add(
        `extrapolated: ${f.quantity} ${f.requested.toFixed(2)} ${unit} outside the table, clamped to ${f.clampedTo} ${unit}`,
      );
    },
  };
  return { recorder, flags: () => [...seen] };
}

/** A CF that is finite and positive, or null (never NaN) with a flag saying why. */
export function checkedCf(
  cf: number,
  flags: string[],
  explanation?: CorrectionExplanation,
): CorrectionResult {
  const terms = explanation ? { explanation } : {};
  if (Number.isFinite(cf) && cf > 0) return { cf, flags, ...terms };
  return {
    cf: null,
    flags: [...flags, 'undefined: the method gives no finite positive value here'],
    ...terms,
  };
}
