import { beforeEach, describe, expect, it } from 'vitest';
import { fromCaseFile } from '../../../src/state/editorCase';
import { startHistory } from '../../../src/state/history';
import { addLayer, moveBoundary, removeLayer, splitLayer } from '../../../src/state/layerOps';
import { presetById } from '../../../src/state/presets';
import {
  editCase,
  endGesture,
  redoEdit,
  replaceCase,
  setDraft,
  toggleMethod,
  undoEdit,
  useAppStore,
} from '../../../src/state/store';

const thicknesses = () => useAppStore.getState().history.present.layers.map((l) => l.thicknessCm);

beforeEach(() => {
  useAppStore.setState({
    history: startHistory(fromCaseFile(presetById('chest')!.make())),
    drafts: {},
    hiddenMethods: [],
  });
});

describe('store actions', () => {
  it('editCase(...) then undoEdit()/redoEdit() walk add, split and remove in order', () => {
    editCase((c) => addLayer(c));
    editCase((c) => splitLayer(c, 1));
    editCase((c) => removeLayer(c, 0));
    expect(thicknesses()).toEqual([4, 4, 9, 2]);
    undoEdit();
    expect(thicknesses()).toEqual([3, 4, 4, 9, 2]);
    undoEdit();
    expect(thicknesses()).toEqual([3, 8, 9, 2]);
    undoEdit();
    expect(thicknesses()).toEqual([3, 8, 9]);
    undoEdit(); // nothing left to undo
    expect(thicknesses()).toEqual([3, 8, 9]);
    redoEdit();
    redoEdit();
    redoEdit();
    expect(thicknesses()).toEqual([4, 4, 9, 2]);
  });

  it('a whole drag (same gesture key) is one undo step', () => {
    for (const z of [11.5, 12, 12.7, 13]) editCase((c) => moveBoundary(c, 2, z), 'drag-2');
    endGesture();
    expect(thicknesses()).toEqual([3, 10, 7]);
    undoEdit();
    expect(thicknesses()).toEqual([3, 8, 9]);
  });

  it('an edit that changes nothing adds no undo step', () => {
    editCase((c) => removeLayer(removeLayer(removeLayer(c, 0), 0), 0)); // the last layer stays
    editCase((c) => c);
    expect(useAppStore.getState().history.past).toHaveLength(1);
  });

  it('replaceCase(...) is undoable and clears field drafts', () => {
    setDraft('x.thicknessCm', { text: 'abc', message: 'Layer 1 thickness: "abc" is not a number' });
    replaceCase(presetById('water')!.make());
    expect(thicknesses()).toEqual([25]);
    expect(useAppStore.getState().drafts).toEqual({});
    undoEdit();
    expect(thicknesses()).toEqual([3, 8, 9]);
  });

  it('toggleMethod(...) hides and shows a method', () => {
    toggleMethod('rtmr');
    expect(useAppStore.getState().hiddenMethods).toEqual(['rtmr']);
    toggleMethod('rtmr');
    expect(useAppStore.getState().hiddenMethods).toEqual([]);
  });
});
