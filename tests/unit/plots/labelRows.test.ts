import { describe, expect, it } from 'vitest';
import { labelRows } from '../../../src/plots/labelRows';

describe('labelRows(...)', () => {
  it('puts a label that would overlap its left neighbour on the next row', () => {
    const pts = [
      { id: 'P1', x: 100 },
      { id: 'in-lung', x: 110 }, // 'P1' ends at 113 + 6 px gap
      { id: 'P3', x: 200 },
    ];
    const rows = labelRows(
      pts,
      (p) => p.x,
      (p) => p.id,
    );
    expect(rows.map((r) => [r.item.id, r.row])).toEqual([
      ['P1', 0],
      ['in-lung', 1],
      ['P3', 0],
    ]);
  });

  it('sorts by position and reuses the first free row', () => {
    const rows = labelRows(
      [300, 100, 105, 108],
      (x) => x,
      () => 'AB',
    );
    expect(rows.map((r) => [r.x, r.row])).toEqual([
      [100, 0],
      [105, 1],
      [108, 2],
      [300, 0],
    ]);
  });
});
