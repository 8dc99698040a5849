// Actions on the point check's inputs (the check slice of the page's one store, kept while the
// page is open: tab switches do not lose them). Beam 1 is always the case in the editor.
import type { CheckState, ExtraBeam } from '../../state/slices/checkSlice';
import { sliceOf } from '../../state/slice';
import type { DoseQuantity } from '../../engine/dose/doseQuantity';
import { toCaseFile } from '../../state/editorCase';
import { replaceCase, setWaterSource, useAppStore } from '../../state/store';

export type { CheckState, ExtraBeam } from '../../state/slices/checkSlice';

/** The check slice of the page's one store. */
export const useCheckStore = sliceOf(useAppStore, 'check');

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

/** The page-wide dose convention (every method, the charts, the check and the record). */
export function setDoseTo(doseTo: DoseQuantity): void {
  set({ doseTo });
}

export function patchFirstBeam(patch: Partial<CheckState['firstBeam']>): void {
  set({ firstBeam: { ...get().firstBeam, ...patch } });
}

export function addExtraBeam(b: Omit<ExtraBeam, 'key'>): string {
  const key = newBeamKey();
  set({ extraBeams: [...get().extraBeams, { ...b, key }] });
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
  };
  set({ extraBeams, firstBeam: { id: beam.id, label: beam.label, weight: beam.weight } });
  // A swap within the plan keeps the page's water-data choice (opening a case resets it).
  const water = useAppStore.getState().waterSource;
  replaceCase(beam.case);
  setWaterSource(water);
}
