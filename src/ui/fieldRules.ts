// Parsing typed numbers for the editor's fields. Each rule names the field in its message, so a
// message still makes sense away from the field (screen readers, the problems list).
import { LIMITS } from '../io/caseSchema';

export type FieldParse = { ok: true; value: number } | { ok: false; message: string };

export interface NumberRule {
  /** Field name used in messages, e.g. "Layer 2 thickness". */
  name: string;
  unit: string;
  min: number;
  /** True when the minimum itself is not allowed. */
  minExclusive?: boolean;
  max: number;
}

export function parseNumberField(text: string, rule: NumberRule): FieldParse {
  const t = text.trim().replace(',', '.');
  if (t === '') return { ok: false, message: `${rule.name}: enter a number` };
  if (!/^[-+]?(\d+\.?\d*|\.\d+)([eE][-+]?\d+)?$/.test(t))
    return { ok: false, message: `${rule.name}: "${text}" is not a number` };
  const v = Number(t);
  const u = rule.unit ? ` ${rule.unit}` : '';
  if (rule.minExclusive ? v <= rule.min : v < rule.min)
    return {
      ok: false,
      message: `${rule.name}: must be ${rule.minExclusive ? '>' : '≥'} ${rule.min}${u}`,
    };
  if (v > rule.max) return { ok: false, message: `${rule.name}: must be ≤ ${rule.max}${u}` };
  return { ok: true, value: v };
}

export const RULES = {
  thickness: (n: number): NumberRule => ({
    name: `Layer ${n} thickness`,
    unit: 'cm',
    min: 0,
    minExclusive: true,
    max: LIMITS.maxLayerThicknessCm,
  }),
  density: (n: number): NumberRule => ({
    name: `Layer ${n} density`,
    unit: 'g/cm³',
    min: LIMITS.minDensityGPerCm3,
    max: LIMITS.maxDensityGPerCm3,
  }),
  distance: (what: 'SSD' | 'SAD'): NumberRule => ({
    name: what,
    unit: 'cm',
    min: LIMITS.minDistanceCm,
    max: LIMITS.maxDistanceCm,
  }),
  isocentreDepth: {
    name: 'Isocentre depth',
    unit: 'cm',
    min: 0,
    max: LIMITS.maxPhantomThicknessCm,
  },
  field: (axis: 'X' | 'Y'): NumberRule => ({
    name: `Field ${axis}`,
    unit: 'cm',
    min: LIMITS.minFieldCm,
    max: LIMITS.maxFieldCm,
  }),
  pointDepth: (id: string): NumberRule => ({
    name: `Point ${id} depth`,
    unit: 'cm',
    min: 0,
    max: LIMITS.maxPhantomThicknessCm,
  }),
} as const;

/** Numbers shown in fields: up to 4 decimals, no trailing zeros. */
export function formatField(v: number | undefined): string {
  if (v === undefined || !Number.isFinite(v)) return '';
  return String(Number(v.toFixed(4)));
}
