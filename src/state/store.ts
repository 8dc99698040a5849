// The page's one store: the case being edited (with its undo history), field drafts that do not
// validate yet, view preferences and the latest calculation, plus the slices of the point check,
// the Monte Carlo run and its form (each with its actions module: src/ui/check/checkStore.ts,
// src/state/monteCarloStore.ts, src/ui/montecarlo/mcRunner.ts). Components select single fields.
import { create } from 'zustand';
import type { CalcReport } from '../contract/reports';
import type { CaseProblem } from '../io/caseFile';
import type { LaminaCase } from '../io/caseSchema';
import { fromCaseFile, type EditorCase } from './editorCase';
import { record, redo, seal, startHistory, undo, type History } from './history';
import { PRESETS } from './presets';
import { initialCheckState, type CheckState } from './slices/checkSlice';
import { initialMcForm, type McForm } from './slices/mcFormSlice';
import { initialMonteCarloState, type MonteCarloState } from './slices/monteCarloSlice';

export type Normalisation = 'dosePerMu' | 'percentWaterDmax' | 'relativeToWater';
export type Theme = 'auto' | 'light' | 'dark';
/**
 * Which water data the calculation reads (src/compute/waterSource): the case's own measured table
 * when it carries one ('case', the default, as on the command line), or the modelled beam chosen
 * explicitly ('modelled'). Opening another case goes back to 'case'.
 */
export type WaterSource = 'case' | 'modelled';
export type ViewTab = 'dose' | 'cf' | 'water' | 'plane' | 'mc' | 'check' | 'dicom' | 'explain';

export interface FieldDraft {
  text: string;
  message: string;
}

export interface CalcState {
  status: 'idle' | 'running' | 'done' | 'invalid' | 'error';
  report: CalcReport | null;
  problems: CaseProblem[];
  error: string | null;
  requestId: number;
  /** Wall time of the last delivered calculation (ms), for the status line. */
  elapsedMs: number | null;
  /** Methods drawn from the previous full calculation while a quick preview is shown. */
  updatingMethodIds: readonly string[];
}

export interface Notice {
  kind: 'error' | 'info';
  title: string;
  lines: string[];
}

export interface AppState {
  history: History<EditorCase>;
  drafts: Record<string, FieldDraft>;
  normalisation: Normalisation;
  hiddenMethods: string[];
  hiddenWarningMethods: string[];
  theme: Theme;
  waterSource: WaterSource;
  tab: ViewTab;
  calc: CalcState;
  notice: Notice | null;
  storageMessage: string | null;
  /** Slices (src/state/slices). */
  check: CheckState;
  monteCarlo: MonteCarloState;
  mcForm: McForm;
}

const defaultCase = (): LaminaCase => (PRESETS[0] as (typeof PRESETS)[number]).make();

export const useAppStore = create<AppState>()(() => ({
  history: startHistory(fromCaseFile(defaultCase())),
  drafts: {},
  normalisation: 'dosePerMu',
  hiddenMethods: [],
  hiddenWarningMethods: [],
  theme: 'auto',
  waterSource: 'case',
  tab: 'dose',
  calc: {
    status: 'idle',
    report: null,
    problems: [],
    error: null,
    requestId: 0,
    elapsedMs: null,
    updatingMethodIds: [],
  },
  notice: null,
  storageMessage: null,
  check: initialCheckState(),
  monteCarlo: initialMonteCarloState(),
  mcForm: initialMcForm(),
}));

const set = useAppStore.setState;
const get = useAppStore.getState;

/** Apply an edit to the case; edits sharing `coalesceKey` in a row are one undo step. */
export function editCase(
  fn: (c: EditorCase) => EditorCase,
  coalesceKey: string | null = null,
): void {
  const h = get().history;
  const next = fn(h.present);
  if (next !== h.present) set({ history: record(h, next, coalesceKey) });
}

export function endGesture(): void {
  set({ history: seal(get().history) });
}

export function undoEdit(): void {
  set({ history: undo(get().history), drafts: {} });
}

export function redoEdit(): void {
  set({ history: redo(get().history), drafts: {} });
}

/** Replace the case (file opened, preset picked); the replacement is one undo step. */
export function replaceCase(c: LaminaCase): void {
  set({ history: record(seal(get().history), fromCaseFile(c)), drafts: {}, waterSource: 'case' });
}

export function setDraft(path: string, draft: FieldDraft | null): void {
  const drafts = { ...get().drafts };
  if (draft) drafts[path] = draft;
  else delete drafts[path];
  set({ drafts });
}

export function toggleMethod(id: string): void {
  const hidden = get().hiddenMethods;
  set({ hiddenMethods: hidden.includes(id) ? hidden.filter((m) => m !== id) : [...hidden, id] });
}

export function toggleWarningMethod(id: string): void {
  const hidden = get().hiddenWarningMethods;
  set({
    hiddenWarningMethods: hidden.includes(id) ? hidden.filter((m) => m !== id) : [...hidden, id],
  });
}

export function setNormalisation(normalisation: Normalisation): void {
  set({ normalisation });
}

export function setTheme(theme: Theme): void {
  set({ theme });
}

export function setWaterSource(waterSource: WaterSource): void {
  set({ waterSource });
}

export function setTab(tab: ViewTab): void {
  set({ tab });
}

export function setNotice(notice: Notice | null): void {
  set({ notice });
}

export function setStorageMessage(storageMessage: string | null): void {
  if (get().storageMessage !== storageMessage) set({ storageMessage });
}

export function setCalc(patch: Partial<CalcState>): void {
  set({ calc: { ...get().calc, ...patch } });
}
