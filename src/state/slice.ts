// A slice of the page's one store (src/state/store.ts) seen as a store of its own: a hook with a
// selector, getState, setState (a shallow patch of the slice) and subscribe. The slices' modules
// keep their small APIs while zustand holds everything in one state tree.
import type { StoreApi, UseBoundStore } from 'zustand';

export interface SliceStore<S> {
  <U = S>(selector?: (s: S) => U): U;
  getState: () => S;
  setState: (patch: Partial<S>) => void;
  subscribe: (listener: (state: S, prev: S) => void) => () => void;
}

export function sliceOf<Root, K extends keyof Root>(
  store: UseBoundStore<StoreApi<Root>>,
  key: K,
): SliceStore<Root[K]> {
  type S = Root[K];
  const hook = <U = S>(selector?: (s: S) => U): U =>
    store((root) => (selector ? selector(root[key]) : (root[key] as unknown as U)));
  return Object.assign(hook, {
    getState: () => store.getState()[key],
    setState: (patch: Partial<S>) =>
      store.setState({ [key]: { ...store.getState()[key], ...patch } } as unknown as Partial<Root>),
    subscribe: (listener: (state: S, prev: S) => void) =>
      store.subscribe((root, prev) => {
        if (root[key] !== prev[key]) listener(root[key], prev[key]);
      }),
  });
}
