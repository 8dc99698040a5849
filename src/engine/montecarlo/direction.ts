// Direction cosines: rotating a unit vector by a polar angle and an azimuth.

/** A particle direction (unit vector), mutated in place. */
export interface Direction {
  u: number;
  v: number;
  w: number;
}

/**
 * Turns `d` by polar angle θ (given as cos θ) about its own axis at azimuth φ; standard formula
 * with the near-pole branch for |w| → 1. Renormalises to keep round-off from accumulating.
 */
export function rotateDirection(d: Direction, cosTheta: number, phi: number): void {
  const sinTheta = Math.sqrt(Math.max(0, 1 - cosTheta * cosTheta));
  const cosPhi = Math.cos(phi);
  const sinPhi = Math.sin(phi);
  const { u, v, w } = d;
  const s2 = 1 - w * w;
  let nu: number;
  let nv: number;
  let nw: number;
  if (s2 < 1e-10) {
    nu = sinTheta * cosPhi;
    nv = sinTheta * sinPhi;
    nw = (w >= 0 ? 1 : -1) * cosTheta;
  } else {
    const s = Math.sqrt(s2);
    nu = u * cosTheta + (sinTheta * (u * w * cosPhi - v * sinPhi)) / s;
    nv = v * cosTheta + (sinTheta * (v * w * cosPhi + u * sinPhi)) / s;
    nw = w * cosTheta - s * sinTheta * cosPhi;
  }
  const n = 1 / Math.sqrt(nu * nu + nv * nv + nw * nw);
  d.u = nu * n;
  d.v = nv * n;
  d.w = nw * n;
}
