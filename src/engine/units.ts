// Units used throughout the engine: cm, g/cm³, MeV, Gy (and cGy/MU at the check level).
// Quantities carry their unit in their names (depthCm, densityGPerCm3, energyMeV, dosePerMuCGy).

/** Electron rest energy m_e c² in MeV (CODATA 2018). */
export const ELECTRON_REST_ENERGY_MEV = 0.51099895;

/** Classical electron radius in cm (CODATA 2018). */
export const CLASSICAL_ELECTRON_RADIUS_CM = 2.8179403262e-13;

/** Avogadro's number per mole (SI 2019 exact value). */
export const AVOGADRO_PER_MOL = 6.02214076e23;

/** Tolerance used to decide that a depth lies on an interface (cm). */
export const INTERFACE_EPSILON_CM = 1e-9;

/** Linear interpolation between (x0, y0) and (x1, y1) at x. */
export function lerp(x: number, x0: number, x1: number, y0: number, y1: number): number {
  if (x1 === x0) return y0;
  return y0 + ((y1 - y0) * (x - x0)) / (x1 - x0);
}

/**
 * Index i such that xs[i] <= x < xs[i+1] in an ascending array, clamped to [0, xs.length - 2].
 * Binary search; xs must have at least two entries.
 */
export function bracketIndex(xs: ArrayLike<number>, x: number): number {
  let lo = 0;
  let hi = xs.length - 1;
  if (x <= (xs[0] as number)) return 0;
  if (x >= (xs[hi] as number)) return hi - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if ((xs[mid] as number) <= x) lo = mid;
    else hi = mid;
  }
  return lo;
}

/**
 * Log–log interpolation of a positive table (energies ascending), clamped at both ends.
 * Used for μ/ρ, μ_en/ρ and stopping powers, which are smooth on log–log axes.
 */
export function logLogInterpolate(xs: ArrayLike<number>, ys: ArrayLike<number>, x: number): number {
  const n = xs.length;
  if (x <= (xs[0] as number)) return ys[0] as number;
  if (x >= (xs[n - 1] as number)) return ys[n - 1] as number;
  const i = bracketIndex(xs, x);
  const x0 = xs[i] as number;
  const x1 = xs[i + 1] as number;
  const y0 = ys[i] as number;
  const y1 = ys[i + 1] as number;
  if (y0 <= 0 || y1 <= 0) return lerp(x, x0, x1, y0, y1);
  const t = Math.log(x / x0) / Math.log(x1 / x0);
  return Math.exp(Math.log(y0) + t * Math.log(y1 / y0));
}
