// Parsing typed numbers for the editor's fields. Each rule names the field in its message, so a
// message still makes sense away from the field (screen readers, the problems list).
import { LIMITS, RANGES, rangeProblem, type NumericRange } from '../engine/inputRanges';

export type FieldParse = { ok: true; value: number } | { ok: false; message: string };

/** A field's name with its shared range (src/engine/inputRanges). */
export interface NumberRule extends NumericRange {
  /** Field name used in messages, e.g. "Layer 2 thickness". */
  name: string;
}

export function parseNumberField(text: string, rule: NumberRule): FieldParse {
  const t = text.trim().replace(',', '.');
  if (t === '') return { ok: false, message: `${rule.name}: enter a number` };
  if (!/^[-+]?(\d+\.?\d*|\.\d+)([eE][-+]?\d+)?$/.test(t))
    return { ok: false, message: `${rule.name}: "${text}" is not a number` };
  const v = Number(t);
  const problem = rangeProblem(v, rule);
  if (problem) return { ok: false, message: `${rule.name}: ${problem}` };
  return { ok: true, value: v };
}

export const RULES = {
  thickness: (n: number): NumberRule => ({
    name: `Layer ${n} thickness`,
    ...RANGES.layerThicknessCm,
  }),
  density: (n: number): NumberRule => ({ name: `Layer ${n} density`, ...RANGES.densityGPerCm3 }),
  distance: (what: 'SSD' | 'SAD'): NumberRule => ({ name: what, ...RANGES.distanceCm }),
  isocentreDepth: {
    name: 'Isocentre depth',
    unit: 'cm',
    min: 0,
    max: LIMITS.maxPhantomThicknessCm,
  },
  field: (axis: 'X' | 'Y'): NumberRule => ({ name: `Field ${axis}`, ...RANGES.fieldCm }),
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
