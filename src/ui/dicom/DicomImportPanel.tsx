// Patient import: a CT series and RT Plan dropped (or picked) as DICOM files, read in a worker on
// this machine; per beam the density profile along the central ray with its slabs, editable;
// then every checkable beam becomes a beam of the check plan.
import { useMemo, useState, type DragEvent } from 'react';
import type { NamedBlob } from '../../dicom/dicomImportApi';
import { assemblePlan, SLAB_MODEL_CAUTION } from '../../dicom/assemblePlan';
import { analyseAll } from '../../dicom/importPipeline';
import { setNotice, setTab } from '../../state/store';
import { loadPlan } from '../check/planActions';
import { useElementWidth } from '../useElementWidth';
import { BeamCard } from './BeamCard';
import { filesFromDrop, filesFromList } from './collectFiles';
import {
  patchImport,
  setBeamSlabs,
  settingsOfDraft,
  useDicomImportStore,
} from './dicomImportStore';
import { importInWorker } from './dicomWorkerClient';
import { ImportSettingsForm } from './ImportSettingsForm';
import '../check/check.css';
import './dicom.css';

async function runImport(files: NamedBlob[]): Promise<void> {
  if (files.length === 0) return;
  patchImport({
    phase: 'reading',
    progress: null,
    fileCount: files.length,
    problems: [],
    imported: null,
    edits: {},
  });
  try {
    const r = await importInWorker(files, (progress) => patchImport({ progress }));
    if (r.ok) patchImport({ phase: 'done', imported: r.value, progress: null });
    else patchImport({ phase: 'failed', problems: r.problems, progress: null });
  } catch (e) {
    patchImport({
      phase: 'failed',
      problems: [`the import stopped: ${(e as Error).message}`],
      progress: null,
    });
  }
}

/** Drop handlers for the whole panel (files dropped anywhere on it are imported). */
function useDrop() {
  const [over, setOver] = useState(false);
  return {
    over,
    handlers: {
      onDragOver: (e: DragEvent) => {
        if (!e.dataTransfer.types.includes('Files')) return;
        e.preventDefault();
        e.stopPropagation();
        setOver(true);
      },
      onDragLeave: (e: DragEvent) => {
        if (!e.currentTarget.contains(e.relatedTarget as Node | null)) setOver(false);
      },
      onDrop: (e: DragEvent) => {
        e.preventDefault();
        e.stopPropagation();
        setOver(false);
        void filesFromDrop(e.dataTransfer).then(runImport);
      },
    },
  };
}

function DropZone({ over }: { over: boolean }) {
  const phase = useDicomImportStore((s) => s.phase);
  const progress = useDicomImportStore((s) => s.progress);
  const count = useDicomImportStore((s) => s.fileCount);
  return (
    <div className={`dicom-drop${over ? ' over' : ''}`} data-testid="dicom-drop">
      <p>
        <strong>Drop a folder or the DICOM files here</strong>: the planning CT series
        (uncompressed, Implicit or Explicit VR Little Endian) and its RT Plan.
      </p>
      <label className="file-button">
        Choose files…
        <input
          type="file"
          multiple
          data-testid="dicom-files-input"
          onChange={(e) => {
            const files = filesFromList(e.target.files);
            e.target.value = '';
            void runImport(files);
          }}
        />
      </label>{' '}
      <label className="file-button">
        Choose a folder…
        <input
          type="file"
          data-testid="dicom-folder-input"
          ref={(el) => el?.setAttribute('webkitdirectory', '')}
          onChange={(e) => {
            const files = filesFromList(e.target.files);
            e.target.value = '';
            void runImport(files);
          }}
        />
      </label>
      {phase === 'reading' ? (
        <p className="dicom-progress" aria-live="polite" data-testid="dicom-progress">
          {progress?.stage === 'tracing' ? 'Tracing beams' : 'Reading files'}{' '}
          <progress max={progress?.total ?? count} value={progress?.done ?? 0} />{' '}
          {progress?.done ?? 0} / {progress?.total ?? count}
        </p>
      ) : null}
    </div>
  );
}

function Summary() {
  const imp = useDicomImportStore((s) => s.imported);
  if (!imp) return null;
  const s = imp.series;
  return (
    <div className="dicom-summary" data-testid="dicom-summary">
      <p>
        CT: {s.slices} slices of {s.columns} × {s.rows} pixels, voxels{' '}
        {s.spacingMm.map((v) => v.toFixed(2)).join(' × ')} mm,{' '}
        {s.patientPosition ?? 'no patient position'}. RT Plan “{imp.planLabel}”: {imp.beams.length}{' '}
        beam
        {imp.beams.length === 1 ? '' : 's'}
        {imp.fractionsPlanned
          ? `, ${imp.fractionsPlanned} fractions (MU and dose per fraction)`
          : ''}
        .
      </p>
      {imp.notes.length + imp.ignored.length > 0 ? (
        <details>
          <summary>Notes and files not used ({imp.notes.length + imp.ignored.length})</summary>
          <ul>
            {[...imp.notes, ...imp.ignored].map((n, i) => (
              <li key={i}>{n}</li>
            ))}
          </ul>
        </details>
      ) : null}
    </div>
  );
}

