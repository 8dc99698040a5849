// A dose plane on a rectilinear grid (lateral x across, depth z down the beam axis) and what the
// page reads from it: bilinear values anywhere inside, a lateral row at any depth, the central-axis
// maximum, the resampling of one plane onto another's nodes and the difference of two planes.

export interface PlaneGrid {
  /** Lateral node positions (cm), ascending. */
  xCm: readonly number[];
  /** Depth node positions (cm), ascending. */
  depthCm: readonly number[];
  /** One row per depth, one value per x (e.g. cGy/MU). */
  values: readonly (readonly number[])[];
}

const at = (a: readonly number[], i: number): number => a[i] as number;

/** Index i with a[i] ≤ v ≤ a[i+1] (clamped to the ends) and the fraction of the way from a[i]. */
export function cellOf(a: readonly number[], v: number): { i: number; t: number } {
  const n = a.length;
  if (n < 2) return { i: 0, t: 0 };
  if (v <= at(a, 0)) return { i: 0, t: 0 };
  if (v >= at(a, n - 1)) return { i: n - 2, t: 1 };
  let lo = 0;
  let hi = n - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (at(a, mid) <= v) lo = mid;
    else hi = mid;
  }
  const span = at(a, lo + 1) - at(a, lo);
  return { i: lo, t: span > 0 ? (v - at(a, lo)) / span : 0 };
}

/** Value at (x, z) by bilinear interpolation between the four surrounding nodes (ends clamped). */
export function bilinearAt(g: PlaneGrid, xCm: number, depthCm: number): number {
  const cx = cellOf(g.xCm, xCm);
  const cz = cellOf(g.depthCm, depthCm);
  const row0 = g.values[cz.i] ?? [];
  const row1 = g.values[Math.min(cz.i + 1, g.depthCm.length - 1)] ?? row0;
  const j1 = Math.min(cx.i + 1, g.xCm.length - 1);
  const v00 = row0[cx.i] ?? NaN;
  const v01 = row0[j1] ?? NaN;
  const v10 = row1[cx.i] ?? NaN;
  const v11 = row1[j1] ?? NaN;
  const top = v00 + (v01 - v00) * cx.t;
  const bottom = v10 + (v11 - v10) * cx.t;
  return top + (bottom - top) * cz.t;
}

/** The lateral row at a depth, linear between the two nearest rows, over the plane's own x nodes. */
export function rowAtDepth(g: PlaneGrid, depthCm: number): number[] {
  return g.xCm.map((x) => bilinearAt(g, x, depthCm));
}

/** Largest value on the central axis (x = 0), over the depth nodes. */
export function centralAxisMax(g: PlaneGrid): number {
  let max = -Infinity;
  for (const z of g.depthCm) {
    const v = bilinearAt(g, 0, z);
    if (Number.isFinite(v) && v > max) max = v;
  }
  return max;
}

/** Nodes of `a` that lie inside the extent of `b` (tolerance 1e-9 cm). */
function inside(a: readonly number[], b: readonly number[]): number[] {
  const lo = at(b, 0) - 1e-9;
  const hi = at(b, b.length - 1) + 1e-9;
  return a.filter((v) => v >= lo && v <= hi);
}

/** `src` resampled (bilinear) onto the nodes of `target` that lie inside both planes. */
export function resampleOnto(src: PlaneGrid, target: PlaneGrid): PlaneGrid {
  const xCm = inside(target.xCm, src.xCm);
  const depthCm = inside(target.depthCm, src.depthCm);
  return { xCm, depthCm, values: depthCm.map((z) => xCm.map((x) => bilinearAt(src, x, z))) };
}

/**
 * (a − b) in % of `referenceDose` on b's nodes inside both planes; a is resampled onto b's grid
 * when the grids differ (b, the reference method, keeps its own values).
 */
export function planeDifferencePercent(
  a: PlaneGrid,
  b: PlaneGrid,
  referenceDose: number,
): PlaneGrid {
  const onB = resampleOnto(a, b);
  const bOn = resampleOnto(b, onB);
  const scale = referenceDose > 0 ? 100 / referenceDose : NaN;
  return {
    xCm: onB.xCm,
    depthCm: onB.depthCm,
    values: onB.values.map((row, iz) =>
      row.map((v, ix) => (v - (bOn.values[iz]?.[ix] ?? NaN)) * scale),
    ),
  };
}

/** True when the plane has at least 2 × 2 nodes and every value is finite. */
export function isDrawable(g: PlaneGrid): boolean {
  return (
    g.xCm.length >= 2 &&
    g.depthCm.length >= 2 &&
    g.values.length === g.depthCm.length &&
    g.values.every((r) => r.length === g.xCm.length && r.every(Number.isFinite))
  );
}
