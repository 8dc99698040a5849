// The page: header with case actions, the cautions, the case editor on the left and the
// comparison views on the right, all reading one store.
import { useEffect, type KeyboardEvent } from 'react';
import { CAUTIONS } from '../contract/reports';
import { setNotice, setTab, setTheme, useAppStore, type Theme, type ViewTab } from '../state/store';
import { BeamPanel } from './BeamPanel';
import { CfView, DoseView } from './ChartViews';
import { FileBar } from './FileBar';
import { DoseToControl } from './DoseToControl';
import { openCaseFile } from './caseFileActions';
import { LayerList } from './LayerList';
import { MountPoint } from './MountPoint';
import { PointsPanel } from './PointsPanel';
import { ResultStatus } from './ResultStatus';
import { SlabStrip } from './SlabStrip';
import { useAutosave } from './useAutosave';
import { useCompute } from './useCompute';
import { useElementWidth } from './useElementWidth';
import { WaterDataPanel } from './WaterDataPanel';
import { useShownReport } from './montecarlo/useShownReport';
import { editCase } from '../state/store';

const TABS: { id: ViewTab; label: string }[] = [
  { id: 'dose', label: 'Depth dose' },
  { id: 'cf', label: 'Correction factors' },
  { id: 'water', label: 'Water data' },
  { id: 'plane', label: 'Dose plane' },
  { id: 'mc', label: 'Monte Carlo run' },
  { id: 'check', label: 'Point check & report' },
  { id: 'dicom', label: 'Patient import (DICOM)' },
  { id: 'explain', label: 'Factors & sweeps' },
];

function ThemeToggle() {
  const theme = useAppStore((s) => s.theme);
  useEffect(() => {
    if (theme === 'auto') delete document.documentElement.dataset.theme;
    else document.documentElement.dataset.theme = theme;
  }, [theme]);
  return (
    <label className="inline">
      <span>Theme</span>
      <select value={theme} onChange={(e) => setTheme(e.target.value as Theme)}>
        <option value="auto">System</option>
        <option value="light">Light</option>
        <option value="dark">Dark</option>
      </select>
    </label>
  );
}

function Notices() {
  const notice = useAppStore((s) => s.notice);
  const storage = useAppStore((s) => s.storageMessage);
  return (
    <>
      {storage ? (
        <div className="notice error" role="alert" data-testid="storage-message">
          {storage}
        </div>
      ) : null}
      {notice ? (
        <div
          className={`notice ${notice.kind}`}
          role={notice.kind === 'error' ? 'alert' : 'status'}
          data-testid="file-notice"
        >
          <strong>{notice.title}</strong>
          {notice.lines.length ? (
            <ul>
              {notice.lines.map((l, i) => (
                <li key={i}>
                  <code>{l}</code>
                </li>
              ))}
            </ul>
          ) : null}
          <button
            type="button"
            className="dismiss"
            onClick={() => setNotice(null)}
            aria-label="Dismiss"
          >
            ✕
          </button>
        </div>
      ) : null}
    </>
  );
}

function CalcStatus() {
  const status = useAppStore((s) => s.calc.status);
  const elapsed = useAppStore((s) => s.calc.elapsedMs);
  return (
    <span className="calc-status" aria-live="polite" data-testid="calc-status">
      {status === 'running'
        ? 'calculating…'
        : elapsed !== null
          ? `calculated in ${elapsed.toFixed(0)} ms`
          : ''}
    </span>
  );
}

function CaseName() {
  const name = useAppStore((s) => s.history.present.name);
  return (
    <div className="field case-name">
      <label htmlFor="case-name">Case name</label>
      <input
        id="case-name"
        type="text"
        value={name}
        maxLength={200}
        onChange={(e) => editCase((c) => ({ ...c, name: e.target.value }), 'name')}
      />
    </div>
  );
}

