// Rectangle integrals of a laterally symmetric kernel. For a function of the lateral radius with
// radial cumulative F(S) = ∫₀^S f(s)·2πs ds, the integral over the quadrant rectangle
// [0, U] × [0, V] is (1/2π)·∫₀^{π/2} F(s_max(φ)) dφ with s_max = min(U/cos φ, V/sin φ)
// (polar coordinates about the corner at the origin). Any axis-aligned rectangle is then a signed
// sum of four quadrants.
import { makeSinhGrid, type SinhGrid } from './sinhGrid';
import type { CylinderCumulative } from './cylinderCumulative';

// 8-point Gauss–Legendre nodes and weights on [−1, 1] (Abramowitz & Stegun, Table 25.4).
const GL_X = [
  -0.9602898564975363, -0.7966664774136267, -0.525532409916329, -0.1834346424956498,
  0.1834346424956498, 0.525532409916329, 0.7966664774136267, 0.9602898564975363,
];
const GL_W = [
  0.1012285362903763, 0.2223810344533745, 0.3137066458778873, 0.362683783378362, 0.362683783378362,
  0.3137066458778873, 0.2223810344533745, 0.1012285362903763,
];

/** Sub-intervals per side of the diagonal, clustered towards the corner direction φ*. */
const PANELS = 3;

/** Number of azimuthal quadrature nodes of one quadrant integral. */
export const QUADRANT_NODES = 2 * PANELS * GL_X.length;

/**
 * Nodes of the azimuthal quadrature of (1/2π)·∫₀^{π/2} F(min(U/cos φ, V/sin φ)) dφ for U, V > 0:
 * writes the radii s_k and weights w_k (Σ_k w_k·F(s_k) is the integral). Composite
 * Gauss–Legendre, panels clustered quadratically towards the corner direction φ* = atan(V/U),
 * where s_max changes fastest (thin rectangles).
 */
export function quadrantQuadrature(
  uCm: number,
  vCm: number,
  radiiCm: Float64Array,
  weights: Float64Array,
): void {
  const split = Math.atan2(vCm, uCm);
  const rest = 0.5 * Math.PI - split;
  let n = 0;
  for (let p = 0; p < PANELS; p++) {
    // Panel p covers fractions [f0, f1] of each side's width, measured away from φ*.
    const f0 = (p / PANELS) ** 2;
    const f1 = ((p + 1) / PANELS) ** 2;
    const h1 = 0.5 * (f1 - f0) * split;
    const h2 = 0.5 * (f1 - f0) * rest;
    for (let k = 0; k < GL_X.length; k++) {
      const w = GL_W[k] as number;
      const x = GL_X[k] as number;
      const phi1 = split - split * f0 - h1 * (1 + x);
      radiiCm[n] = uCm / Math.cos(phi1);
      weights[n++] = (w * h1) / (2 * Math.PI);
      const phi2 = split + rest * f0 + h2 * (1 + x);
      radiiCm[n] = vCm / Math.sin(phi2);
      weights[n++] = (w * h2) / (2 * Math.PI);
    }
  }
}

// Scratch for quadrantFromRadial (the engine is single-threaded per worker; the radial function
// it calls must not call it again).
const SCRATCH_RADII = new Float64Array(QUADRANT_NODES);
const SCRATCH_WEIGHTS = new Float64Array(QUADRANT_NODES);

/** Azimuthal quadrature (1/2π)·∫₀^{π/2} F(min(U/cos φ, V/sin φ)) dφ, for U, V ≥ 0. */
export function quadrantFromRadial(
  radialCumulative: (sCm: number) => number,
  uCm: number,
  vCm: number,
): number {
  if (uCm <= 0 || vCm <= 0) return 0;
  const radii = SCRATCH_RADII;
  const weights = SCRATCH_WEIGHTS;
  quadrantQuadrature(uCm, vCm, radii, weights);
  let sum = 0;
  for (let k = 0; k < QUADRANT_NODES; k++)
    sum += (weights[k] as number) * radialCumulative(radii[k] as number);
  return sum;
}

/** Signed quadrant integral: sgn(U)·sgn(V)·quadrant(|U|, |V|). */
export function signedQuadrant(
  quadrant: (u: number, v: number) => number,
  uCm: number,
  vCm: number,
): number {
  const s = Math.sign(uCm) * Math.sign(vCm);
  return s === 0 ? 0 : s * quadrant(Math.abs(uCm), Math.abs(vCm));
}

/** Integral over the rectangle [u1, u2] × [v1, v2] from a quadrant function. */
export function rectangleIntegral(
  quadrant: (u: number, v: number) => number,
  u1: number,
  u2: number,
  v1: number,
  v2: number,
): number {
  return (
    signedQuadrant(quadrant, u2, v2) -
    signedQuadrant(quadrant, u1, v2) -
    signedQuadrant(quadrant, u2, v1) +
    signedQuadrant(quadrant, u1, v1)
  );
}

