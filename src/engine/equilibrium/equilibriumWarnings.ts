// All equilibrium and validity warnings for one beam on one slab phantom, sorted by depth.
// Rules: build-up, interface bands, unshifted Batho, lateral disequilibrium, cavities, dense
// layers, high-energy small fields in lung, and table extrapolation.
import type { BeamEnergy } from '../beam/energies';
import type { MethodResult } from '../methodResult';
import type { SlabPhantom } from '../phantom/slabPhantom';
import { typicalBeamQuality } from './beamQuality';
import { buildupWarnings, unshiftedBathoWarnings } from './buildupRules';
import { highDensityWarnings, lowDensityWarnings } from './densityRules';
import {
  beyondWaterDataWarnings,
  extrapolationWarnings,
  type BeyondWaterData,
  type ExtrapolationEvent,
} from './extrapolationRules';
import { interfaceWarnings } from './interfaceRules';
import { highEnergySmallFieldLungWarnings, ledWarnings } from './lateralRules';
import type { RuleContext } from './ruleContext';
import { SEVERITY_RANK, type Warning } from './warning';

export interface EquilibriumInput {
  phantom: SlabPhantom;
  beam: {
    energy: BeamEnergy;
    ssdCm: number;
    /** Field sides defined at 100 cm from the source (cm). */
    fieldXCm: number;
    fieldYCm: number;
  };
  /** Depth of dose maximum (cm) from the water data in use; typical for the energy when absent. */
  dMaxCm?: number | undefined;
  /** TPR20,10 from the water data in use; typical for the energy when absent. */
  tpr2010?: number | undefined;
  /** Where dMaxCm and tpr2010 come from (e.g. "water data: modelled beam"). */
  qualitySource?: string | undefined;
  points?: readonly { id: string; depthCm: number }[];
  extrapolations?: readonly ExtrapolationEvent[];
  /** Type-A methods withheld from a depth on because their water data end above it. */
  beyondWaterData?: readonly BeyondWaterData[];
}

export function ruleContextOf(input: EquilibriumInput): RuleContext {
  const typical = typicalBeamQuality(input.beam.energy);
  const haveD = input.dMaxCm !== undefined && input.dMaxCm > 0;
  const haveT = input.tpr2010 !== undefined && input.tpr2010 > 0;
  const given = input.qualitySource ?? 'water data';
  const source =
    haveD && haveT
      ? given
      : haveD || haveT
        ? `${haveD ? 'd_max' : 'TPR20,10'} from ${given}, ${haveD ? 'TPR20,10' : 'd_max'} ${typical.source}`
        : typical.source;
  return {
    phantom: input.phantom,
    energy: input.beam.energy,
    ssdCm: input.beam.ssdCm,
    fieldXCm: input.beam.fieldXCm,
    fieldYCm: input.beam.fieldYCm,
    quality: {
      dMaxCm: haveD ? (input.dMaxCm as number) : typical.dMaxCm,
      tpr2010: haveT ? (input.tpr2010 as number) : typical.tpr2010,
      source,
    },
    points: input.points ?? [],
  };
}

export function equilibriumWarnings(input: EquilibriumInput): Warning[] {
  const ctx = ruleContextOf(input);
  const all = [
    ...buildupWarnings(ctx),
    ...interfaceWarnings(ctx),
    ...unshiftedBathoWarnings(ctx),
    ...ledWarnings(ctx),
    ...lowDensityWarnings(ctx),
    ...highDensityWarnings(ctx),
    ...highEnergySmallFieldLungWarnings(ctx),
    ...extrapolationWarnings(ctx, input.extrapolations ?? []),
    ...beyondWaterDataWarnings(ctx, input.beyondWaterData ?? []),
  ];
  // Ids stay unique even when one rule raises two bands anchored on the same layer.
  const seen = new Map<string, number>();
  for (const w of all) {
    const n = (seen.get(w.id) ?? 0) + 1;
    seen.set(w.id, n);
    if (n > 1) w.id = `${w.id}#${n}`;
  }
  return all.sort(
    (a, b) =>
      a.depthRangeCm.fromCm - b.depthRangeCm.fromCm ||
      SEVERITY_RANK[b.severity] - SEVERITY_RANK[a.severity] ||
      a.id.localeCompare(b.id),
  );
}

// "extrapolated: depth 0.30 cm outside the table, clamped to 0.5 cm" (the type-A look-up flags).
const CLAMP_FLAG =
  /(depth|field)\s+(-?[\d.]+(?:e[+-]?\d+)?)\s*cm\b.*clamped to\s+(-?[\d.]+(?:e[+-]?\d+)?)/i;

/**
 * Extrapolation events from the flags methods put on their points: any flag mentioning
 * "extrapolat" or "clamp" counts (a "field" flag as a field look-up, otherwise a depth look-up);
 * requested and table-edge values are read when the flag states them.
 */
export function extrapolationEventsOfMethods(
  methods: readonly MethodResult[],
): ExtrapolationEvent[] {
  const out: ExtrapolationEvent[] = [];
  for (const m of methods) {
    for (const p of m.points) {
      for (const flag of p.flags) {
        const f = flag.toLowerCase();
        if (!f.includes('extrapolat') && !f.includes('clamp')) continue;
        const match = CLAMP_FLAG.exec(flag);
        const quantity = (match?.[1]?.toLowerCase() ??
          (f.includes('field') ? 'field' : 'depth')) as 'depth' | 'field';
        const event: ExtrapolationEvent = { methodId: m.id, depthCm: p.depthCm, quantity };
        if (match) {
          event.requested = Number(match[2]);
          event.clampedTo = Number(match[3]);
        }
        out.push(event);
      }
    }
  }
  return out;
}

/** The methods withheld from a depth on because their water data end above it. */
export function beyondWaterDataOfMethods(
  methods: readonly MethodResult[],
  waterData: { depthRangeCm: readonly [number, number] } | undefined,
): BeyondWaterData[] {
  if (!waterData) return [];
  return methods.flatMap((m) =>
    m.beyondWaterDataFromCm === undefined
      ? []
      : [
          {
            methodId: m.id,
            fromCm: m.beyondWaterDataFromCm,
            tableDeepestCm: waterData.depthRangeCm[1],
          },
        ],
  );
}

/** Warnings whose depth range holds a depth (cm). */
export function warningsAtDepth(warnings: readonly Warning[], depthCm: number): Warning[] {
  return warnings.filter(
    (w) => depthCm >= w.depthRangeCm.fromCm - 1e-9 && depthCm <= w.depthRangeCm.toCm + 1e-9,
  );
}
