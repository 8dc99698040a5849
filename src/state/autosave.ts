// Autosave of the case being edited to the browser's local storage, and its restore on reload.
// Storage can be missing (private mode, blocked) or full: the caller gets a message to show,
// and the case in memory is untouched.
import { parseCaseText, serializeCase } from '../io/caseFile';
import type { LaminaCase } from '../io/caseSchema';

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

/** The autosaved case, or null when there is none or it no longer validates. */
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
  return r.ok ? r.value : null;
}
