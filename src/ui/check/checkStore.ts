// The point check's own inputs, kept while the page is open (tab switches do not lose them):
// the extra beams of a multi-beam plan with their calculations, the prescription, the
// tolerances and the deciding method. Beam 1 is always the case in the editor.
import { create } from 'zustand';
import type { CalcReport } from '../../compute/calculateCase';
import { DEFAULT_TOLERANCES, type Tolerances } from '../../engine/check/tolerance';
import type { CaseProblem } from '../../io/caseFile';
import type { LaminaCase } from '../../io/caseSchema';
import { toCaseFile } from '../../state/editorCase';
import { replaceCase, useAppStore } from '../../state/store';

export interface ExtraBeam {
  key: string;
  id: string;
  label: string;
  weight: number;
  case: LaminaCase;
  /** Latest calculation of this beam (null while running). */
  report: CalcReport | null;
  /** The page's water-data choice and dose convention the report was calculated with. */
  reportSource?: string | undefined;
  problems: CaseProblem[];
}

export interface CheckState {
  /** Name of a plan opened from a file or link ('' = the editor's case name). */
  planName: string;
  firstBeam: { id: string; label: string; weight: number };
  extraBeams: ExtraBeam[];
  prescriptionPointId: string;
  /** Total prescribed dose at the point (cGy), or null for none. */
  prescriptionDoseCGy: number | null;
  tolerances: Tolerances;
  checkMethodId: string;
}

export const useCheckStore = create<CheckState>()(() => ({
  planName: '',
  firstBeam: { id: 'beam-1', label: '', weight: 1 },
  extraBeams: [],
  prescriptionPointId: '',
  prescriptionDoseCGy: null,
  tolerances: { ...DEFAULT_TOLERANCES },
  checkMethodId: '',
}));

const set = useCheckStore.setState;
const get = useCheckStore.getState;

let counter = 0;
export function newBeamKey(): string {
  counter += 1;
  return `B${counter}`;
}

export function patchCheck(patch: Partial<CheckState>): void {
  set(patch);
}

export function patchFirstBeam(patch: Partial<CheckState['firstBeam']>): void {
  set({ firstBeam: { ...get().firstBeam, ...patch } });
}

export function addExtraBeam(b: Omit<ExtraBeam, 'key' | 'report' | 'problems'>): string {
  const key = newBeamKey();
  set({ extraBeams: [...get().extraBeams, { ...b, key, report: null, problems: [] }] });
  return key;
}

export function patchExtraBeam(key: string, patch: Partial<Omit<ExtraBeam, 'key'>>): void {
  set({ extraBeams: get().extraBeams.map((b) => (b.key === key ? { ...b, ...patch } : b)) });
}

export function removeExtraBeam(key: string): void {
  set({ extraBeams: get().extraBeams.filter((b) => b.key !== key) });
}

export function clearExtraBeams(): void {
  set({ extraBeams: [] });
}

/**
 * Edit an extra beam with the full editor: it becomes beam 1 (its case opens in the editor, its
 * id, label and weight move to the first row) and the editor's case takes its place in the list
 * with the first row's id, label and weight. The opened case is one undo step in the editor; undo
 * brings the editor's case back but leaves the list as it is.
 */
export function swapIntoEditor(key: string): void {
  const s = get();
  const k = s.extraBeams.findIndex((b) => b.key === key);
  const beam = s.extraBeams[k];
  if (!beam) return;
  const editorCase = toCaseFile(useAppStore.getState().history.present);
  const extraBeams = [...s.extraBeams];
  extraBeams[k] = {
    key: newBeamKey(),
    id: s.firstBeam.id,
    label: s.firstBeam.label,
    weight: s.firstBeam.weight,
    case: editorCase,
    report: null,
    problems: [],
  };
  set({ extraBeams, firstBeam: { id: beam.id, label: beam.label, weight: beam.weight } });
  replaceCase(beam.case);
}
