// Case file actions: start from a preset, open and save case files, undo and redo.
import { useEffect, useRef } from 'react';
import { serializeCase } from '../io/caseFile';
import { toCaseFile } from '../state/editorCase';
import { PRESETS, presetById } from '../state/presets';
import { redoEdit, replaceCase, undoEdit, useAppStore } from '../state/store';
import { fileNameFor, openCaseFile } from './caseFileActions';
import { downloadText } from './download';
import { copyShareLink } from './shareActions';
import { caseWithPageCheck } from './check/pageCheckSettings';

function isTextEntry(el: EventTarget | null): boolean {
  return (
    el instanceof HTMLElement &&
    (el.tagName === 'INPUT' || el.tagName === 'TEXTAREA' || el.isContentEditable)
  );
}

export function FileBar() {
  const canUndo = useAppStore((s) => s.history.past.length > 0);
  const canRedo = useAppStore((s) => s.history.future.length > 0);
  const fileRef = useRef<HTMLInputElement>(null);

  useEffect(() => {
    const onKey = (e: KeyboardEvent) => {
      if (!(e.ctrlKey || e.metaKey) || isTextEntry(e.target)) return;
      const k = e.key.toLowerCase();
      if (k === 'z' && !e.shiftKey) undoEdit();
      else if (k === 'y' || (k === 'z' && e.shiftKey)) redoEdit();
      else return;
      e.preventDefault();
    };
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, []);

  const save = () => {
    const c = toCaseFile(useAppStore.getState().history.present);
    downloadText(fileNameFor(c.name), serializeCase(caseWithPageCheck(c)), 'application/json');
  };

  return (
    <div className="file-bar" role="toolbar" aria-label="Case">
      <label className="inline">
        <span className="sr-only">Start from a preset</span>
        <select
          value=""
          data-testid="preset"
          onChange={(e) => {
            const p = presetById(e.target.value);
            if (!p) return;
            // The water data belong to the machine, not the phantom: keep them.
            const waterData = useAppStore.getState().history.present.waterData;
            replaceCase(waterData ? { ...p.make(), waterData } : p.make());
          }}
        >
          <option value="">New from preset…</option>
          {PRESETS.map((p) => (
            <option key={p.id} value={p.id} title={p.description}>
              {p.label}
            </option>
          ))}
        </select>
      </label>
      <button type="button" onClick={() => fileRef.current?.click()}>
        Open…
      </button>
      <input
        ref={fileRef}
        type="file"
        accept=".json,application/json"
        className="sr-only"
        tabIndex={-1}
        data-testid="open-file"
        onChange={(e) => {
          const f = e.target.files?.[0];
          e.target.value = '';
          if (f) void openCaseFile(f);
        }}
      />
      <button type="button" onClick={save} data-testid="save">
        Save
      </button>
      <button
        type="button"
        onClick={() => void copyShareLink()}
        data-testid="share"
        title="Copy a link that carries this case"
      >
        Link
      </button>
      <span className="sep" aria-hidden="true" />
      <button
        type="button"
        onClick={undoEdit}
        disabled={!canUndo}
        title="Undo (Ctrl+Z)"
        data-testid="undo"
      >
        Undo
      </button>
      <button
        type="button"
        onClick={redoEdit}
        disabled={!canRedo}
        title="Redo (Ctrl+Y)"
        data-testid="redo"
      >
        Redo
      </button>
    </div>
  );
}
