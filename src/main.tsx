// Entry point: restore the autosaved case (if any) with its check settings, then mount the page.
import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { browserStorage, loadCaseFromStorage } from './state/autosave';
import { fromCaseFile } from './state/editorCase';
import { startHistory } from './state/history';
import { readPrefs, writePrefs } from './state/prefs';
import { useAppStore } from './state/store';
import { App } from './ui/App';
import { openShareLinkFromAddress } from './ui/shareActions';
import { applyCheckSettings } from './ui/check/pageCheckSettings';
import './ui/styles.css';

const storage = browserStorage();
const restored = loadCaseFromStorage(storage);
if (restored) {
  useAppStore.setState({ history: startHistory(fromCaseFile(restored)) });
  applyCheckSettings(restored.check);
}
useAppStore.setState(readPrefs(storage));
useAppStore.subscribe((s, prev) => {
  if (
    s.theme !== prev.theme ||
    s.normalisation !== prev.normalisation ||
    s.hiddenMethods !== prev.hiddenMethods ||
    s.waterSource !== prev.waterSource
  )
    writePrefs(storage, {
      theme: s.theme,
      normalisation: s.normalisation,
      hiddenMethods: s.hiddenMethods,
      waterSource: s.waterSource,
    });
});

const root = document.getElementById('root');
if (root)
  createRoot(root).render(
    <StrictMode>
      <App />
    </StrictMode>,
  );

void openShareLinkFromAddress();
