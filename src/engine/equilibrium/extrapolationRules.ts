// EXTRAPOLATION: a water-table look-up fell outside the tabulated depths or fields and was
// clamped to the edge (reported by the look-ups through a LookupRecorder, or as point flags).
// One warning per method and quantity, spanning the depths where it happened.
import type { ExtrapolationFlag } from '../beam/waterData';
import { warningOverBand, type RuleContext } from './ruleContext';
import { fmt, methodScope, type Warning } from './warning';

export interface ExtrapolationEvent {
  /** Method whose look-up clamped (a MethodResult id). */
  methodId: string;
  /** Geometric depth of the calculation point (cm). */
  depthCm: number;
  quantity: ExtrapolationFlag['quantity'];
  /** What was asked for and what the table gave (absent when only a flag string is known). */
  requested?: number;
  clampedTo?: number;
}

/** Caution when a request lies further than this fraction beyond the table's edge. */
export const EXTRAPOLATION_CAUTION_FRACTION = 0.1;

export function extrapolationWarnings(
  ctx: RuleContext,
  events: readonly ExtrapolationEvent[],
): Warning[] {
  const groups = new Map<string, ExtrapolationEvent[]>();
  for (const e of events) {
    if (!Number.isFinite(e.depthCm)) continue;
    const key = `${e.methodId}|${e.quantity}`;
    const list = groups.get(key) ?? [];
    list.push(e);
    groups.set(key, list);
  }
  const out: Warning[] = [];
  for (const list of groups.values()) {
    const first = list[0];
    if (!first) continue;
    const depths = list.map((e) => e.depthCm);
    let worstFraction = 0;
    let worst: ExtrapolationEvent | undefined;
    for (const e of list) {
      if (e.requested === undefined || e.clampedTo === undefined) continue;
      const fraction = Math.abs(e.requested - e.clampedTo) / Math.max(Math.abs(e.clampedTo), 1e-9);
      if (worst === undefined || fraction > worstFraction) {
        worstFraction = fraction;
        worst = e;
      }
    }
    const unit = 'cm';
    const detail = worst
      ? `worst: ${first.quantity} ${fmt(worst.requested ?? 0)} ${unit} requested, table edge ${fmt(worst.clampedTo ?? 0)} ${unit} (${(100 * worstFraction).toFixed(0)} % beyond; caution > ${100 * EXTRAPOLATION_CAUTION_FRACTION} %)`
      : 'values not reported';
    const w = warningOverBand(
      ctx,
      { fromCm: Math.min(...depths), toCm: Math.max(...depths) },
      {
        id: `EXTRAPOLATION@${first.methodId}/${first.quantity}`,
        code: 'EXTRAPOLATION',
        severity: worstFraction > EXTRAPOLATION_CAUTION_FRACTION ? 'caution' : 'note',
        methods: methodScope([first.methodId]),
        numbers: `${list.length} ${first.quantity} look-up(s) by ${first.methodId} outside the water table; ${detail}`,
        values: { events: list.length, worstFractionBeyond: worstFraction },
        explanation:
          'The water data do not cover this look-up, so the value was clamped to the table edge and the result rests on an extrapolation.',
        advice:
          'Extend the water table (deeper depths, smaller or larger fields) or treat these results as indicative only.',
      },
      true,
    );
    if (w) out.push(w);
  }
  return out;
}

/** A type-A method that gives no value from a depth on, its water data ending above it. */
export interface BeyondWaterData {
  methodId: string;
  /** Geometric depth from which the method is withheld (cm). */
  fromCm: number;
  /** Deepest tabulated depth of the water data (cm). */
  tableDeepestCm: number;
}

/**
 * EXTRAPOLATION (severe) from the depth where the water data end, for the methods withheld there:
 * one band from the shallowest such depth to the bottom of the phantom.
 */
export function beyondWaterDataWarnings(
  ctx: RuleContext,
  beyond: readonly BeyondWaterData[],
): Warning[] {
  const first = beyond[0];
  if (!first) return [];
  const fromCm = Math.min(...beyond.map((b) => b.fromCm));
  // Methods grouped by the depth they stop at ("rtmr, etar from 40.00 cm; batho-modified from 38.50 cm").
  const byDepth = new Map<string, string[]>();
  for (const b of [...beyond].sort((a, c) => c.fromCm - a.fromCm)) {
    const key = fmt(b.fromCm);
    byDepth.set(key, [...(byDepth.get(key) ?? []), b.methodId]);
  }
  const stops = [...byDepth].map(([d, ids]) => `${ids.join(', ')} from ${d} cm`).join('; ');
  const w = warningOverBand(
    ctx,
    { fromCm, toCm: ctx.phantom.totalThicknessCm },
    {
      id: 'EXTRAPOLATION@water-data-depth',
      code: 'EXTRAPOLATION',
      severity: 'severe',
      methods: methodScope(beyond.map((b) => b.methodId)),
      numbers: `water data end at ${fmt(first.tableDeepestCm)} cm depth; no value: ${stops}`,
      values: { tableDeepestCm: first.tableDeepestCm, fromCm },
      explanation:
        'The water data end above this depth. TMR keeps falling with depth (a few per cent per cm), so a value held at the table’s last depth would overstate the dose more with every centimetre; the table-based methods give no value here.',
      advice:
        'Extend the water table to the depth of the points, or read the kernel methods or the Monte Carlo here.',
    },
    true,
  );
  return w ? [w] : [];
}
