// The shape of an equilibrium / validity warning and the method ids a warning can name.
// A warning covers a depth range on the central axis; it says which methods it concerns, which
// it concerns only approximately and which it leaves unaffected, and the numbers that raised it.

import { METHOD_IDS, ONE_D_METHOD_IDS, type MethodId } from '../methodRegistry';

/** Method ids as used by MethodResult.id (the registry's, re-exported for the rules). */
export { METHOD_IDS, ONE_D_METHOD_IDS, type MethodId };

export const WARNING_CODES = [
  'BUILDUP',
  'INTERFACE-DOWNSTREAM',
  'UNSHIFTED-BATHO',
  'LED',
  'LOW-DENSITY',
  'HIGH-Z',
  'HIGH-ENERGY-SMALL-FIELD-LUNG',
  'EXTRAPOLATION',
] as const;
export type WarningCode = (typeof WARNING_CODES)[number];

/** note: worth knowing; caution: results may be off by a few per cent; severe: expect ≳ 5–10 %. */
export type WarningSeverity = 'note' | 'caution' | 'severe';
export const SEVERITY_RANK: Record<WarningSeverity, number> = { note: 0, caution: 1, severe: 2 };

export interface WarningMethods {
  /** Methods whose result the warning puts in doubt (MethodResult ids). */
  concerned: string[];
  /** Methods that model the effect only approximately. */
  approximate: string[];
  /** Methods that model the effect (the warning explains why they differ from the others). */
  unaffected: string[];
}

export interface Warning {
  /** Stable id: the code plus what anchors it (layer index, method), e.g. "LED@layer2". */
  id: string;
  code: WarningCode;
  severity: WarningSeverity;
  /** Depth range on the central axis, inside the phantom (cm). */
  depthRangeCm: { fromCm: number; toCm: number };
  methods: WarningMethods;
  /** The numbers that raised the warning, in words (thresholds included). */
  numbers: string;
  /** The same numbers, machine-readable. */
  values: Record<string, number>;
  /** One sentence: what happens physically and why it matters. */
  explanation: string;
  /** What to do about it. */
  advice: string;
  /** Points of interest lying inside the depth range. */
  pointIds: string[];
}

/**
 * Sort method ids into concerned / approximate / unaffected. Ids not listed are unaffected, except
 * the uncorrected water calculation, which ignores heterogeneities by design and is listed only
 * when named.
 */
export function methodScope(
  concerned: readonly string[],
  approximate: readonly string[] = [],
): WarningMethods {
  return {
    concerned: [...concerned],
    approximate: [...approximate],
    unaffected: METHOD_IDS.filter(
      (id) => id !== 'water' && !concerned.includes(id) && !approximate.includes(id),
    ),
  };
}

/** Fixed-point text for numbers in messages (trailing zeros kept for a steady layout). */
export function fmt(value: number, digits = 2): string {
  return value.toFixed(digits);
}
