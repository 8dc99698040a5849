// The autosave entry kept in browser storage, versioned so that a later Lamina can still read
// what an earlier one wrote. Storage version 1 was the bare case document; version 2 wraps it in
// an envelope {format, version, savedAt, case}; the case carries the check's settings in its
// optional `check` block, as a saved file does (entries without one restore the defaults). Each
// migration lifts an entry one version; an
// entry from a newer Lamina, or one that no longer reads, is reported as unreadable (never guessed
// at), so the caller can keep it under a backup key.
import { validateCase, describeProblems } from '../io/caseFile';
import { caseCheckSchema } from '../io/checkSettingsSchema';
import { migrateCase } from '../io/caseMigrations';
import {
  beamSchema,
  caseNotesSchema,
  CASE_FORMAT,
  CASE_VERSION,
  layerSchema,
  pointSchema,
  waterDataSchema,
  type LaminaCase,
} from '../io/caseSchema';

export const AUTOSAVE_FORMAT = 'lamina.autosave';
export const AUTOSAVE_STORAGE_VERSION = 2;

export interface AutosaveEnvelope {
  format: typeof AUTOSAVE_FORMAT;
  version: typeof AUTOSAVE_STORAGE_VERSION;
  /** ISO 8601 time of the save. */
  savedAt: string;
  case: unknown;
}

export type AutosaveRead =
  | { status: 'empty' }
  | {
      status: 'ok';
      value: LaminaCase;
      fromVersion: number;
      savedAt: string | null;
      /** What a lenient reading left out, one phrase each (absent when nothing was). */
      dropped?: string[];
    }
  | { status: 'unreadable'; reason: string };

/** Lifts an entry of storage version v to v + 1 (keyed by v). */
export const STORAGE_MIGRATIONS: Readonly<Record<number, (entry: unknown) => unknown>> = {
  // v1 → v2: the bare case document goes into the envelope; its save time is unknown.
  1: (entry) => ({ format: AUTOSAVE_FORMAT, version: 2, savedAt: null, case: entry }),
};

/** The text to store for a case. */
export function autosaveEntryText(c: LaminaCase, now: Date): string {
  const envelope: AutosaveEnvelope = {
    format: AUTOSAVE_FORMAT,
    version: AUTOSAVE_STORAGE_VERSION,
    savedAt: now.toISOString(),
    case: { ...c, format: CASE_FORMAT, version: CASE_VERSION },
  };
  return JSON.stringify(envelope);
}

/** Storage version of a parsed entry: 1 for a bare case document, the envelope's otherwise. */
function storageVersionOf(entry: unknown): number | string {
  if (typeof entry !== 'object' || entry === null || Array.isArray(entry)) return 'not an object';
  const e = entry as Record<string, unknown>;
  if (e.format === CASE_FORMAT) return 1;
  if (e.format !== AUTOSAVE_FORMAT) return `unknown format ${JSON.stringify(e.format)}`;
  return typeof e.version === 'number' && Number.isInteger(e.version) && e.version >= 1
    ? e.version
    : `unknown storage version ${JSON.stringify(e.version)}`;
}

/** Read an autosave entry's text (null: nothing stored), migrating older storage versions. */
export function readAutosaveEntry(text: string | null): AutosaveRead {
  if (text === null || text === '') return { status: 'empty' };
  let entry: unknown;
  try {
    entry = JSON.parse(text);
  } catch (e) {
    return { status: 'unreadable', reason: `not valid JSON (${(e as Error).message})` };
  }
  const fromVersion = storageVersionOf(entry);
  if (typeof fromVersion === 'string') return { status: 'unreadable', reason: fromVersion };
  if (fromVersion > AUTOSAVE_STORAGE_VERSION)
    return {
      status: 'unreadable',
      reason: `written by a newer Lamina (storage version ${fromVersion}; this page reads up to ${AUTOSAVE_STORAGE_VERSION})`,
    };
  for (let v = fromVersion; v < AUTOSAVE_STORAGE_VERSION; v++) {
    const migrate = STORAGE_MIGRATIONS[v];
    if (!migrate) return { status: 'unreadable', reason: `no migration from storage version ${v}` };
    entry = migrate(entry);
  }
  const envelope = entry as Partial<AutosaveEnvelope>;
  const c = validateCase(envelope.case);
  // A case saved mid-edit (a point below a thinned phantom…) still restores, leniently.
  const lenient = c.ok ? null : lenientCase(envelope.case);
  if (!c.ok && !lenient)
    return {
      status: 'unreadable',
      reason: `the case no longer reads: ${describeProblems(c.problems.slice(0, 3)).replace(/\n/g, '; ')}`,
    };
  const value = c.ok ? c.value : (lenient as LenientCase).value;
  const dropped = lenient?.dropped ?? [];
  return {
    status: 'ok',
    value,
    fromVersion,
    savedAt: typeof envelope.savedAt === 'string' ? envelope.savedAt : null,
    ...(dropped.length > 0 ? { dropped } : {}),
  };
}

