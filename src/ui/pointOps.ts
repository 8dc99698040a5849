// Points of interest: add (typed or placed on the depth axis), rename, move, remove.
import { LIMITS } from '../io/caseSchema';
import { newKey, type EditorCase } from '../state/editorCase';
import { snapCm } from '../state/layerOps';

/** The first free id of the form P1, P2, … */
export function nextPointId(c: EditorCase): string {
  const ids = new Set(c.points.map((p) => p.id));
  let n = c.points.length + 1;
  for (let i = 1; i <= n; i++) if (!ids.has(`P${i}`)) return `P${i}`;
  while (ids.has(`P${n}`)) n++;
  return `P${n}`;
}

export function addPoint(c: EditorCase, depthCm: number): EditorCase {
  if (c.points.length >= LIMITS.maxPoints) return c;
  return {
    ...c,
    points: [...c.points, { id: nextPointId(c), depthCm: snapCm(depthCm), key: newKey('P') }],
  };
}

export function updatePoint(
  c: EditorCase,
  index: number,
  patch: { id?: string; depthCm?: number },
): EditorCase {
  const p = c.points[index];
  if (!p) return c;
  const points = [...c.points];
  points[index] = { ...p, ...patch };
  return { ...c, points };
}

export function removePoint(c: EditorCase, index: number): EditorCase {
  return { ...c, points: c.points.filter((_, i) => i !== index) };
}
