// Autosave of the case being edited to the browser's local storage, and its restore on reload.
// Storage can be missing (private mode, blocked) or full: the caller gets a message to show,
// and the case in memory is untouched. Entries are versioned (./autosaveEntry); an entry that
// cannot be read, or only in part (a lenient reading left something out), is copied to a backup
// key before anything could overwrite it, and is never overwritten when that copy fails.
import type { LaminaCase } from '../io/caseSchema';
import { autosaveEntryText, readAutosaveEntry, textTag, type AutosaveRead } from './autosaveEntry';

export { lenientCase } from './autosaveEntry';

export const AUTOSAVE_KEY = 'lamina.autosave.case';
export const AUTOSAVE_BACKUP_PREFIX = 'lamina.autosave.backup.';

export type StorageLike = Pick<Storage, 'getItem' | 'setItem'>;

/** An entry that cannot be read in full: unreadable, or read leniently with parts left out. */
function needsBackup(r: AutosaveRead): boolean {
  return r.status === 'unreadable' || (r.status === 'ok' && r.dropped !== undefined);
}

export function browserStorage(): StorageLike | null {
  try {
    return typeof localStorage === 'undefined' ? null : localStorage;
  } catch {
    return null;
  }
}

const UNAVAILABLE =
  'Autosave is off: this browser does not allow local storage. Save the case to a file.';

function isQuotaError(e: unknown): boolean {
  return e instanceof DOMException && (e.code === 22 || /quota/i.test(`${e.name} ${e.message}`));
}

function errorText(e: unknown): string {
  return e instanceof Error ? e.message : String(e);
}

/** Copy an unreadable entry to its backup key (once per distinct text); the key, or why not. */
export function backupEntry(
  storage: StorageLike,
  text: string,
): { ok: true; key: string } | { ok: false; reason: string } {
  const key = AUTOSAVE_BACKUP_PREFIX + textTag(text);
  try {
    if (storage.getItem(key) !== text) storage.setItem(key, text);
    return { ok: true, key };
  } catch (e) {
    return { ok: false, reason: isQuotaError(e) ? 'storage is full' : errorText(e) };
  }
}

export function saveCaseToStorage(
  storage: StorageLike | null,
  c: LaminaCase,
  now: Date = new Date(),
): { ok: true } | { ok: false; message: string } {
  if (!storage) return { ok: false, message: UNAVAILABLE };
  try {
    const previous = storage.getItem(AUTOSAVE_KEY);
    if (previous !== null && needsBackup(readAutosaveEntry(previous))) {
      const b = backupEntry(storage, previous);
      if (!b.ok)
        return {
          ok: false,
          message: `Autosave paused: the earlier autosaved entry cannot be read in full and could not be copied to a backup (${b.reason}), so it is left as it is under "${AUTOSAVE_KEY}". Your case is still here; save it to a file.`,
        };
    }
    storage.setItem(AUTOSAVE_KEY, autosaveEntryText(c, now));
    return { ok: true };
  } catch (e) {
    return {
      ok: false,
      message: isQuotaError(e)
        ? 'Autosave failed: local storage is full. Your case is still here; save it to a file.'
        : `Autosave failed (${errorText(e)}). Your case is still here; save it to a file.`,
    };
  }
}

export interface RestoreResult {
  /** The autosaved case, or null (nothing stored, storage unavailable or entry unreadable). */
  value: LaminaCase | null;
  /** What the page should tell the user, or null when there is nothing to say. */
  message: string | null;
}

/**
 * Read the autosaved case at start-up. An unreadable entry (damaged, or from a newer Lamina) is
 * copied to a backup key and the message names that key.
 */
export function restoreAutosave(storage: StorageLike | null): RestoreResult {
  if (!storage) return { value: null, message: UNAVAILABLE };
  let text: string | null;
  try {
    text = storage.getItem(AUTOSAVE_KEY);
  } catch (e) {
    return {
      value: null,
      message: `Autosave is off: local storage cannot be read (${errorText(e)}). Save the case to a file.`,
    };
  }
  const r = readAutosaveEntry(text);
  if (r.status === 'empty') return { value: null, message: null };
  if (r.status === 'ok' && !r.dropped) return { value: r.value, message: null };
  if (r.status === 'ok') {
    // Restored leniently with parts left out: say which, and keep the entry as it was.
    const b = backupEntry(storage, text as string);
    const without = `The autosaved case was restored without ${r.dropped!.join('; ')}`;
    return {
      value: r.value,
      message: b.ok
        ? `${without}. The entry as it was is kept unchanged in this browser's storage under "${b.key}".`
        : `${without}, and the entry as it was could not be backed up (${b.reason}); it is left under "${AUTOSAVE_KEY}" and autosave will not overwrite it. Save the case to a file.`,
    };
  }
  const b = backupEntry(storage, text as string);
  return {
    value: null,
    message: b.ok
      ? `The autosaved case could not be opened (${r.reason}). It is kept unchanged in this browser's storage under "${b.key}"; the page starts with a new case.`
      : `The autosaved case could not be opened (${r.reason}) and could not be backed up (${b.reason}); it is left under "${AUTOSAVE_KEY}" and autosave will not overwrite it. The page starts with a new case.`,
  };
}

let pendingRestoreMessage: string | null = null;

/** The autosaved case, or null; a message for the page waits in `takeRestoreMessage()`. */
export function loadCaseFromStorage(storage: StorageLike | null): LaminaCase | null {
  const r = restoreAutosave(storage);
  pendingRestoreMessage = r.message;
  return r.value;
}

/** The message left by the last `loadCaseFromStorage(...)` (once; null afterwards). */
export function takeRestoreMessage(): string | null {
  const m = pendingRestoreMessage;
  pendingRestoreMessage = null;
  return m;
}
