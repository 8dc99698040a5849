// Isodose lines of a dose plane (marching squares, d3-contour) as SVG paths in pixels, without the
// closing runs d3 adds along the grid's edge, and a label for each level placed where it does not
// overlap another label.
import { contours } from 'd3-contour';
import type { PlaneGrid } from './planeGrid';

export interface IsodoseLine {
  /** Level in % of the normalisation dose. */
  percent: number;
  d: string;
  label: { x: number; y: number } | null;
}

/** Pixel position of a (fractional) node index: ix across the x nodes, iz down the depth nodes. */
export type IndexToPx = (ix: number, iz: number) => [number, number];

const LABEL_W = 30;
const LABEL_H = 12;

/** Fractional index → cm by linear interpolation between the nodes. */
function indexToCm(nodes: readonly number[], f: number): number {
  const i = Math.max(0, Math.min(nodes.length - 2, Math.floor(f)));
  const a = nodes[i] as number;
  const b = nodes[i + 1] ?? a;
  return a + (b - a) * (f - i);
}

/** Px from a fractional index in cm (for grids with uneven spacing). */
export function indexMapper(
  g: PlaneGrid,
  toPx: (xCm: number, depthCm: number) => [number, number],
): IndexToPx {
  return (ix, iz) => toPx(indexToCm(g.xCm, ix), indexToCm(g.depthCm, iz));
}

function overlaps(a: { x: number; y: number }, b: { x: number; y: number }): boolean {
  return Math.abs(a.x - b.x) < LABEL_W && Math.abs(a.y - b.y) < LABEL_H;
}

/**
 * Lines at `percents` of `normDose`. The contour grid has depth along its columns (d3 x) and
 * lateral position along its rows (d3 y), so node (iz, ix) sits at contour coordinate
 * (iz + 0.5, ix + 0.5); coordinates are clamped to the node extent and runs along an edge dropped.
 */
export function isodoseLines(
  g: PlaneGrid,
  normDose: number,
  percents: readonly number[],
  toPx: IndexToPx,
  labelBox?: { left: number; top: number; right: number; bottom: number },
): IsodoseLine[] {
  const nz = g.depthCm.length;
  const nx = g.xCm.length;
  if (nz < 2 || nx < 2 || !(normDose > 0)) return [];
  const values = new Float64Array(nz * nx);
  for (let ix = 0; ix < nx; ix++)
    for (let iz = 0; iz < nz; iz++) values[ix * nz + iz] = g.values[iz]?.[ix] ?? 0;
  const gen = contours().size([nz, nx]);
  const placed: { x: number; y: number }[] = [];
  const side = (c: number, n: number) => (c <= 0 ? -1 : c >= n - 1 ? 1 : 0);
  return percents.map((percent) => {
    const level = (percent / 100) * normDose;
    const geom = gen.contour(values as unknown as number[], level);
    const parts: string[] = [];
    const candidates: { x: number; y: number }[] = [];
    for (const polygon of geom.coordinates)
      for (const ring of polygon) {
        let pen = false;
        let prev: { iz: number; ix: number } | null = null;
        for (const pt of ring) {
          const iz = Math.max(0, Math.min(nz - 1, (pt[0] as number) - 0.5));
          const ix = Math.max(0, Math.min(nx - 1, (pt[1] as number) - 0.5));
          const onEdgeRun =
            prev !== null &&
            ((side(iz, nz) !== 0 && side(iz, nz) === side(prev.iz, nz)) ||
              (side(ix, nx) !== 0 && side(ix, nx) === side(prev.ix, nx)));
          const [px, py] = toPx(ix, iz);
          const p = `${Math.round(px * 10) / 10},${Math.round(py * 10) / 10}`;
          if (prev === null || onEdgeRun) {
            pen = false;
          } else {
            if (!pen) {
              const [qx, qy] = toPx(prev.ix, prev.iz);
              parts.push(`M${Math.round(qx * 10) / 10},${Math.round(qy * 10) / 10}`);
              pen = true;
            }
            parts.push(`L${p}`);
            candidates.push({ x: px, y: py });
          }
          prev = { iz, ix };
        }
      }
    return { percent, d: parts.join(''), label: placeLabel(candidates, placed, labelBox) };
  });
}

/** First candidate (from the deep end of the line) inside the box and clear of placed labels. */
function placeLabel(
  candidates: { x: number; y: number }[],
  placed: { x: number; y: number }[],
  box?: { left: number; top: number; right: number; bottom: number },
): { x: number; y: number } | null {
  const order = [...candidates].sort((a, b) => b.x - a.x || a.y - b.y);
  for (const c of order) {
    if (
      box &&
      (c.x - LABEL_W / 2 < box.left ||
        c.x + LABEL_W / 2 > box.right ||
        c.y - LABEL_H < box.top ||
        c.y > box.bottom)
    )
      continue;
    if (placed.some((p) => overlaps(p, c))) continue;
    const at = { x: Math.round(c.x * 10) / 10, y: Math.round(c.y * 10) / 10 };
    placed.push(at);
    return at;
  }
  return null;
}
