// What every warning rule reads, resolved once: the phantom, the beam, the beam quality (with
// where it came from) and the points of interest; plus the helper that turns a band into a Warning.
import type { BeamEnergy } from '../beam/energies';
import { fieldAtDepthCm } from '../beam/geometry';
import type { SlabPhantom } from '../phantom/slabPhantom';
import type { BeamQuality } from './beamQuality';
import { clipToPhantom, pointIdsInBand, type DepthBand } from './depthBands';
import type { Warning } from './warning';

export interface RuleContext {
  phantom: SlabPhantom;
  energy: BeamEnergy;
  ssdCm: number;
  /** Field sides defined at 100 cm from the source (cm). */
  fieldXCm: number;
  fieldYCm: number;
  quality: BeamQuality;
  points: readonly { id: string; depthCm: number }[];
}

/** Half the smaller field side at a depth (cm): the distance from the axis to the nearest edge. */
export function fieldHalfWidthAtDepthCm(ctx: RuleContext, depthCm: number): number {
  const a = fieldAtDepthCm(ctx.fieldXCm, ctx.ssdCm, depthCm);
  const b = fieldAtDepthCm(ctx.fieldYCm, ctx.ssdCm, depthCm);
  return Math.min(a, b) / 2;
}

/** "TPR20,10 0.670, d_max 1.50 cm [typical 6MV values, from memory; no water data]". */
export function qualityText(ctx: RuleContext): string {
  const q = ctx.quality;
  return `TPR20,10 ${q.tpr2010.toFixed(3)}, d_max ${q.dMaxCm.toFixed(2)} cm [${q.source}]`;
}

/**
 * A warning over a band, clipped to the phantom, with the points inside it; null when the band
 * has no width inside the phantom (unless `allowZeroWidth`, for events at a single depth).
 */
export function warningOverBand(
  ctx: RuleContext,
  band: DepthBand,
  fields: Omit<Warning, 'depthRangeCm' | 'pointIds'>,
  allowZeroWidth = false,
): Warning | null {
  const clipped = allowZeroWidth
    ? {
        fromCm: Math.min(Math.max(0, band.fromCm), ctx.phantom.totalThicknessCm),
        toCm: Math.min(Math.max(0, band.toCm), ctx.phantom.totalThicknessCm),
      }
    : clipToPhantom(ctx.phantom, band);
  if (clipped === null) return null;
  return { ...fields, depthRangeCm: clipped, pointIds: pointIdsInBand(ctx.points, clipped) };
}
