// Depth intervals on the central axis: inverse radiological depth, clipping to the phantom, and
// the set of depths where a condition holds (scan, then bisect each change to 1e-7 cm).
import { radiologicalDepthCm, type SlabPhantom } from '../phantom/slabPhantom';

export interface DepthBand {
  fromCm: number;
  toCm: number;
}

/**
 * Geometric depth (cm) at which the radiological depth reaches `radiologicalCm`; the phantom's
 * bottom when it never does. Inverse of radiologicalDepthCm on [0, total].
 */
export function depthAtRadiologicalDepthCm(phantom: SlabPhantom, radiologicalCm: number): number {
  if (radiologicalCm <= 0) return 0;
  const rad = phantom.radiologicalBoundariesCm;
  for (let i = 0; i < phantom.layers.length; i++) {
    const bottomRad = rad[i + 1] as number;
    if (radiologicalCm <= bottomRad) {
      const layer = phantom.layers[i];
      if (layer === undefined) break;
      return layer.topCm + (radiologicalCm - (rad[i] as number)) / layer.relativeElectronDensity;
    }
  }
  return phantom.totalThicknessCm;
}

/** Depth reached by going `waterEquivalentCm` downstream (radiologically) from `depthCm`. */
export function depthAfterWaterEquivalentCm(
  phantom: SlabPhantom,
  depthCm: number,
  waterEquivalentCm: number,
): number {
  return depthAtRadiologicalDepthCm(
    phantom,
    radiologicalDepthCm(phantom, depthCm) + waterEquivalentCm,
  );
}

/** The band clipped to the phantom, or null when nothing of positive width is left. */
export function clipToPhantom(phantom: SlabPhantom, band: DepthBand): DepthBand | null {
  const fromCm = Math.max(0, band.fromCm);
  const toCm = Math.min(phantom.totalThicknessCm, band.toCm);
  return toCm - fromCm > 1e-9 ? { fromCm, toCm } : null;
}

const BISECT_TOLERANCE_CM = 1e-7;

/**
 * Maximal depth intervals in [0, total] where `holds(depthCm)` is true. The depth axis is scanned
 * with `stepCm` (plus every layer boundary); each change of state is located by bisection.
 * Features narrower than the step between two samples can be missed.
 */
export function bandsWhere(
  phantom: SlabPhantom,
  holds: (depthCm: number) => boolean,
  stepCm = 0.05,
): DepthBand[] {
  const total = phantom.totalThicknessCm;
  const samples = new Set<number>();
  const n = Math.max(1, Math.ceil(total / stepCm));
  for (let i = 0; i <= n; i++) samples.add((total * i) / n);
  for (const b of phantom.boundariesCm) {
    samples.add(b);
    // Just below each interface (the interface itself belongs to the upstream layer).
    if (b + 1e-6 < total) samples.add(b + 1e-6);
  }
  const depths = [...samples].sort((a, b) => a - b);
  const bands: DepthBand[] = [];
  let prevDepth = depths[0] ?? 0;
  let prevState = holds(prevDepth);
  let openFrom: number | null = prevState ? prevDepth : null;
  for (let k = 1; k < depths.length; k++) {
    const d = depths[k] as number;
    const state = holds(d);
    if (state !== prevState) {
      const edge = snapToBoundary(phantom, bisectEdge(holds, prevDepth, d, prevState));
      if (state) openFrom = edge;
      else if (openFrom !== null) {
        bands.push({ fromCm: openFrom, toCm: edge });
        openFrom = null;
      }
    }
    prevDepth = d;
    prevState = state;
  }
  if (openFrom !== null) bands.push({ fromCm: openFrom, toCm: total });
  return bands.filter((b) => b.toCm - b.fromCm > 1e-6);
}

function bisectEdge(
  holds: (depthCm: number) => boolean,
  lo: number,
  hi: number,
  stateAtLo: boolean,
): number {
  let a = lo;
  let b = hi;
  while (b - a > BISECT_TOLERANCE_CM) {
    const mid = 0.5 * (a + b);
    if (holds(mid) === stateAtLo) a = mid;
    else b = mid;
  }
  return 0.5 * (a + b);
}

/** An edge found by bisection, snapped onto a layer boundary when it lies within 1e-5 cm of one. */
function snapToBoundary(phantom: SlabPhantom, depthCm: number): number {
  for (const b of phantom.boundariesCm) if (Math.abs(b - depthCm) < 1e-5) return b;
  return depthCm;
}

/** Ids of the points whose depth lies in the band (ends included). */
export function pointIdsInBand(
  points: readonly { id: string; depthCm: number }[],
  band: DepthBand,
): string[] {
  return points
    .filter((p) => p.depthCm >= band.fromCm - 1e-9 && p.depthCm <= band.toCm + 1e-9)
    .map((p) => p.id);
}
