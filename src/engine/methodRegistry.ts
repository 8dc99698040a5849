// The one list of dose methods: id, order, label, class and cost. Reports list methods in this
// order; the palette styles them by it; the warnings name them from it; the preview computes the
// fast ones and carries the slow ones over; the dose conversion reads which dose each computes
// natively; the check picks its default deciding method by their preference ranks.
// MethodResult.id is one of these ids.
import type { MethodClass } from './methodResult';

export interface MethodInfo {
  id: string;
  label: string;
  methodClass: MethodClass;
  /** fast: recomputed for every edit preview; slow: waits for the full calculation. */
  cost: 'fast' | 'slow';
  /** Reads the water data (TMR/PDD, scatter factors) of the beam in use. */
  readsWaterData: boolean;
  /** One-dimensional table-based heterogeneity correction (type A, the water method excluded). */
  oneDCorrection: boolean;
  /**
   * The dose the method computes natively (src/engine/dose/doseConversion.ts): 'water' for
   * methods built on water data, 'medium' for the kernel engines and the Monte Carlo (energy per
   * gram of the medium), null for the water method (a water phantom: the same in both).
   */
  nativeDose: 'water' | 'medium' | null;
  /**
   * Preference to decide the check by default (src/engine/check/decidingMethod.ts), 1 = first:
   * across a heterogeneity the engines that transport scatter and electrons through the slabs
   * come first; along a water-like path the water data at the point (ratio of TMR) come first.
   * The uncorrected water method comes last on both.
   */
  decidingRank: { heterogeneous: number; homogeneous: number };
}

export const METHODS = [
  {
    id: 'water',
    label: 'Water (no heterogeneity correction)',
    methodClass: 'none',
    cost: 'fast',
    readsWaterData: true,
    oneDCorrection: false,
    nativeDose: null,
    decidingRank: { heterogeneous: 9, homogeneous: 9 },
  },
  {
    id: 'rtmr',
    label: 'Ratio of TMR (effective depth)',
    methodClass: 'type A',
    cost: 'fast',
    readsWaterData: true,
    oneDCorrection: true,
    nativeDose: 'water',
    decidingRank: { heterogeneous: 7, homogeneous: 1 },
  },
  {
    id: 'epl-pdd',
    label: 'Equivalent path length with PDD',
    methodClass: 'type A',
    cost: 'fast',
    readsWaterData: true,
    oneDCorrection: true,
    nativeDose: 'water',
    decidingRank: { heterogeneous: 8, homogeneous: 2 },
  },
  {
    id: 'batho',
    label: 'Batho power law (generalized)',
    methodClass: 'type A',
    cost: 'fast',
    readsWaterData: true,
    oneDCorrection: true,
    nativeDose: 'water',
    decidingRank: { heterogeneous: 6, homogeneous: 4 },
  },
  {
    id: 'batho-modified',
    label: 'Modified Batho (build-up shift)',
    methodClass: 'type A',
    cost: 'fast',
    readsWaterData: true,
    oneDCorrection: true,
    nativeDose: 'water',
    decidingRank: { heterogeneous: 5, homogeneous: 3 },
  },
  {
    id: 'etar',
    label: 'Equivalent TAR',
    methodClass: 'type A',
    cost: 'fast',
    readsWaterData: true,
    oneDCorrection: true,
    nativeDose: 'water',
    decidingRank: { heterogeneous: 4, homogeneous: 5 },
  },
  {
    id: 'pencil-beam',
    label: 'Pencil beam (1-D density scaling)',
    methodClass: 'type B',
    cost: 'fast',
    readsWaterData: false,
    oneDCorrection: false,
    nativeDose: 'medium',
    decidingRank: { heterogeneous: 3, homogeneous: 7 },
  },
  {
    id: 'superposition',
    label: 'Superposition (point kernel, 3-D density scaling)',
    methodClass: 'type B',
    cost: 'slow',
    readsWaterData: false,
    oneDCorrection: false,
    nativeDose: 'medium',
    decidingRank: { heterogeneous: 2, homogeneous: 6 },
  },
  {
    id: 'monte-carlo',
    label: 'Monte Carlo',
    methodClass: 'type C',
    cost: 'slow',
    readsWaterData: false,
    oneDCorrection: false,
    nativeDose: 'medium',
    decidingRank: { heterogeneous: 1, homogeneous: 8 },
  },
] as const satisfies readonly MethodInfo[];

export type MethodId = (typeof METHODS)[number]['id'];

export const METHOD_IDS: readonly MethodId[] = METHODS.map((m) => m.id);

export function isMethodId(id: string): id is MethodId {
  return (METHOD_IDS as readonly string[]).includes(id);
}

export function methodInfo(id: MethodId): MethodInfo {
  return METHODS.find((m) => m.id === id) as MethodInfo;
}

/** Position of a method in the registry's order (unknown ids after every known one). */
export function methodOrder(id: string): number {
  const k = (METHOD_IDS as readonly string[]).indexOf(id);
  return k < 0 ? METHOD_IDS.length : k;
}

function idsWhere(test: (m: MethodInfo) => boolean): readonly MethodId[] {
  return METHODS.filter((m: MethodInfo) => test(m)).map((m) => m.id);
}

/** Methods recomputed for every edit preview. */
export const FAST_METHOD_IDS = idsWhere((m) => m.cost === 'fast');
/** Methods that wait for the full calculation (drawn as updating meanwhile). */
export const SLOW_METHOD_IDS = idsWhere((m) => m.cost === 'slow');
/** The one-dimensional, table-based correction methods (type A). */
export const ONE_D_METHOD_IDS = idsWhere((m) => m.oneDCorrection);
/** Methods that read the water data in use. */
export const WATER_DATA_METHOD_IDS = idsWhere((m) => m.readsWaterData);
export const MONTE_CARLO_METHOD_ID: MethodId = 'monte-carlo';

/** Methods whose native dose is dose to medium (the kernel engines and the Monte Carlo). */
export const NATIVE_MEDIUM_METHOD_IDS = idsWhere((m) => m.nativeDose === 'medium');
/** Methods that compute in water throughout (no conversion between conventions). */
export const WATER_PHANTOM_METHOD_IDS = idsWhere((m) => m.nativeDose === null);

/** Method ids by their preference to decide the check on a heterogeneous or water-like path. */
export function decidingPreference(path: 'heterogeneous' | 'homogeneous'): readonly MethodId[] {
  return [...(METHODS as readonly MethodInfo[])]
    .sort((a, b) => a.decidingRank[path] - b.decidingRank[path])
    .map((m) => m.id as MethodId);
}
