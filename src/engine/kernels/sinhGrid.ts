// A non-uniform grid fine near zero and coarse far out: x_k = L·sinh(α·k/N)/sinh(α), k = 0…N,
// optionally mirrored to negative values. Its inverse is analytic; for speed in the
// superposition's inner loops it is read from a fine table of asinh (16 384 intervals, linear
// between them: error below 1e-3 of a node spacing for the grids used here).

export interface SinhGrid {
  /** Node positions, ascending. */
  nodes: Float64Array;
  /** Fractional node index of a value, clamped to [0, nodes.length − 1]. */
  position(x: number): number;
}

/**
 * Grid on [0, L] (N + 1 nodes) or, when `mirrored`, on [−L, L] (2N + 1 nodes).
 * The first step is ≈ L·α/(N·sinh α).
 */
export function makeSinhGrid(
  lengthCm: number,
  steps: number,
  alpha: number,
  mirrored = false,
): SinhGrid {
  const s = Math.sinh(alpha);
  const half = new Float64Array(steps + 1);
  for (let k = 0; k <= steps; k++) half[k] = (lengthCm * Math.sinh((alpha * k) / steps)) / s;
  const scale = s / lengthCm;
  const kOf = steps / alpha;
  // Fractional index of |x| on [0, L], tabulated: idx(x) = asinh(x·scale)·kOf.
  const tableSteps = 16384;
  const perCm = tableSteps / lengthCm;
  const table = new Float64Array(tableSteps + 2);
  for (let i = 0; i <= tableSteps + 1; i++)
    table[i] = Math.asinh(Math.min(i / perCm, lengthCm) * scale) * kOf;
  const halfPosition = (x: number): number => {
    if (x >= lengthCm) return steps;
    const f = x * perCm;
    const i = Math.floor(f);
    const a = table[i] as number;
    return a + (f - i) * ((table[i + 1] as number) - a);
  };
  if (!mirrored) {
    return {
      nodes: half,
      position(x) {
        return x <= 0 ? 0 : halfPosition(x);
      },
    };
  }
  const nodes = new Float64Array(2 * steps + 1);
  for (let k = 0; k <= steps; k++) {
    nodes[steps + k] = half[k] as number;
    nodes[steps - k] = -(half[k] as number);
  }
  return {
    nodes,
    position(x) {
      return x >= 0 ? steps + halfPosition(x) : steps - halfPosition(-x);
    },
  };
}
