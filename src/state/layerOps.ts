// Editing a slab stack: pure functions from one editor case to the next. Thicknesses snap to
// 0.1 cm where the user drags or splits; no layer becomes thinner than MIN_LAYER_CM.
import type { MaterialId } from '../engine/materials/materialLibrary';
import { LIMITS } from '../io/caseSchema';
import { newKey, type EditorCase, type EditorLayer } from './editorCase';

export const SNAP_CM = 0.1;
export const MIN_LAYER_CM = 0.1;

/** Round to the 0.1 cm grid, free of binary noise (2.3000000000000003 → 2.3). */
export function snapCm(valueCm: number, stepCm = SNAP_CM): number {
  return Number((Math.round(valueCm / stepCm) * stepCm).toFixed(6));
}

function withLayers(doc: EditorCase, layers: EditorLayer[]): EditorCase {
  return { ...doc, layers };
}

/** Insert a layer below `index` (at the bottom when absent). */
export function addLayer(
  doc: EditorCase,
  index = doc.layers.length - 1,
  materialId: MaterialId = 'water',
  thicknessCm = 2,
): EditorCase {
  if (doc.layers.length >= LIMITS.maxLayers) return doc;
  const layers = [...doc.layers];
  layers.splice(index + 1, 0, { materialId, thicknessCm, key: newKey('L') });
  return withLayers(doc, layers);
}

/** Split a layer into two of the same material; the upper part gets half, snapped to 0.1 cm. */
export function splitLayer(doc: EditorCase, index: number): EditorCase {
  const layer = doc.layers[index];
  if (!layer || layer.thicknessCm < 2 * MIN_LAYER_CM || doc.layers.length >= LIMITS.maxLayers)
    return doc;
  const upper = Math.min(
    Math.max(snapCm(layer.thicknessCm / 2), MIN_LAYER_CM),
    layer.thicknessCm - MIN_LAYER_CM,
  );
  const lower = Number((layer.thicknessCm - upper).toFixed(6));
  const layers = [...doc.layers];
  layers.splice(
    index,
    1,
    { ...layer, thicknessCm: upper },
    { ...layer, thicknessCm: lower, key: newKey('L') },
  );
  return withLayers(doc, layers);
}

/** Remove a layer; the last remaining layer cannot be removed. */
export function removeLayer(doc: EditorCase, index: number): EditorCase {
  if (doc.layers.length <= 1 || !doc.layers[index]) return doc;
  return withLayers(
    doc,
    doc.layers.filter((_, i) => i !== index),
  );
}

/** Move a layer up (delta −1) or down (+1) in the stack. */
export function moveLayer(doc: EditorCase, index: number, delta: -1 | 1): EditorCase {
  const target = index + delta;
  const layer = doc.layers[index];
  const other = doc.layers[target];
  if (!layer || !other) return doc;
  const layers = [...doc.layers];
  layers[index] = other;
  layers[target] = layer;
  return withLayers(doc, layers);
}

export function updateLayer(
  doc: EditorCase,
  index: number,
  patch: Partial<EditorLayer>,
): EditorCase {
  const layer = doc.layers[index];
  if (!layer) return doc;
  const layers = [...doc.layers];
  const next: EditorLayer = { ...layer, ...patch, key: layer.key };
  if ('densityGPerCm3' in patch && patch.densityGPerCm3 === undefined) delete next.densityGPerCm3;
  if ('label' in patch && patch.label === undefined) delete next.label;
  layers[index] = next;
  return withLayers(doc, layers);
}

/**
 * Move boundary `k` (1 … layers; 0 is the surface and cannot move) to a new depth, snapped to
 * 0.1 cm. An inner boundary trades thickness between its two layers (total unchanged); the
 * bottom boundary changes the last layer only. Layers keep at least MIN_LAYER_CM.
 */
export function moveBoundary(doc: EditorCase, k: number, depthCm: number): EditorCase {
  const n = doc.layers.length;
  if (k < 1 || k > n || !Number.isFinite(depthCm)) return doc;
  let top = 0;
  for (let i = 0; i < k - 1; i++) top += doc.layers[i]?.thicknessCm ?? 0;
  const above = doc.layers[k - 1];
  if (!above) return doc;
  const below = doc.layers[k];
  const lowLimit = top + MIN_LAYER_CM;
  const highLimit = below
    ? top + above.thicknessCm + below.thicknessCm - MIN_LAYER_CM
    : top + Math.min(LIMITS.maxLayerThicknessCm, LIMITS.maxPhantomThicknessCm - top);
  const z = Math.min(Math.max(snapCm(depthCm), lowLimit), highLimit);
  const newAbove = Number((z - top).toFixed(6));
  if (newAbove === above.thicknessCm) return doc;
  const layers = [...doc.layers];
  layers[k - 1] = { ...above, thicknessCm: newAbove };
  if (below)
    layers[k] = {
      ...below,
      thicknessCm: Number((above.thicknessCm + below.thicknessCm - newAbove).toFixed(6)),
    };
  return withLayers(doc, layers);
}
