// The DICOM import panel's own state, kept while the page is open: the import (from the worker),
// the settings as typed, and slabs edited by hand per beam. Everything else — each beam's
// analysis and the plan — is derived from these with the same functions the command line uses.
import { create } from 'zustand';
import type { Slab } from '../../dicom/analyseBeam';
import {
  DEFAULT_CALIBRATION_CSV,
  DEFAULT_CALIBRATION_LABEL,
  parseCalibrationCsv,
} from '../../dicom/calibration';
import type { DicomImport, ImportProgress } from '../../dicom/importDicom';
import {
  defaultImportSettings,
  settingsProblems,
  type ImportSettings,
} from '../../dicom/importSettings';

export interface SettingsDraft {
  calibrationCsv: string;
  calibrationLabel: string;
  bodyThresholdHu: number;
  similarityRhoE: number;
  minThicknessCm: number;
  materialToleranceRhoE: number;
  extraPoints: string;
}

export interface DicomImportState {
  phase: 'idle' | 'reading' | 'done' | 'failed';
  progress: ImportProgress | null;
  fileCount: number;
  problems: string[];
  imported: DicomImport | null;
  draft: SettingsDraft;
  /** Slabs edited by hand, by beam id. */
  edits: Record<string, Slab[]>;
}

export function defaultDraft(): SettingsDraft {
  const s = defaultImportSettings();
  return {
    calibrationCsv: DEFAULT_CALIBRATION_CSV,
    calibrationLabel: DEFAULT_CALIBRATION_LABEL,
    bodyThresholdHu: s.bodyThresholdHu,
    similarityRhoE: s.segmentation.similarityRhoE,
    minThicknessCm: s.segmentation.minThicknessCm,
    materialToleranceRhoE: s.materialToleranceRhoE,
    extraPoints: '',
  };
}

export const useDicomImportStore = create<DicomImportState>()(() => ({
  phase: 'idle',
  progress: null,
  fileCount: 0,
  problems: [],
  imported: null,
  draft: defaultDraft(),
  edits: {},
}));

export function patchImport(patch: Partial<DicomImportState>): void {
  useDicomImportStore.setState(patch);
}

/** A settings change re-derives every beam's slabs: hand edits are dropped. */
export function patchDraft(patch: Partial<SettingsDraft>): void {
  const s = useDicomImportStore.getState();
  useDicomImportStore.setState({ draft: { ...s.draft, ...patch }, edits: {} });
}

export function setBeamSlabs(beamId: string, slabs: Slab[] | null): void {
  const edits = { ...useDicomImportStore.getState().edits };
  if (slabs) edits[beamId] = slabs;
  else delete edits[beamId];
  useDicomImportStore.setState({ edits });
}

/** The settings a draft stands for, or the problems that keep it from standing for any. */
export function settingsOfDraft(
  d: SettingsDraft,
): { ok: true; settings: ImportSettings } | { ok: false; problems: string[] } {
  const problems: string[] = [];
  const cal = parseCalibrationCsv(d.calibrationCsv, d.calibrationLabel);
  if (!cal.ok) problems.push(...cal.problems);
  const extra =
    d.extraPoints.trim() === ''
      ? []
      : d.extraPoints
          .split(/[,;\s]+/)
          .filter(Boolean)
          .map(Number);
  if (extra.some((v) => !Number.isFinite(v)))
    problems.push(
      `extra points: "${d.extraPoints}" is not a list of numbers (cm past the isocentre)`,
    );
  const base = defaultImportSettings();
  const settings: ImportSettings = {
    calibration: cal.ok ? cal.value : base.calibration,
    bodyThresholdHu: d.bodyThresholdHu,
    segmentation: {
      ...base.segmentation,
      similarityRhoE: d.similarityRhoE,
      minThicknessCm: d.minThicknessCm,
    },
    materialToleranceRhoE: d.materialToleranceRhoE,
    extraPointOffsetsCm: extra.filter((v) => Number.isFinite(v)),
  };
  problems.push(...settingsProblems(settings));
  return problems.length > 0 ? { ok: false, problems } : { ok: true, settings };
}
