// Autosave of the case being edited to the browser's local storage, and its restore on reload.
// Storage can be missing (private mode, blocked) or full: the caller gets a message to show,
// and the case in memory is untouched.
import { parseCaseText, serializeCase } from '../io/caseFile';
import {
  beamSchema,
  CASE_FORMAT,
  CASE_VERSION,
  layerSchema,
  pointSchema,
  waterDataSchema,
  type LaminaCase,
} from '../io/caseSchema';

export const AUTOSAVE_KEY = 'lamina.autosave.case';

export type StorageLike = Pick<Storage, 'getItem' | 'setItem'>;

export function browserStorage(): StorageLike | null {
  try {
    return typeof localStorage === 'undefined' ? null : localStorage;
  } catch {
    return null;
  }
}

export function saveCaseToStorage(
  storage: StorageLike | null,
  c: LaminaCase,
): { ok: true } | { ok: false; message: string } {
  if (!storage)
    return {
      ok: false,
      message:
        'Autosave is off: this browser does not allow local storage. Save the case to a file.',
    };
  try {
    storage.setItem(AUTOSAVE_KEY, serializeCase(c));
    return { ok: true };
  } catch (e) {
    const full = e instanceof DOMException && /quota/i.test(e.name + e.message);
    return {
      ok: false,
      message: full
        ? 'Autosave failed: local storage is full. Your case is still here; save it to a file.'
        : `Autosave failed (${(e as Error).message}). Your case is still here; save it to a file.`,
    };
  }
}

/**
 * A case the editor can hold even though it does not validate as a whole (a point below the
 * phantom after a layer was thinned, a duplicate point name): each beam, layer and point must be
 * valid on its own. The calculation then lists the remaining problems.
 */
export function lenientCase(raw: unknown): LaminaCase | null {
  if (typeof raw !== 'object' || raw === null) return null;
  const d = raw as Record<string, unknown>;
  if (d.format !== CASE_FORMAT || d.version !== CASE_VERSION) return null;
  const beam = beamSchema.safeParse(d.beam);
  const layers = Array.isArray(d.layers) ? d.layers.map((l) => layerSchema.safeParse(l)) : [];
  const points = Array.isArray(d.points) ? d.points.map((p) => pointSchema.safeParse(p)) : [];
  if (!beam.success || layers.length === 0) return null;
  if (!layers.every((l) => l.success) || !points.every((p) => p.success)) return null;
  const c: LaminaCase = {
    format: CASE_FORMAT,
    version: CASE_VERSION,
    name: typeof d.name === 'string' ? d.name.slice(0, 200) : '',
    beam: beam.data,
    layers: layers.map((l) => l.data),
    points: points.map((p) => p.data),
  };
  const w = waterDataSchema.safeParse(d.waterData);
  if (w.success) c.waterData = w.data;
  return c;
}

/** The autosaved case, or null when there is none or it cannot be read back. */
export function loadCaseFromStorage(storage: StorageLike | null): LaminaCase | null {
  if (!storage) return null;
  let text: string | null;
  try {
    text = storage.getItem(AUTOSAVE_KEY);
  } catch {
    return null;
  }
  if (!text) return null;
  const r = parseCaseText(text);
  if (r.ok) return r.value;
  try {
    return lenientCase(JSON.parse(text));
  } catch {
    return null;
  }
}
