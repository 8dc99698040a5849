// Layout of an x–z dose map drawn with depth across (beam from the left, the same depth axis as
// the slab strip) and lateral position up: scales, ticks, where the raster image goes, the raster
// itself (one pixel per node), layer interfaces and a horizontal colour bar under the map.
import { scaleLinear, type ScaleLinear } from 'd3-scale';
import {
  depthScale,
  depthTicks,
  innerHeight,
  ticksOf,
  type PlotFrame,
  type Tick,
} from './depthAxis';
import type { PlaneGrid } from './planeGrid';

export interface DoseMapLayout {
  x: ScaleLinear<number, number>;
  y: ScaleLinear<number, number>;
  plot: { left: number; top: number; width: number; height: number };
  xTicks: Tick[];
  yTicks: Tick[];
  /** The raster spans half a node spacing beyond the outer nodes (clipped to the plot). */
  image: { x: number; y: number; width: number; height: number };
  interfaces: number[];
}

const round1 = (v: number) => Math.round(v * 10) / 10;

function halfStep(a: readonly number[], end: 'first' | 'last'): number {
  const n = a.length;
  if (n < 2) return 0.5;
  return end === 'first'
    ? ((a[1] as number) - (a[0] as number)) / 2
    : ((a[n - 1] as number) - (a[n - 2] as number)) / 2;
}

export function doseMapLayout(input: {
  grid: PlaneGrid;
  maxDepthCm: number;
  halfWidthCm: number;
  frame: PlotFrame;
  interfacesCm: readonly number[];
}): DoseMapLayout {
  const { grid, frame } = input;
  const x = depthScale(input.maxDepthCm, frame);
  const top = frame.margin.top;
  const height = innerHeight(frame);
  const y = scaleLinear()
    .domain([-input.halfWidthCm, input.halfWidthCm])
    .range([top + height, top]);
  const z0 = (grid.depthCm[0] ?? 0) - halfStep(grid.depthCm, 'first');
  const z1 = (grid.depthCm[grid.depthCm.length - 1] ?? 0) + halfStep(grid.depthCm, 'last');
  const x0 = (grid.xCm[0] ?? 0) - halfStep(grid.xCm, 'first');
  const x1 = (grid.xCm[grid.xCm.length - 1] ?? 0) + halfStep(grid.xCm, 'last');
  const right = x.range()[1] as number;
  return {
    x,
    y,
    plot: { left: frame.margin.left, top, width: round1(right - frame.margin.left), height },
    xTicks: depthTicks(x),
    yTicks: ticksOf(y, Math.max(3, Math.floor(height / 45))),
    image: {
      x: round1(x(z0)),
      y: round1(y(x1)),
      width: round1(x(z1) - x(z0)),
      height: round1(y(x0) - y(x1)),
    },
    interfaces: input.interfacesCm
      .filter((z) => z > 0 && z < input.maxDepthCm)
      .map((z) => round1(x(z))),
  };
}

/**
 * RGBA pixels of the plane, one per node: image columns follow depth, image rows lateral
 * position from +x (top) to −x (bottom). `colour` maps a value to [r, g, b] (0–255).
 */
export function planeRaster(
  grid: PlaneGrid,
  colour: (v: number) => readonly [number, number, number],
): { width: number; height: number; rgba: Uint8ClampedArray<ArrayBuffer> } {
  const width = grid.depthCm.length;
  const height = grid.xCm.length;
  const rgba = new Uint8ClampedArray(width * height * 4);
  for (let iz = 0; iz < width; iz++) {
    const row = grid.values[iz] ?? [];
    for (let ix = 0; ix < height; ix++) {
      const v = row[ix] ?? NaN;
      const o = ((height - 1 - ix) * width + iz) * 4;
      if (!Number.isFinite(v)) continue; // transparent
      const [r, g, b] = colour(v);
      rgba[o] = r;
      rgba[o + 1] = g;
      rgba[o + 2] = b;
      rgba[o + 3] = 255;
    }
  }
  return { width, height, rgba };
}

export interface ColourBar {
  x: number;
  y: number;
  width: number;
  height: number;
  /** Gradient stops (offset 0–1, CSS colour). */
  stops: { offset: number; color: string }[];
  ticks: Tick[];
}

/** A horizontal colour bar for the domain [lo, hi] at (x, y). */
export function colourBar(
  domain: readonly [number, number],
  interpolate: (t: number) => string,
  at: { x: number; y: number; width: number; height: number },
): ColourBar {
  const [lo, hi] = domain;
  const s = scaleLinear()
    .domain([lo, hi])
    .range([at.x, at.x + at.width]);
  const stops = Array.from({ length: 11 }, (_, i) => ({
    offset: i / 10,
    color: interpolate(i / 10),
  }));
  return { ...at, stops, ticks: ticksOf(s, Math.max(2, Math.floor(at.width / 60))) };
}

/** "rgb(r, g, b)" or "#rrggbb" → [r, g, b]. */
export function parseRgb(css: string): [number, number, number] {
  const m = /rgb\((\d+),\s*(\d+),\s*(\d+)\)/.exec(css);
  if (m) return [Number(m[1]), Number(m[2]), Number(m[3])];
  const h = /^#([0-9a-f]{2})([0-9a-f]{2})([0-9a-f]{2})$/i.exec(css);
  if (h) return [parseInt(h[1]!, 16), parseInt(h[2]!, 16), parseInt(h[3]!, 16)];
  return [0, 0, 0];
}