export function DicomImportPanel() {
  const phase = useDicomImportStore((s) => s.phase);
  const problems = useDicomImportStore((s) => s.problems);
  const imp = useDicomImportStore((s) => s.imported);
  const draft = useDicomImportStore((s) => s.draft);
  const edits = useDicomImportStore((s) => s.edits);
  const [ref, width] = useElementWidth<HTMLDivElement>();
  const [useProblems, setUseProblems] = useState<string[]>([]);
  const drop = useDrop();
  const settings = useMemo(() => settingsOfDraft(draft), [draft]);
  const analysed = useMemo(
    () => (imp && settings.ok ? analyseAll(imp, settings.settings) : []),
    [imp, settings],
  );
  const usable = analysed.filter((a) => a.analysis);
  const use = () => {
    if (!imp || !settings.ok) return;
    const r = assemblePlan(
      imp.planLabel,
      usable.map((a) => ({
        beam: a.beam,
        analysis: a.analysis!,
        slabs: edits[a.beam.id] ?? a.analysis!.slabs,
      })),
      settings.settings,
    );
    if (!r.ok) {
      setUseProblems(r.problems);
      return;
    }
    setUseProblems([]);
    loadPlan(r.plan);
    setTab('check');
    setNotice({
      kind: 'info',
      title: `Imported the plan “${r.plan.name}”: ${r.plan.beams.length} beam${r.plan.beams.length === 1 ? '' : 's'} at point ISO.`,
      lines: [
        ...analysed
          .filter((a) => a.problem)
          .map((a) => `${a.beam.id} ${a.beam.name} left out: ${a.problem}`),
        ...r.notes,
      ],
    });
  };
  return (
    <div className="dicom-panel" ref={ref} data-testid="dicom-panel" {...drop.handlers}>
      <h2>Patient import (DICOM)</h2>
      <aside className="dicom-cautions" aria-label="Import cautions">
        <p>
          <strong>Patient data stay on this machine:</strong> the files are read in this browser and
          nothing is sent anywhere.
        </p>
        <p>
          {SLAB_MODEL_CAUTION} Check each beam&apos;s profile and slabs before use. MLC apertures,
          wedges, arcs and compressed CT are not handled.
        </p>
        <p data-testid="dicom-calibration-note">
          The default HU → ρe calibration is generic, from memory: replace it with your
          scanner&apos;s.
        </p>
      </aside>
      <DropZone over={drop.over} />
      {phase === 'failed' ? (
        <div className="notice error" role="alert" data-testid="dicom-problems">
          <strong>The files were not imported.</strong>
          <ul>
            {problems.map((p, i) => (
              <li key={i}>
                <code>{p}</code>
              </li>
            ))}
          </ul>
        </div>
      ) : null}
      <Summary />
      {imp ? (
        <>
          <ImportSettingsForm problems={settings.ok ? [] : settings.problems} />
          {analysed.map((a) => (
            <BeamCard
              key={a.beam.id}
              item={a}
              slabs={a.analysis ? (edits[a.beam.id] ?? a.analysis.slabs) : null}
              edited={edits[a.beam.id] !== undefined}
              extraOffsetsCm={settings.ok ? settings.settings.extraPointOffsetsCm : []}
              width={Math.max(320, width - 32)}
              onSlabs={(s) => setBeamSlabs(a.beam.id, s)}
            />
          ))}
          <div className="dicom-use">
            <button
              type="button"
              className="primary"
              disabled={usable.length === 0 || !settings.ok}
              onClick={use}
              data-testid="dicom-use"
            >
              Check these {usable.length} beam{usable.length === 1 ? '' : 's'} as a plan
            </button>{' '}
            {analysed.length > usable.length ? (
              <span className="muted">
                {analysed.length - usable.length} beam(s) left out (see above).
              </span>
            ) : null}
            {useProblems.length > 0 ? (
              <ul className="dicom-problems" role="alert" data-testid="dicom-use-problems">
                {useProblems.map((p, i) => (
                  <li key={i}>{p}</li>
                ))}
              </ul>
            ) : null}
          </div>
        </>
      ) : null}
    </div>
  );
}
