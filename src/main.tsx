// Entry point: restore the autosaved case (if any), then mount the page.
import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { browserStorage, loadCaseFromStorage } from './state/autosave';
import { fromCaseFile } from './state/editorCase';
import { startHistory } from './state/history';
import { useAppStore } from './state/store';
import { App } from './ui/App';
import { openShareLinkFromAddress } from './ui/shareActions';
import './ui/styles.css';

const restored = loadCaseFromStorage(browserStorage());
if (restored) useAppStore.setState({ history: startHistory(fromCaseFile(restored)) });

const root = document.getElementById('root');
if (root)
  createRoot(root).render(
    <StrictMode>
      <App />
    </StrictMode>,
  );

void openShareLinkFromAddress();
