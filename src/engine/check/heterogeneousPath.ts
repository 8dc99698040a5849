// Whether the beam's path to a point crosses a heterogeneity, which selects the action level.
// A layer counts as heterogeneous when its relative electron density differs from water's by
// at least the threshold (0.1 by default, the same step that marks an interface elsewhere).

export const HETEROGENEITY_THRESHOLD = 0.1;

export interface PathLayer {
  topCm: number;
  bottomCm: number;
  relativeElectronDensity: number;
}

/**
 * True when any layer from the surface down to `depthCm` is not water-like. The point's own layer
 * counts; a point on an interface belongs to the upstream layer, so the layer below does not.
 */
export function isHeterogeneousPath(
  layers: readonly PathLayer[],
  depthCm: number,
  threshold = HETEROGENEITY_THRESHOLD,
): boolean {
  return layers.some(
    (l, i) =>
      (i === 0 || l.topCm < depthCm - 1e-9) && Math.abs(l.relativeElectronDensity - 1) >= threshold,
  );
}
