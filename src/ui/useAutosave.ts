// Saves the case to local storage shortly after every edit (debounced); failures become a
// message on the page and never touch the case in memory.
import { useEffect } from 'react';
import { browserStorage, saveCaseToStorage, takeRestoreMessage } from '../state/autosave';
import { toCaseFile } from '../state/editorCase';
import { setStorageMessage, useAppStore } from '../state/store';

export const AUTOSAVE_DELAY_MS = 400;

export function useAutosave(): void {
  useEffect(() => {
    // What the start-up restore found (unreadable entry kept under a backup key, no storage…).
    const restoreMessage = takeRestoreMessage();
    if (restoreMessage) setStorageMessage(restoreMessage);
    let timer: ReturnType<typeof setTimeout> | undefined;
    const unsubscribe = useAppStore.subscribe((s, prev) => {
      if (s.history.present === prev.history.present) return;
      clearTimeout(timer);
      timer = setTimeout(() => {
        const r = saveCaseToStorage(
          browserStorage(),
          toCaseFile(useAppStore.getState().history.present),
        );
        setStorageMessage(r.ok ? null : r.message);
      }, AUTOSAVE_DELAY_MS);
    });
    return () => {
      clearTimeout(timer);
      unsubscribe();
    };
  }, []);
}
