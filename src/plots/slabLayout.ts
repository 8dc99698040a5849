// Layout of the slab strip: each layer a rectangle to scale along the depth axis, shaded by
// electron density, with a label where it fits and a handle on every movable boundary.
import { depthScale, type PlotFrame } from './depthAxis';

export interface SlabInputLayer {
  key: string;
  label: string;
  thicknessCm: number;
  relativeElectronDensity: number;
}

export interface SlabRect {
  key: string;
  index: number;
  x: number;
  width: number;
  fill: string;
  label: string;
  /** Label shown only when it fits (about 6.5 px per character). */
  showLabel: boolean;
  dark: boolean;
}

export interface SlabHandle {
  /** Boundary index: 1 … layers (0, the surface, does not move). */
  k: number;
  x: number;
  depthCm: number;
}

/** Grey level for a relative electron density: air near white, water light grey, bone dark. */
export function densityShade(rhoE: number): { fill: string; dark: boolean } {
  const r = Math.min(2, Math.max(0, rhoE));
  const level = Math.round(r <= 1 ? 246 - 56 * r : 190 - 75 * (r - 1));
  return { fill: `rgb(${level}, ${level}, ${Math.min(255, level + 8)})`, dark: level < 150 };
}

/**
 * `scaleDepthCm`: a depth the axis must reach at least (the stack's depth when a drag began, so
 * the axis does not rescale under the pointer while the bottom boundary moves).
 */
export function slabLayout(layers: readonly SlabInputLayer[], frame: PlotFrame, scaleDepthCm = 0) {
  const total = layers.reduce((s, l) => s + l.thicknessCm, 0);
  const x = depthScale(Math.max(total, scaleDepthCm), frame);
  const rects: SlabRect[] = [];
  const handles: SlabHandle[] = [];
  let z = 0;
  layers.forEach((l, index) => {
    const x0 = x(z);
    z += l.thicknessCm;
    const x1 = x(z);
    const shade = densityShade(l.relativeElectronDensity);
    const width = Math.round((x1 - x0) * 10) / 10;
    rects.push({
      key: l.key,
      index,
      x: Math.round(x0 * 10) / 10,
      width,
      fill: shade.fill,
      dark: shade.dark,
      label: l.label,
      showLabel: l.label.length * 6.5 + 8 < width,
    });
    handles.push({ k: index + 1, x: Math.round(x1 * 10) / 10, depthCm: Number(z.toFixed(6)) });
  });
  return { x, totalCm: total, rects, handles };
}