/**
 * C(ζ, U, V): energy fraction deposited at axial offsets below ζ over the lateral quadrant
 * [0, U] × [0, V], tabulated on (ζ of the cylinder table) × sinh lateral grid, index
 * (iζ · nLat + iU) · nLat + iV.
 */
export interface QuadrantTable {
  zeta: SinhGrid;
  lateral: SinhGrid;
  values: Float64Array;
}

export function quadrantTable(q: CylinderCumulative, lateralSteps = 44): QuadrantTable {
  return quadrantTables([q], lateralSteps)[0] as QuadrantTable;
}

/**
 * Quadrant tables of several cylinder-cumulative kernels on the same grids (their ζ and radius
 * grids must agree). The azimuthal quadrature nodes of each lateral pair (U, V) and their places
 * on the radius grid are found once and reused for every ζ row and every kernel.
 */
export function quadrantTables(
  qs: readonly CylinderCumulative[],
  lateralSteps = 44,
): QuadrantTable[] {
  const first = qs[0];
  if (!first) return [];
  for (const q of qs)
    if (
      q.zeta.nodes.length !== first.zeta.nodes.length ||
      q.radius.nodes.length !== first.radius.nodes.length
    )
      throw new RangeError('quadrantTables: the cylinder tables use different grids');
  const lateral = makeSinhGrid(
    first.radius.nodes[first.radius.nodes.length - 1] as number,
    lateralSteps,
    5,
  );
  const nL = lateral.nodes.length;
  const nZ = first.zeta.nodes.length;
  const nS = first.radius.nodes.length;
  // For every pair iv ≤ iu: the radius-grid cell and fraction of each quadrature node, and the
  // node weight (ζ is a node of the cylinder table, so only the radius is interpolated).
  const pairs = ((nL - 1) * nL) / 2;
  const cell = new Int32Array(pairs * QUADRANT_NODES);
  const frac = new Float64Array(pairs * QUADRANT_NODES);
  const weight = new Float64Array(pairs * QUADRANT_NODES);
  const radii = new Float64Array(QUADRANT_NODES);
  const w = new Float64Array(QUADRANT_NODES);
  let pair = 0;
  for (let iu = 1; iu < nL; iu++)
    for (let iv = 1; iv <= iu; iv++, pair++) {
      quadrantQuadrature(lateral.nodes[iu] as number, lateral.nodes[iv] as number, radii, w);
      for (let k = 0; k < QUADRANT_NODES; k++) {
        const p = first.radius.position(radii[k] as number);
        const i = Math.min(Math.floor(p), nS - 2);
        const o = pair * QUADRANT_NODES + k;
        cell[o] = i;
        frac[o] = p - i;
        weight[o] = w[k] as number;
      }
    }
  return qs.map((q) => {
    const values = new Float64Array(nZ * nL * nL);
    for (let iz = 0; iz < nZ; iz++) {
      const row = iz * nS;
      let pr = 0;
      for (let iu = 1; iu < nL; iu++)
        for (let iv = 1; iv <= iu; iv++, pr++) {
          let c = 0;
          for (let k = pr * QUADRANT_NODES, end = k + QUADRANT_NODES; k < end; k++) {
            const i = row + (cell[k] as number);
            const t = frac[k] as number;
            c +=
              (weight[k] as number) *
              ((1 - t) * (q.values[i] as number) + t * (q.values[i + 1] as number));
          }
          values[(iz * nL + iu) * nL + iv] = c;
          values[(iz * nL + iv) * nL + iu] = c;
        }
    }
    return { zeta: q.zeta, lateral, values };
  });
}

/** C(ζ, U, V) for U, V ≥ 0 by trilinear interpolation. */
export function quadrantAt(t: QuadrantTable, zetaCm: number, uCm: number, vCm: number): number {
  const nL = t.lateral.nodes.length;
  const pz = t.zeta.position(zetaCm);
  const pu = t.lateral.position(uCm);
  const pv = t.lateral.position(vCm);
  const iz = Math.min(Math.floor(pz), t.zeta.nodes.length - 2);
  const iu = Math.min(Math.floor(pu), nL - 2);
  const iv = Math.min(Math.floor(pv), nL - 2);
  const tz = pz - iz;
  const tu = pu - iu;
  const tv = pv - iv;
  const v = t.values;
  let sum = 0;
  for (let dz = 0; dz < 2; dz++) {
    const wz = dz === 0 ? 1 - tz : tz;
    for (let du = 0; du < 2; du++) {
      const wu = du === 0 ? 1 - tu : tu;
      const base = ((iz + dz) * nL + iu + du) * nL + iv;
      sum += wz * wu * ((1 - tv) * (v[base] as number) + tv * (v[base + 1] as number));
    }
  }
  return sum;
}

