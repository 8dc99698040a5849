import { describe, expect, it } from 'vitest';
import {
  addExtraBeam,
  patchFirstBeam,
  swapIntoEditor,
  useCheckStore,
} from '../../../src/ui/check/checkStore';
import { toCaseFile } from '../../../src/state/editorCase';
import { presetById } from '../../../src/state/presets';
import { replaceCase, useAppStore } from '../../../src/state/store';

describe('editing an extra beam of the check in the editor', () => {
  it('swaps it with beam 1: its case opens in the editor, the editor case takes its row', () => {
    const chest = presetById('chest')!.make();
    const rib = presetById('rib')!.make();
    replaceCase(chest);
    patchFirstBeam({ id: 'AP', label: 'anterior', weight: 2 });
    addExtraBeam({ id: 'PA', label: 'posterior', weight: 1, case: rib });
    const key = useCheckStore.getState().extraBeams.at(-1)!.key;

    swapIntoEditor(key);

    expect(toCaseFile(useAppStore.getState().history.present)).toEqual(rib);
    const s = useCheckStore.getState();
    expect(s.firstBeam).toEqual({ id: 'PA', label: 'posterior', weight: 1 });
    const row = s.extraBeams.at(-1)!;
    expect([row.id, row.label, row.weight]).toEqual(['AP', 'anterior', 2]);
    expect(row.case).toEqual(chest);
    expect(row.key).not.toBe(key);
  });

  it('does nothing for an unknown row', () => {
    const before = useCheckStore.getState();
    const editor = useAppStore.getState().history.present;
    swapIntoEditor('no-such-key');
    expect(useCheckStore.getState()).toBe(before);
    expect(useAppStore.getState().history.present).toBe(editor);
  });
});
