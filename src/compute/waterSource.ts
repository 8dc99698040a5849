// Which water data a calculation reads, decided once for the page, the worker API and the CLI:
// a case that carries its own measured table uses it, unless the modelled beam is chosen
// explicitly; a table given with the request (CLI --tmr/--pdd) replaces both. Tables are built
// once per content (sha-256 of the table input's canonical JSON) and reused.
import { buildMeasuredWaterData, type MeasuredTableInput } from '../engine/beam/measuredTable';
import { modelledWaterData } from '../engine/beam/modelledBeam';
import type { WaterData } from '../engine/beam/waterData';
import { sha256Hex } from '../engine/util/sha256';
import type { LaminaCase } from '../io/caseSchema';
import { canonicalJson } from './canonicalJson';

/** The user's choice: the case's own table when it has one ('case'), or the modelled beam. */
export type WaterChoice = 'case' | 'modelled';

export type WaterSourceSpec =
  | { kind: WaterChoice }
  /** A table given with the request (CLI --tmr/--pdd), for every beam. */
  | { kind: 'table'; table: MeasuredTableInput };

export const CASE_WATER: WaterSourceSpec = { kind: 'case' };

export type WaterResolution =
  { ok: true; waterData: WaterData | undefined } | { ok: false; problems: string[] };

const MAX_TABLES = 16;
const tables = new Map<string, ReturnType<typeof buildMeasuredWaterData>>();

/** The measured table of an input, built once per content. */
export function measuredTableOf(
  input: MeasuredTableInput,
): ReturnType<typeof buildMeasuredWaterData> {
  const key = sha256Hex(canonicalJson(input));
  const hit = tables.get(key);
  if (hit) return hit;
  const built = buildMeasuredWaterData(input);
  if (tables.size >= MAX_TABLES) tables.delete(tables.keys().next().value as string);
  tables.set(key, built);
  return built;
}

/**
 * The water data for a case under a source: undefined only when the case's own table cannot be
 * built (the type-A methods then say they need water data).
 */
export function resolveWater(c: LaminaCase, spec: WaterSourceSpec = CASE_WATER): WaterResolution {
  if (spec.kind === 'modelled') return { ok: true, waterData: modelledWaterData(c.beam.energy) };
  if (spec.kind === 'table') {
    const built = measuredTableOf(spec.table);
    return built.ok ? { ok: true, waterData: built.waterData } : built;
  }
  if (!c.waterData) return { ok: true, waterData: modelledWaterData(c.beam.energy) };
  const built = measuredTableOf(c.waterData);
  return { ok: true, waterData: built.ok ? built.waterData : undefined };
}

/** Whether water data are a measured table (anything but the modelled beam of the energy). */
export function isMeasuredWater(c: LaminaCase, waterData: WaterData | undefined): boolean {
  return waterData !== undefined && waterData !== modelledWaterData(c.beam.energy);
}

/** A short stable key of a water source for a case (run keys, caches). */
export function waterKeyOf(c: LaminaCase, spec: WaterSourceSpec): string {
  if (spec.kind === 'table') return `table:${sha256Hex(canonicalJson(spec.table))}`;
  if (spec.kind === 'modelled' || !c.waterData) return `modelled:${c.beam.energy}`;
  return `case:${sha256Hex(canonicalJson(c.waterData))}`;
}
