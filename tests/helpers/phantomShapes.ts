// HU of synthetic phantoms as functions of the patient position (mm): slab stacks along a beam
// and nested boxes, air (−1000 HU) elsewhere. Written to CT series by dicomPhantom.ts.
import type { Vec3 } from './dicomPhantom';

const dot = (a: Vec3, b: Vec3) => a[0] * b[0] + a[1] * b[1] + a[2] * b[2];
const add = (a: Vec3, b: Vec3, s = 1): Vec3 => [a[0] + s * b[0], a[1] + s * b[1], a[2] + s * b[2]];

export interface SlabLayer {
  thicknessMm: number;
  hu: number;
}

/**
 * HU of a slab phantom: layers perpendicular to the unit beam direction `dir` (source → isocentre),
 * the first face `isoDepthMm` upstream of the isocentre, inside a cylinder of `radiusMm` about
 * the beam axis; air (−1000 HU) elsewhere.
 */
export function slabPhantomHu(o: {
  isoMm: Vec3;
  dir: Vec3;
  isoDepthMm: number;
  layers: readonly SlabLayer[];
  radiusMm: number;
}): (p: Vec3) => number {
  const front = add(o.isoMm, o.dir, -o.isoDepthMm);
  const bounds: number[] = [];
  let t = 0;
  for (const l of o.layers) bounds.push((t += l.thicknessMm));
  return (p) => {
    const rel = add(p, front, -1);
    const depth = dot(rel, o.dir);
    if (depth < 0 || depth > t) return -1000;
    const lateral = add(rel, o.dir, -depth);
    if (dot(lateral, lateral) > o.radiusMm * o.radiusMm) return -1000;
    const k = bounds.findIndex((b) => depth <= b);
    return (o.layers[k] as SlabLayer).hu;
  };
}

/** The corners of the box bounding the slab cylinder (for gridCovering), with a margin. */
export function slabPhantomBounds(
  o: { isoMm: Vec3; dir: Vec3; isoDepthMm: number; layers: readonly SlabLayer[]; radiusMm: number },
  marginMm: number,
): { min: Vec3; max: Vec3 } {
  const total = o.layers.reduce((s, l) => s + l.thicknessMm, 0);
  const a = add(o.isoMm, o.dir, -o.isoDepthMm);
  const b = add(a, o.dir, total);
  const min: number[] = [];
  const max: number[] = [];
  for (let k = 0; k < 3; k++) {
    // A disc of radius r perpendicular to dir extends r·sqrt(1 − dir_k²) along axis k.
    const r = o.radiusMm * Math.sqrt(Math.max(0, 1 - (o.dir[k] as number) ** 2));
    min.push(Math.min(a[k] as number, b[k] as number) - r - marginMm);
    max.push(Math.max(a[k] as number, b[k] as number) + r + marginMm);
  }
  return { min: min as unknown as Vec3, max: max as unknown as Vec3 };
}

export interface HuBox {
  minMm: Vec3;
  maxMm: Vec3;
  hu: number;
}

/** HU of nested boxes (the last box containing the point wins); air (−1000 HU) outside all. */
export function boxPhantomHu(boxes: readonly HuBox[]): (p: Vec3) => number {
  return (p) => {
    let hu = -1000;
    for (const b of boxes)
      if (
        p[0] >= b.minMm[0] &&
        p[0] <= b.maxMm[0] &&
        p[1] >= b.minMm[1] &&
        p[1] <= b.maxMm[1] &&
        p[2] >= b.minMm[2] &&
        p[2] <= b.maxMm[2]
      )
        hu = b.hu;
    return hu;
  };
}
