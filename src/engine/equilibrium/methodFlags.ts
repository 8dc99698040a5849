// Warnings as per-point method flags: each method's points carry the warnings that concern it
// there (e.g. "LED (severe)"), so a table of one method's results shows why it may be off.
import type { MethodResult } from '../methodResult';
import type { Warning } from './warning';

/** Flags for one method at one depth: concerned warnings as "CODE (severity)", approximate ones marked. */
export function warningFlagsFor(
  warnings: readonly Warning[],
  methodId: string,
  depthCm: number,
): string[] {
  const out: string[] = [];
  for (const w of warnings) {
    if (depthCm < w.depthRangeCm.fromCm - 1e-9 || depthCm > w.depthRangeCm.toCm + 1e-9) continue;
    if (w.code === 'EXTRAPOLATION') continue; // already flagged by the look-up itself
    if (w.methods.concerned.includes(methodId)) out.push(`${w.code} (${w.severity})`);
    else if (w.methods.approximate.includes(methodId))
      out.push(`${w.code} (${w.severity}; modelled approximately)`);
  }
  return [...new Set(out)];
}

/** Copies of the results with the applicable warning flags appended to each point's flags. */
export function withWarningFlags(
  methods: readonly MethodResult[],
  warnings: readonly Warning[],
): MethodResult[] {
  return methods.map((m) => ({
    ...m,
    points: m.points.map((p) => ({
      ...p,
      flags: [
        ...p.flags,
        ...warningFlagsFor(warnings, m.id, p.depthCm).filter((f) => !p.flags.includes(f)),
      ],
    })),
  }));
}
