// Warnings of a calculation prepared for display: code, severity, depth range, the methods they
// concern, and the explanation, numbers and advice shown on hover or focus.
import type { Warning } from '../engine/equilibrium/warning';

export interface DisplayWarning {
  key: string;
  id: string;
  code: string;
  severity: string;
  /** One sentence: what happens and why it matters. */
  message: string;
  numbers: string;
  advice: string;
  /** Methods whose result the warning puts in doubt or models only approximately. */
  methods: string[];
  approximate: string[];
  unaffected: string[];
  range: { fromCm: number; toCm: number } | null;
  pointIds: string[];
}

const finite = (v: number) => Number.isFinite(v);

export function displayWarnings(ws: readonly Warning[]): DisplayWarning[] {
  return ws.map((w, i) => {
    const r = w.depthRangeCm;
    return {
      key: `${w.id}#${i}`,
      id: w.id,
      code: w.code,
      severity: w.severity,
      message: w.explanation,
      numbers: w.numbers,
      advice: w.advice,
      methods: [...w.methods.concerned, ...w.methods.approximate],
      approximate: [...w.methods.approximate],
      unaffected: [...w.methods.unaffected],
      range:
        r && finite(r.fromCm) && finite(r.toCm)
          ? { fromCm: Math.min(r.fromCm, r.toCm), toCm: Math.max(r.fromCm, r.toCm) }
          : null,
      pointIds: [...w.pointIds],
    };
  });
}

/**
 * Warnings left when the methods in `hidden` are filtered out: a warning stays while at least one
 * method it concerns is shown; one that names no method always stays.
 */
export function visibleWarnings(
  ws: readonly DisplayWarning[],
  hidden: readonly string[],
): DisplayWarning[] {
  return ws.filter((w) => w.methods.length === 0 || w.methods.some((m) => !hidden.includes(m)));
}
