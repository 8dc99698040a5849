import { describe, expect, it } from 'vitest';
import { makeShowGate } from '../../../src/state/showGate';

describe('makeShowGate', () => {
  it('shows a preview, then the full report of the same edit', () => {
    const g = makeShowGate();
    expect(g.preview(1)).toBe(true);
    expect(g.full(1)).toBe(true);
  });

  it('drops a preview that arrives after its own full report', () => {
    const g = makeShowGate();
    expect(g.full(1)).toBe(true);
    expect(g.preview(1)).toBe(false);
  });

  it('keeps a newer edit’s preview on screen when an older full report arrives', () => {
    const g = makeShowGate();
    expect(g.preview(2)).toBe(true);
    expect(g.full(1)).toBe(false);
    expect(g.full(2)).toBe(true);
  });

  it('never goes back to an older edit’s preview', () => {
    const g = makeShowGate();
    expect(g.preview(3)).toBe(true);
    expect(g.preview(2)).toBe(false);
    expect(g.preview(4)).toBe(true);
  });
});
