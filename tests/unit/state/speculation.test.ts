import { describe, expect, it } from 'vitest';
import { boundariesCm, fromCaseFile, toCaseFile } from '../../../src/state/editorCase';
import { moveBoundary } from '../../../src/state/layerOps';
import { presetById } from '../../../src/state/presets';
import {
  boundaryCandidates,
  makeRecentCache,
  onSpeculationRequest,
  requestSpeculation,
} from '../../../src/state/speculation';

// Chest preset: 3 cm soft tissue, 8 cm lung, 9 cm soft tissue (boundaries 0, 3, 11, 20 cm).
const chest = () => fromCaseFile(presetById('chest')!.make());
const at = (c: ReturnType<typeof chest>, k: number) => boundariesCm(c)[k];

describe('boundaryCandidates', () => {
  it('lists the snapped positions within the radius, nearest first, the current one first', () => {
    const c = chest();
    const list = boundaryCandidates(c, 2, 11, 0.3);
    expect(list.map((x) => at(x, 2))).toEqual([11, 11.1, 10.9, 11.2, 10.8, 11.3, 10.7]);
  });

  it('gives exactly the cases a drag to those positions produces (same file content)', () => {
    const c = chest();
    for (const cand of boundaryCandidates(c, 2, 11, 1)) {
      const z = at(cand, 2)!;
      expect(toCaseFile(cand)).toEqual(toCaseFile(moveBoundary(c, 2, z)));
    }
  });

  it('is the same set whichever position the held boundary is at (re-centring reuses work)', () => {
    const c = chest();
    const moved = moveBoundary(c, 2, 11.4);
    const a = boundaryCandidates(c, 2, 11.4, 0.5).map((x) => JSON.stringify(toCaseFile(x)));
    const b = boundaryCandidates(moved, 2, 11.4, 0.5).map((x) => JSON.stringify(toCaseFile(x)));
    expect(b).toEqual(a);
  });

  it('collapses positions past a limit onto the limit and lists it once', () => {
    const c = chest();
    // Boundary 1 cannot go above 0.1 cm (a layer keeps at least 0.1 cm).
    const list = boundaryCandidates(c, 1, 0.3, 0.5).map((x) => at(x, 1));
    expect(list).toEqual([0.3, 0.4, 0.2, 0.5, 0.1, 0.6, 0.7, 0.8]);
    expect(new Set(list).size).toBe(list.length);
  });
});

describe('makeRecentCache', () => {
  it('forgets the entry used least recently when full', () => {
    const cache = makeRecentCache<number>(2);
    cache.set('a', 1);
    cache.set('b', 2);
    expect(cache.get('a')).toBe(1); // 'a' is now the most recent
    cache.set('c', 3);
    expect(cache.has('b')).toBe(false);
    expect(cache.get('a')).toBe(1);
    expect(cache.get('c')).toBe(3);
    expect(cache.size).toBe(2);
  });
});

describe('speculation requests', () => {
  it('reach every listener until it stops listening, a let-go as null', () => {
    const got: (number | null)[] = [];
    const stop = onSpeculationRequest((k) => got.push(k));
    requestSpeculation(2);
    requestSpeculation(null);
    stop();
    requestSpeculation(3);
    expect(got).toEqual([2, null]);
  });
});
