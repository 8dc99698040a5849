// Speculative previews for a boundary the user has taken hold of (pointer down on it, or keyboard
// focus): the preview worker computes the quick preview of the nearby positions the boundary can
// snap to, nearest first, so that when the next move lands on one of them its curves are drawn in
// the same frame as the input, with no round trip to a worker. The physics stays in the worker;
// the page only looks results up by the exact case they were computed for.
import { boundariesCm, type EditorCase } from './editorCase';
import { moveBoundary, SNAP_CM } from './layerOps';

/** How far either side of the boundary's position the previews are prepared (cm). */
export const SPECULATION_RADIUS_CM = 2;

/**
 * The distinct cases boundary `k` of `doc` produces when moved to the snapped positions within
 * `radiusCm` of `aroundCm`, nearest first (the case as it stands comes first when in range).
 * Positions past the boundary's limits collapse onto the limit and are listed once.
 */
export function boundaryCandidates(
  doc: EditorCase,
  k: number,
  aroundCm: number,
  radiusCm = SPECULATION_RADIUS_CM,
): EditorCase[] {
  const steps = Math.round(radiusCm / SNAP_CM);
  const seen = new Set<number>();
  const out: EditorCase[] = [];
  for (let i = 0; i <= steps; i++) {
    for (const sign of i === 0 ? [1] : [1, -1]) {
      const moved = moveBoundary(doc, k, aroundCm + sign * i * SNAP_CM);
      const at = boundariesCm(moved)[k];
      if (at === undefined || seen.has(at)) continue;
      seen.add(at);
      out.push(moved);
    }
  }
  return out;
}

/** A bounded map that forgets the entries used least recently first. */
export interface RecentCache<V> {
  get(key: string): V | undefined;
  has(key: string): boolean;
  set(key: string, value: V): void;
  readonly size: number;
}

export function makeRecentCache<V>(limit: number): RecentCache<V> {
  const map = new Map<string, V>();
  return {
    get(key) {
      const v = map.get(key);
      if (v !== undefined) {
        // Re-insert: the Map's order is the order of use.
        map.delete(key);
        map.set(key, v);
      }
      return v;
    },
    has: (key) => map.has(key),
    set(key, value) {
      map.delete(key);
      map.set(key, value);
      while (map.size > limit) {
        const oldest = map.keys().next();
        if (oldest.done) break;
        map.delete(oldest.value);
      }
    },
    get size() {
      return map.size;
    },
  };
}

/** Boundary index taken hold of, or null when it is let go. */
/** Counters for tests and support (read through the page's debug hooks). */
export const speculationStats = {
  /** Previews prepared ahead of an edit. */
  prepared: 0,
  /** Edits drawn from a prepared (or earlier) preview without asking a worker. */
  hits: 0,
};

type Listener = (boundary: number | null) => void;
const listeners = new Set<Listener>();

/**
 * The user took hold of boundary `k` (pointer down or focus): prepare its nearby previews; null:
 * the boundary was let go (pointer up, focus lost), stop.
 */
export function requestSpeculation(k: number | null): void {
  for (const l of listeners) l(k);
}

/** Listen for speculation requests; returns the function that stops listening. */
export function onSpeculationRequest(listener: Listener): () => void {
  listeners.add(listener);
  return () => {
    listeners.delete(listener);
  };
}
