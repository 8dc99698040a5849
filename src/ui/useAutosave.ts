// Saves the case, with the check's settings (prescription, tolerances, deciding method, dose
// convention) in its `check` block, to local storage shortly after every edit of either
// (debounced); failures become a message on the page and never touch the case in memory. A save
// still waiting when the page is hidden or left (reload, tab closed, switched away) is written at
// once, so an edit made just before a reload is not lost.
import { useEffect } from 'react';
import { browserStorage, saveCaseToStorage, takeRestoreMessage } from '../state/autosave';
import { toCaseFile } from '../state/editorCase';
import { setStorageMessage, useAppStore, type AppState } from '../state/store';
import { caseWithPageCheck } from './check/pageCheckSettings';

/** The check's settings that travel with the case (the rest of the check slice does not). */
const settingsChanged = (a: AppState['check'], b: AppState['check']): boolean =>
  a.prescriptionPointId !== b.prescriptionPointId ||
  a.prescriptionDoseCGy !== b.prescriptionDoseCGy ||
  a.tolerances !== b.tolerances ||
  a.checkMethodId !== b.checkMethodId ||
  a.doseTo !== b.doseTo;

export const AUTOSAVE_DELAY_MS = 400;

export function useAutosave(): void {
  useEffect(() => {
    // What the start-up restore found (unreadable entry kept under a backup key, no storage…).
    const restoreMessage = takeRestoreMessage();
    if (restoreMessage) setStorageMessage(restoreMessage);
    let timer: ReturnType<typeof setTimeout> | undefined;
    const save = () => {
      timer = undefined;
      const r = saveCaseToStorage(
        browserStorage(),
        caseWithPageCheck(toCaseFile(useAppStore.getState().history.present)),
      );
      setStorageMessage(r.ok ? null : r.message);
    };
    const flush = () => {
      if (timer === undefined) return;
      clearTimeout(timer);
      save();
    };
    const onVisibility = () => {
      if (document.visibilityState === 'hidden') flush();
    };
    const unsubscribe = useAppStore.subscribe((s, prev) => {
      if (s.history.present === prev.history.present && !settingsChanged(s.check, prev.check))
        return;
      clearTimeout(timer);
      timer = setTimeout(save, AUTOSAVE_DELAY_MS);
    });
    window.addEventListener('pagehide', flush);
    document.addEventListener('visibilitychange', onVisibility);
    return () => {
      flush();
      window.removeEventListener('pagehide', flush);
      document.removeEventListener('visibilitychange', onVisibility);
      unsubscribe();
    };
  }, []);
}