/** Arrow keys, Home and End move between the view tabs (and show the view). */
function onTabKey(e: KeyboardEvent<HTMLButtonElement>) {
  const i = TABS.findIndex((t) => `tab-${t.id}` === e.currentTarget.id);
  let next = -1;
  if (e.key === 'ArrowRight') next = (i + 1) % TABS.length;
  else if (e.key === 'ArrowLeft') next = (i - 1 + TABS.length) % TABS.length;
  else if (e.key === 'Home') next = 0;
  else if (e.key === 'End') next = TABS.length - 1;
  const t = TABS[next];
  if (!t) return;
  e.preventDefault();
  setTab(t.id);
  document.getElementById(`tab-${t.id}`)?.focus();
}

function Workbench() {
  const tab = useAppStore((s) => s.tab);
  // The latest calculation plus the page's Monte Carlo curve while its run matches the case.
  const report = useShownReport();
  const [ref, width] = useElementWidth<HTMLDivElement>();
  const showsDepth = tab === 'dose' || tab === 'cf';
  return (
    <main className="workbench">
      <div role="tablist" aria-label="Views" className="tabs">
        {TABS.map((t) => (
          <button
            key={t.id}
            role="tab"
            type="button"
            id={`tab-${t.id}`}
            aria-selected={tab === t.id}
            aria-controls="view-panel"
            tabIndex={tab === t.id ? 0 : -1}
            className={tab === t.id ? 'tab active' : 'tab'}
            onClick={() => setTab(t.id)}
            onKeyDown={onTabKey}
          >
            {t.label}
          </button>
        ))}
      </div>
      <div
        role="tabpanel"
        id="view-panel"
        aria-labelledby={`tab-${tab}`}
        className="tab-panel"
        ref={ref}
      >
        {showsDepth ? (
          <>
            <SlabStrip width={width} />
            <ResultStatus />
            {report ? (
              tab === 'dose' ? (
                <DoseView report={report} width={width} />
              ) : (
                <CfView report={report} width={width} />
              )
            ) : (
              <p className="empty">Calculating…</p>
            )}
          </>
        ) : null}
        {tab === 'water' ? <WaterDataPanel width={width} /> : null}
        {tab === 'plane' ? (
          <MountPoint
            which="plane"
            title="Dose plane"
            pending="The x–z dose plane (colour map) appears here once a kernel or Monte Carlo engine provides planar dose."
          />
        ) : null}
        {tab === 'mc' ? (
          <MountPoint
            which="mc"
            title="Monte Carlo run"
            pending="Monte Carlo run controls (histories, seed, progress, stop) appear here once the Monte Carlo engine is in."
          />
        ) : null}
        {tab === 'explain' ? (
          <MountPoint
            which="explain"
            title="Factors & sweeps"
            pending="Each method's factors at a point and sweeps of the CF appear here."
          />
        ) : null}
        {tab === 'check' ? (
          <MountPoint
            which="check"
            title="Point check & report"
            pending="The point-dose / MU check and its printable record appear here once that panel is in."
          />
        ) : null}
        {tab === 'dicom' ? (
          <MountPoint
            which="dicom"
            title="Patient import (DICOM)"
            pending="Import of a CT series and RT Plan appears here once that panel is in."
          />
        ) : null}
      </div>
    </main>
  );
}

export function App() {
  useCompute();
  useAutosave();
  return (
    <div
      className="app"
      onDragOver={(e) => {
        if (e.dataTransfer.types.includes('Files')) e.preventDefault();
      }}
      onDrop={(e) => {
        const f = e.dataTransfer.files[0];
        if (!f || !/\.json$/i.test(f.name)) return;
        e.preventDefault();
        void openCaseFile(f);
      }}
    >
      <header className="top">
        <h1>Lamina</h1>
        <span className="tagline">photon-beam heterogeneity corrections in slab phantoms</span>
        <CalcStatus />
        <FileBar />
        <DoseToControl />
        <ThemeToggle />
      </header>
      <aside className="cautions" aria-label="Cautions" data-testid="cautions">
        <strong>Caution.</strong>{' '}
        {CAUTIONS.map((c, i) => (
          <span key={i}>{c} </span>
        ))}
      </aside>
      <Notices />
      <div className="body">
        <div className="editor" aria-label="Case editor">
          <CaseName />
          <BeamPanel />
          <LayerList />
          <PointsPanel />
        </div>
        <Workbench />
      </div>
    </div>
  );
}