/**
 * C(ζ_hi, U, V) − C(ζ_lo, U, V) for U, V ≥ 0 (one slab of sources over a quadrant), from
 * fractional grid positions (zeta.position, lateral.position) so callers can reuse them.
 */
export function quadrantSlabAtPositions(
  t: QuadrantTable,
  zetaHiPosition: number,
  zetaLoPosition: number,
  uPosition: number,
  vPosition: number,
): number {
  const nL = t.lateral.nodes.length;
  const nZ = t.zeta.nodes.length;
  const iu = Math.min(Math.floor(uPosition), nL - 2);
  const iv = Math.min(Math.floor(vPosition), nL - 2);
  const tu = uPosition - iu;
  const tv = vPosition - iv;
  const v = t.values;
  const plane = nL * nL;
  const o00 = iu * nL + iv;
  const o10 = o00 + nL;
  const w00 = (1 - tu) * (1 - tv);
  const w01 = (1 - tu) * tv;
  const w10 = tu * (1 - tv);
  const w11 = tu * tv;
  let result = 0;
  for (let k = 0; k < 2; k++) {
    const pz = k === 0 ? zetaHiPosition : zetaLoPosition;
    const iz = Math.min(Math.floor(pz), nZ - 2);
    const tz = pz - iz;
    const a = iz * plane;
    const b = a + plane;
    const lower =
      w00 * (v[a + o00] as number) +
      w01 * (v[a + o00 + 1] as number) +
      w10 * (v[a + o10] as number) +
      w11 * (v[a + o10 + 1] as number);
    const upper =
      w00 * (v[b + o00] as number) +
      w01 * (v[b + o00 + 1] as number) +
      w10 * (v[b + o10] as number) +
      w11 * (v[b + o10 + 1] as number);
    const value = lower + tz * (upper - lower);
    result += k === 0 ? value : -value;
  }
  return result;
}

/**
 * As quadrantSlabAtPositions for the table values + f·delta, where `delta` holds a second table
 * on the same grids (the hardening difference of a kernel, kernelHardening.ts).
 */
export function quadrantSlabMixedAtPositions(
  t: QuadrantTable,
  delta: Float64Array,
  f: number,
  zetaHiPosition: number,
  zetaLoPosition: number,
  uPosition: number,
  vPosition: number,
): number {
  const nL = t.lateral.nodes.length;
  const nZ = t.zeta.nodes.length;
  const iu = Math.min(Math.floor(uPosition), nL - 2);
  const iv = Math.min(Math.floor(vPosition), nL - 2);
  const tu = uPosition - iu;
  const tv = vPosition - iv;
  const v = t.values;
  const plane = nL * nL;
  const o00 = iu * nL + iv;
  const o10 = o00 + nL;
  const w00 = (1 - tu) * (1 - tv);
  const w01 = (1 - tu) * tv;
  const w10 = tu * (1 - tv);
  const w11 = tu * tv;
  let result = 0;
  for (let k = 0; k < 2; k++) {
    const pz = k === 0 ? zetaHiPosition : zetaLoPosition;
    const iz = Math.min(Math.floor(pz), nZ - 2);
    const tz = pz - iz;
    const a = iz * plane;
    const b = a + plane;
    const lower =
      w00 * ((v[a + o00] as number) + f * (delta[a + o00] as number)) +
      w01 * ((v[a + o00 + 1] as number) + f * (delta[a + o00 + 1] as number)) +
      w10 * ((v[a + o10] as number) + f * (delta[a + o10] as number)) +
      w11 * ((v[a + o10 + 1] as number) + f * (delta[a + o10 + 1] as number));
    const upper =
      w00 * ((v[b + o00] as number) + f * (delta[b + o00] as number)) +
      w01 * ((v[b + o00 + 1] as number) + f * (delta[b + o00 + 1] as number)) +
      w10 * ((v[b + o10] as number) + f * (delta[b + o10] as number)) +
      w11 * ((v[b + o10 + 1] as number) + f * (delta[b + o10 + 1] as number));
    const value = lower + tz * (upper - lower);
    result += k === 0 ? value : -value;
  }
  return result;
}

/** C(ζ_hi, U, V) − C(ζ_lo, U, V) for U, V ≥ 0, by trilinear interpolation. */
export function quadrantSlabAt(
  t: QuadrantTable,
  zetaHiCm: number,
  zetaLoCm: number,
  uCm: number,
  vCm: number,
): number {
  return quadrantSlabAtPositions(
    t,
    t.zeta.position(zetaHiCm),
    t.zeta.position(zetaLoCm),
    t.lateral.position(uCm),
    t.lateral.position(vCm),
  );
}
