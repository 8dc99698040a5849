// The ranges every typed or loaded number must lie in, shared by the case schema, the page's
// fields, the measured-table builder and the command line, with the one wording of an
// out-of-range message ("must be ≥ 50 cm"), so a value refused in one place is refused in all.

export interface NumericRange {
  /** Unit printed after the bounds ('' for none). */
  unit: string;
  min: number;
  /** True when the minimum itself is not allowed. */
  minExclusive?: boolean;
  max: number;
  /** True when the maximum itself is not allowed. */
  maxExclusive?: boolean;
  /**
   * Smallest value accepted above the minimum (inclusive): a value past the minimum but below the
   * floor is refused with "must be ≥ floor", so "must be > 0 cm" still reads for 0 and below.
   */
  floor?: number;
}

/**
 * Lowest mass density accepted (g/cm³): air. Dry air near sea level is 1.205 × 10⁻³ g/cm³ (NIST
 * SRD 126, Table 2); 1.0 × 10⁻³ leaves room for warm air or air at altitude (about 1800 m) and is
 * the least dense medium the engine is built for. Below it a "layer" is vacuum, which the
 * electron-range and kernel-scaling rules (lengths ∝ 1/ρ) do not describe.
 */
export const MIN_DENSITY_G_PER_CM3 = 0.001;

/**
 * Thinnest layer accepted (cm): 10 µm, far below a CT voxel or a film; thinner "layers" only carry
 * rounding (1e-323 cm gave a non-finite superposition curve).
 */
export const MIN_LAYER_THICKNESS_CM = 0.001;

/**
 * Smallest planning dose compared (cGy); 0 means none. A denormal planning dose gave an infinite
 * percent difference.
 */
export const MIN_PLANNING_DOSE_CGY = 0.001;

export const RANGES = {
  /** Mass density of a layer (g/cm³): air up to beyond cortical bone. */
  densityGPerCm3: { unit: 'g/cm³', min: MIN_DENSITY_G_PER_CM3, max: 3 },
  layerThicknessCm: {
    unit: 'cm',
    min: 0,
    minExclusive: true,
    floor: MIN_LAYER_THICKNESS_CM,
    max: 100,
  },
  /** Source distances: SSD, SAD and the SSD of a PDD table (cm). */
  distanceCm: { unit: 'cm', min: 50, max: 150 },
  /** Field side at 100 cm from the source (cm). */
  fieldCm: { unit: 'cm', min: 1, max: 40 },
  /** Depth of maximum dose of water data (cm). */
  dMaxCm: { unit: 'cm', min: 0, minExclusive: true, max: 10, maxExclusive: true },
  /** Reference dose rate at d_max, 10 × 10, SSD 100 (cGy/MU). */
  referenceDosePerMuCGy: { unit: 'cGy/MU', min: 0, minExclusive: true, max: 10 },
} as const satisfies Record<string, NumericRange>;

/** Limits that keep inputs physical and inside what the engine is built for. */
export const LIMITS = {
  minDensityGPerCm3: RANGES.densityGPerCm3.min,
  maxDensityGPerCm3: RANGES.densityGPerCm3.max,
  minLayerThicknessCm: MIN_LAYER_THICKNESS_CM,
  maxLayerThicknessCm: RANGES.layerThicknessCm.max,
  maxPhantomThicknessCm: 100,
  minDistanceCm: RANGES.distanceCm.min,
  maxDistanceCm: RANGES.distanceCm.max,
  minFieldCm: RANGES.fieldCm.min,
  maxFieldCm: RANGES.fieldCm.max,
  maxLayers: 50,
  maxPoints: 50,
} as const;

const unitOf = (r: NumericRange) => (r.unit ? ` ${r.unit}` : '');

/** The rule a value breaks, e.g. "must be ≥ 50 cm"; null when it lies in the range. */
export function rangeProblem(value: number, r: NumericRange): string | null {
  if (Number.isNaN(value)) return 'must be a number';
  if (!Number.isFinite(value)) return 'must be finite';
  if (r.minExclusive ? value <= r.min : value < r.min)
    return `must be ${r.minExclusive ? '>' : '≥'} ${r.min}${unitOf(r)}`;
  if (r.floor !== undefined && value < r.floor) return `must be ≥ ${r.floor}${unitOf(r)}`;
  if (r.maxExclusive ? value >= r.max : value > r.max)
    return `must be ${r.maxExclusive ? '<' : '≤'} ${r.max}${unitOf(r)}`;
  return null;
}

/** The rule a planning dose breaks (cGy): 0 (none) or at least MIN_PLANNING_DOSE_CGY; else null. */
export function planningDoseProblem(valueCGy: number): string | null {
  if (Number.isNaN(valueCGy)) return 'must be a number';
  if (!Number.isFinite(valueCGy)) return 'must be finite';
  if (valueCGy < 0) return 'must be ≥ 0 cGy';
  if (valueCGy !== 0 && valueCGy < MIN_PLANNING_DOSE_CGY)
    return `must be 0 (none) or ≥ ${MIN_PLANNING_DOSE_CGY} cGy`;
  return null;
}

/** The range in interval notation, e.g. "[50, 150] cm", "(0, 10) cm". */
export function rangeText(r: NumericRange): string {
  const low = r.floor !== undefined ? `[${r.floor}` : `${r.minExclusive ? '(' : '['}${r.min}`;
  return `${low}, ${r.max}${r.maxExclusive ? ')' : ']'}${unitOf(r)}`;
}
