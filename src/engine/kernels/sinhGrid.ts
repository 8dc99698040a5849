// A non-uniform grid fine near zero and coarse far out: x_k = L·sinh(α·k/N)/sinh(α), k = 0…N,
// optionally mirrored to negative values. Its inverse is analytic, so a look-up costs O(1) —
// which matters in the superposition's inner loops.

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
  if (!mirrored) {
    return {
      nodes: half,
      position(x) {
        if (x <= 0) return 0;
        if (x >= lengthCm) return steps;
        return Math.asinh(x * scale) * kOf;
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
      if (x <= -lengthCm) return 0;
      if (x >= lengthCm) return 2 * steps;
      return steps + Math.asinh(x * scale) * kOf;
    },
  };
}
