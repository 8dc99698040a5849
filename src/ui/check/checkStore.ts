// The point check's own inputs, kept while the page is open (tab switches do not lose them):
// the extra beams of a multi-beam plan with their calculations, the prescription, the
// tolerances and the deciding method. Beam 1 is always the case in the editor.
import { create } from 'zustand';
import type { CalcReport } from '../../compute/calculateCase';
import { DEFAULT_TOLERANCES, type Tolerances } from '../../engine/check/tolerance';
import type { CaseProblem } from '../../io/caseFile';
import type { LaminaCase } from '../../io/caseSchema';

export interface ExtraBeam {
  key: string;
  id: string;
  label: string;
  weight: number;
  case: LaminaCase;
  /** Latest calculation of this beam (null while running). */
  report: CalcReport | null;
  /** The page's water-data choice the report was calculated with. */
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
