// The intermediate terms of a type-A correction, written out by the method that computes the CF
// when asked (CorrectionOptions.explain): the quantities it read (depths, densities, table values)
// and the factors it multiplied, the same numbers in the same order, so productOfFactors of them
// is the CF the method returns (tests check it). The page's factor view reads them; nothing
// re-derives a formula from them.

/** A number the method read or computed on the way (not a factor of the product). */
export interface ExplainQuantity {
  /** Short symbol as printed, e.g. "d′". */
  symbol: string;
  /** What it is, in words. */
  label: string;
  value: number;
  /** Unit as printed ("cm", "g/cm³", "" for a pure number). */
  unit: string;
}

/** One factor of the CF's product. */
export interface ExplainFactor {
  /** The factor as a formula, e.g. "TMR(d′, s)/TMR(d, s)". */
  symbol: string;
  label: string;
  value: number;
}

/** One layer's factor in the Batho power law: T(X_m + shift)^(ρ_m − ρ_{m−1}). */
export interface BathoLayerTerm {
  layerIndex: number;
  /** ρ_{m−1} (ρ₀ ≡ 1, water) and ρ_m: relative electron densities. */
  previousRho: number;
  rho: number;
  /** ρ_m − ρ_{m−1}; 0: the layer adds no factor (its factor is 1). */
  exponent: number;
  /** X_m = d − z_top,m (cm). */
  distanceCm: number;
  /** X_m + shift (cm): where the depth function is read. */
  readAtCm: number;
  /** T(X_m + shift): TMR, or TMR·PSF for the TAR form; null when the exponent is 0 (not read). */
  depthFunction: number | null;
  /** T^exponent (1 when the exponent is 0). */
  factor: number;
}

export interface CorrectionExplanation {
  quantities: ExplainQuantity[];
  /** Their product, in this order, is the method's CF. */
  factors: ExplainFactor[];
  /** Batho forms: the per-layer factors (their product is the one factor in `factors`). */
  bathoLayers?: BathoLayerTerm[];
}

/** Π factors, left to right: the one product each method returns as its CF. */
export function productOfFactors(factors: readonly { value: number }[]): number {
  let p = 1;
  for (const f of factors) p *= f.value;
  return p;
}
