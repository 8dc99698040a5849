// Undo/redo over whole editor states. Consecutive edits with the same coalesce key (one drag,
// typing in one field) form a single step, so undo returns to where the gesture began.

export interface History<T> {
  past: T[];
  present: T;
  future: T[];
  /** Key of the gesture that produced `present`, if it may still be extended. */
  openKey: string | null;
}

export const HISTORY_LIMIT = 200;

export function startHistory<T>(present: T): History<T> {
  return { past: [], present, future: [], openKey: null };
}

export function record<T>(h: History<T>, next: T, coalesceKey: string | null = null): History<T> {
  if (next === h.present) return h;
  if (coalesceKey !== null && coalesceKey === h.openKey)
    return { ...h, present: next, future: [], openKey: coalesceKey };
  const past = [...h.past, h.present];
  if (past.length > HISTORY_LIMIT) past.shift();
  return { past, present: next, future: [], openKey: coalesceKey };
}

/** End any open gesture, so the next edit starts a new step. */
export function seal<T>(h: History<T>): History<T> {
  return h.openKey === null ? h : { ...h, openKey: null };
}

export function undo<T>(h: History<T>): History<T> {
  const prev = h.past[h.past.length - 1];
  if (prev === undefined) return h;
  return {
    past: h.past.slice(0, -1),
    present: prev,
    future: [h.present, ...h.future],
    openKey: null,
  };
}

export function redo<T>(h: History<T>): History<T> {
  const [next, ...rest] = h.future;
  if (next === undefined) return h;
  return { past: [...h.past, h.present], present: next, future: rest, openKey: null };
}
