// The case as the editor holds it: the case-file content plus a stable key per layer and point,
// so drafts, focus and React keys survive reordering. `toCaseFile` strips the keys.
import {
  CASE_FORMAT,
  CASE_VERSION,
  type CaseLayer,
  type CasePoint,
  type CaseWaterData,
  type LaminaCase,
} from '../io/caseSchema';

export type EditorLayer = CaseLayer & { key: string };
export type EditorPoint = CasePoint & { key: string };

export interface EditorCase {
  name: string;
  notes?: string | undefined;
  beam: LaminaCase['beam'];
  layers: EditorLayer[];
  points: EditorPoint[];
  /** Measured water data carried in the case (type-A methods need it). */
  waterData?: CaseWaterData | undefined;
}

let counter = 0;
/** A key unique within this page session. */
export function newKey(prefix: string): string {
  counter += 1;
  return `${prefix}${counter.toString(36)}`;
}

export function fromCaseFile(c: LaminaCase): EditorCase {
  return {
    name: c.name,
    notes: c.notes,
    beam: structuredClone(c.beam),
    layers: c.layers.map((l) => ({ ...l, key: newKey('L') })),
    points: c.points.map((p) => ({ ...p, key: newKey('P') })),
    waterData: c.waterData,
  };
}

export function toCaseFile(e: EditorCase): LaminaCase {
  const c: LaminaCase = {
    format: CASE_FORMAT,
    version: CASE_VERSION,
    name: e.name,
    beam: structuredClone(e.beam),
    layers: e.layers.map(({ key: _key, ...l }) => l),
    points: e.points.map(({ key: _key, ...p }) => p),
  };
  if (e.notes !== undefined) c.notes = e.notes;
  if (e.waterData !== undefined) c.waterData = structuredClone(e.waterData);
  return c;
}

export function totalThicknessCm(e: Pick<EditorCase, 'layers'>): number {
  return e.layers.reduce((s, l) => s + l.thicknessCm, 0);
}

/** Interface depths including 0 and the bottom (cm). */
export function boundariesCm(e: Pick<EditorCase, 'layers'>): number[] {
  const out = [0];
  let z = 0;
  for (const l of e.layers) {
    z += l.thicknessCm;
    out.push(z);
  }
  return out;
}
