import { describe, expect, it } from 'vitest';
import { fromCaseFile, toCaseFile, totalThicknessCm } from '../../../src/state/editorCase';
import {
  addLayer,
  moveBoundary,
  moveLayer,
  removeLayer,
  snapCm,
  splitLayer,
  updateLayer,
} from '../../../src/state/layerOps';
import { presetById } from '../../../src/state/presets';
import { validateCase } from '../../../src/io/caseFile';

const chest = () => fromCaseFile(presetById('chest')!.make());
const thicknesses = (c: ReturnType<typeof chest>) => c.layers.map((l) => l.thicknessCm);

describe('layer operations', () => {
  it('addLayer(...) appends a 2 cm water layer at the bottom by default', () => {
    const c = addLayer(chest());
    expect(thicknesses(c)).toEqual([3, 8, 9, 2]);
    expect(c.layers[3]?.materialId).toBe('water');
  });

  it('addLayer(c, 0, "lung") inserts below the first layer', () => {
    const c = addLayer(chest(), 0, 'lung', 1.5);
    expect(c.layers.map((l) => l.materialId)).toEqual(['softTissue', 'lung', 'lung', 'softTissue']);
    expect(thicknesses(c)).toEqual([3, 1.5, 8, 9]);
  });

  it('splitLayer(...) halves a layer on the 0.1 cm grid and keeps the total', () => {
    const c0 = updateLayer(chest(), 1, { thicknessCm: 7.3 });
    const c = splitLayer(c0, 1);
    const [, upper = 0, lower = 0] = thicknesses(c);
    expect(Number.isInteger(Math.round(upper * 1e6) / 1e5)).toBe(true); // on the 0.1 cm grid
    expect(Math.abs(upper - lower)).toBeLessThanOrEqual(0.1 + 1e-9);
    expect(upper + lower).toBeCloseTo(7.3, 9);
    expect(totalThicknessCm(c)).toBeCloseTo(totalThicknessCm(c0), 9);
    expect(new Set(c.layers.map((l) => l.key)).size).toBe(4);
  });

  it('removeLayer(...) removes a layer but never the last one', () => {
    const c = removeLayer(chest(), 1);
    expect(thicknesses(c)).toEqual([3, 9]);
    const one = removeLayer(removeLayer(c, 0), 0);
    expect(one.layers).toHaveLength(1);
  });

  it('moveLayer(...) swaps neighbours and ignores moves past the ends', () => {
    const c = moveLayer(chest(), 1, -1);
    expect(c.layers.map((l) => l.materialId)).toEqual(['lung', 'softTissue', 'softTissue']);
    const same = chest();
    expect(moveLayer(same, 0, -1)).toBe(same);
  });

  it('moveBoundary(...) trades thickness between the two layers of an inner boundary', () => {
    const c = moveBoundary(chest(), 2, 13.04);
    expect(thicknesses(c)).toEqual([3, 10, 7]);
    expect(totalThicknessCm(c)).toBe(20);
  });

  it('moveBoundary(...) keeps at least 0.1 cm in each layer', () => {
    expect(thicknesses(moveBoundary(chest(), 1, -5))).toEqual([0.1, 10.9, 9]);
    expect(thicknesses(moveBoundary(chest(), 1, 50))).toEqual([10.9, 0.1, 9]);
  });

  it('moveBoundary(...) on the bottom boundary changes only the last layer', () => {
    expect(thicknesses(moveBoundary(chest(), 3, 22.26))).toEqual([3, 8, 11.3]);
  });

  it('snapCm(...) rounds to 0.1 cm without binary noise', () => {
    expect(snapCm(2.25000001)).toBe(2.3);
    expect(snapCm(0.1 + 0.2)).toBe(0.3);
  });

  it('toCaseFile(...) strips editor keys and gives a valid case', () => {
    const c = toCaseFile(splitLayer(addLayer(chest()), 0));
    expect(JSON.stringify(c)).not.toContain('"key"');
    expect(validateCase(c).ok).toBe(true);
  });

  it('updateLayer(c, i, { densityGPerCm3: undefined }) removes the density override', () => {
    const c = updateLayer(updateLayer(chest(), 1, { densityGPerCm3: 0.3 }), 1, {
      densityGPerCm3: undefined,
    });
    expect('densityGPerCm3' in (c.layers[1] ?? {})).toBe(false);
  });
});