/** A case read leniently, with what was left out of it. */
export interface LenientCase {
  value: LaminaCase;
  /** One phrase per part left out, e.g. "the notes (notes must be at most 5000 characters)". */
  dropped: string[];
}

const firstProblem = (r: { error: { issues: readonly { message: string }[] } }) =>
  r.error.issues[0]?.message ?? 'invalid';

/**
 * A case the editor can hold even though it does not validate as a whole (a point below the
 * phantom after a layer was thinned, a duplicate point name): each beam, layer and point must be
 * valid on its own. The calculation then lists the remaining problems. Parts that cannot be kept
 * (a broken water table, over-long notes, unknown fields) are left out and listed in `dropped`.
 */
export function lenientCase(raw: unknown): LenientCase | null {
  // Older case versions are lifted first (a refused migration leaves the entry unreadable).
  const migrated = migrateCase(raw);
  if (!migrated.ok) return null;
  const d = migrated.value as Record<string, unknown>;
  if (d.format !== CASE_FORMAT || d.version !== CASE_VERSION) return null;
  const beam = beamSchema.safeParse(d.beam);
  const layers = Array.isArray(d.layers) ? d.layers.map((l) => layerSchema.safeParse(l)) : [];
  const points = Array.isArray(d.points) ? d.points.map((p) => pointSchema.safeParse(p)) : [];
  if (!beam.success || layers.length === 0) return null;
  if (!layers.every((l) => l.success) || !points.every((p) => p.success)) return null;
  const dropped: string[] = [];
  let name = '';
  if (typeof d.name === 'string') {
    name = d.name.slice(0, 200);
    if (name !== d.name) dropped.push(`the end of the name (beyond 200 characters)`);
  } else if (d.name !== undefined) dropped.push('the name (not text)');
  const c: LaminaCase = {
    format: CASE_FORMAT,
    version: CASE_VERSION,
    name,
    beam: beam.data,
    layers: layers.map((l) => l.data),
    points: points.map((p) => p.data),
  };
  if (d.notes !== undefined) {
    const notes = caseNotesSchema.safeParse(d.notes);
    if (notes.success) c.notes = notes.data;
    else dropped.push(`the notes (${firstProblem(notes)})`);
  }
  if (d.waterData !== undefined) {
    const w = waterDataSchema.safeParse(d.waterData);
    if (w.success) c.waterData = w.data;
    else dropped.push(`the measured water table (${firstProblem(w)})`);
  }
  if (d.check !== undefined) {
    const check = caseCheckSchema.safeParse(d.check);
    if (check.success) c.check = check.data;
    else dropped.push(`the check settings (${firstProblem(check)})`);
  }
  const known = new Set([
    'format',
    'version',
    'name',
    'notes',
    'beam',
    'layers',
    'points',
    'waterData',
    'check',
  ]);
  const unknown = Object.keys(d).filter((k) => !known.has(k));
  if (unknown.length > 0)
    dropped.push(
      `unknown field${unknown.length > 1 ? 's' : ''} ${unknown.map((k) => `"${k}"`).join(', ')}`,
    );
  return { value: c, dropped };
}

/** A short, stable tag of a text (FNV-1a, 32 bits, hex) so one entry gets one backup key. */
export function textTag(text: string): string {
  let h = 0x811c9dc5;
  for (let i = 0; i < text.length; i++) {
    h ^= text.charCodeAt(i);
    h = Math.imul(h, 0x01000193) >>> 0;
  }
  return h.toString(16).padStart(8, '0');
}
