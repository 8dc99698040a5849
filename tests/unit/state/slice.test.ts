import { describe, expect, it } from 'vitest';
import { create } from 'zustand';
import { sliceOf } from '../../../src/state/slice';
import { useAppStore } from '../../../src/state/store';
import { useCheckStore } from '../../../src/ui/check/checkStore';
import { useMonteCarloStore } from '../../../src/state/monteCarloStore';

describe('sliceOf(store, key)', () => {
  it('patches only its slice, and its listeners hear only changes of it', () => {
    const store = create<{ a: { x: number; y: number }; b: { z: number } }>()(() => ({
      a: { x: 1, y: 2 },
      b: { z: 3 },
    }));
    const a = sliceOf(store, 'a');
    const heard: number[] = [];
    const stop = a.subscribe((s, prev) => heard.push(s.x - prev.x));
    a.setState({ x: 5 });
    store.setState({ b: { z: 4 } });
    stop();
    expect(store.getState()).toEqual({ a: { x: 5, y: 2 }, b: { z: 4 } });
    expect(a.getState()).toEqual({ x: 5, y: 2 });
    expect(heard).toEqual([4]);
  });

  it('the check and Monte Carlo stores are slices of the page’s one store', () => {
    useCheckStore.setState({ planName: 'slice test' });
    expect(useAppStore.getState().check.planName).toBe('slice test');
    useMonteCarloStore.setState({ error: 'x' });
    expect(useAppStore.getState().monteCarlo.error).toBe('x');
  });
});
