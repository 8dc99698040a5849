import { describe, expect, it } from 'vitest';
import { record, redo, seal, startHistory, undo } from '../../../src/state/history';

describe('edit history', () => {
  it('undo(...) and redo(...) walk the whole history in order', () => {
    let h = startHistory('a');
    h = record(h, 'b');
    h = record(h, 'c');
    h = undo(undo(h));
    expect(h.present).toBe('a');
    expect(undo(h)).toBe(h);
    h = redo(h);
    expect(h.present).toBe('b');
    h = redo(h);
    expect(h.present).toBe('c');
    expect(redo(h)).toBe(h);
  });

  it('record(...) with the same coalesce key keeps one undo step per gesture', () => {
    let h = startHistory(0);
    h = record(h, 1, 'drag');
    h = record(h, 2, 'drag');
    h = record(h, 3, 'drag');
    expect(undo(h).present).toBe(0);
    h = seal(h);
    h = record(h, 4, 'drag');
    expect(undo(h).present).toBe(3);
  });

  it('record(...) after an undo discards the redo branch', () => {
    let h = record(record(startHistory('a'), 'b'), 'c');
    h = record(undo(h), 'd');
    expect(h.future).toEqual([]);
    expect(redo(h)).toBe(h);
    expect(undo(h).present).toBe('b');
  });
});
