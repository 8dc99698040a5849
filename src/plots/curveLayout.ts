// Layout of a chart of curves against depth: scales, ticks, one path per series (gaps where a
// value is null), ±1σ bands, warning bands and layer shading. Pure: numbers in, drawables out.
import { scaleLinear, type ScaleLinear } from 'd3-scale';
import { area } from 'd3-shape';
import {
  depthScale,
  depthTicks,
  innerHeight,
  ticksOf,
  type PlotFrame,
  type Tick,
} from './depthAxis';
import { polylinePath } from './polylinePath';

export interface CurveSeries {
  id: string;
  label: string;
  color: string;
  dash: string;
  values: readonly (number | null)[];
  /** One standard deviation at each depth, same units as values. */
  sigma?: readonly number[] | undefined;
}

export interface DepthBand {
  key: string;
  fromCm: number;
  toCm: number;
  severity: string;
}

export interface CurveChartInput {
  depthCm: readonly number[];
  maxDepthCm: number;
  series: readonly CurveSeries[];
  frame: PlotFrame;
  /** Interfaces between layers (cm), drawn as thin rules. */
  interfacesCm?: readonly number[];
  bands?: readonly DepthBand[];
  /** Always include these values in the y domain (e.g. 1 for correction factors). */
  yInclude?: readonly number[];
}

export interface CurveChartLayout {
  x: ScaleLinear<number, number>;
  y: ScaleLinear<number, number>;
  xTicks: Tick[];
  yTicks: Tick[];
  plot: { left: number; top: number; width: number; height: number };
  curves: { id: string; label: string; color: string; dash: string; d: string }[];
  sigmaBands: { id: string; color: string; d: string }[];
  bands: { key: string; severity: string; x: number; width: number }[];
  interfaces: number[];
  /** Series that rise above the top of the axis (spike clipping), with their largest value. */
  clipped: { id: string; label: string; maxValue: number }[];
  /** True when no series has a single finite value. */
  empty: boolean;
}

const isNum = (v: number | null | undefined): v is number =>
  typeof v === 'number' && Number.isFinite(v);
const round1 = (v: number) => Math.round(v * 10) / 10;

export function yDomainOf(
  series: readonly CurveSeries[],
  include: readonly number[] = [],
): [number, number] {
  let lo = Infinity;
  let hi = -Infinity;
  for (const s of series)
    s.values.forEach((v, i) => {
      if (!isNum(v)) return;
      const sd = s.sigma?.[i] ?? 0;
      lo = Math.min(lo, v - sd);
      hi = Math.max(hi, v + sd);
    });
  for (const v of include) {
    lo = Math.min(lo, v);
    hi = Math.max(hi, v);
  }
  if (!Number.isFinite(lo)) return [0, 1];
  if (lo > 0 && lo < 0.5 * hi) lo = 0;
  const pad = (hi - lo || Math.abs(hi) || 1) * 0.05;
  return [lo === 0 ? 0 : lo - pad, hi + pad];
}

/**
 * Upper axis limit that keeps a narrow spike (e.g. a power law evaluated in a build-up region)
 * from flattening every other curve: when the largest value exceeds 1.5 × the largest
 * 95th-percentile of the series, the axis stops at 1.15 × that percentile. Null: no clipping.
 */
export function spikeLimit(series: readonly CurveSeries[]): number | null {
  let typical = -Infinity;
  let max = -Infinity;
  for (const s of series) {
    // A typed array sorts numerically without a comparator callback.
    const v = Float64Array.from(s.values.filter(isNum)).sort();
    if (v.length === 0) continue;
    typical = Math.max(typical, v[Math.floor(0.95 * (v.length - 1))] as number);
    max = Math.max(max, v[v.length - 1] as number);
  }
  if (!(typical > 0) || max <= 1.5 * typical) return null;
  return 1.15 * typical;
}

export function curveChartLayout(input: CurveChartInput): CurveChartLayout {
  const { frame } = input;
  const x = depthScale(input.maxDepthCm, frame);
  const top = frame.margin.top;
  const height = innerHeight(frame);
  const limit = spikeLimit(input.series);
  const [lo, hi] = yDomainOf(input.series, input.yInclude);
  const y = scaleLinear()
    .domain([lo, limit === null ? hi : Math.min(hi, Math.max(limit, ...(input.yInclude ?? [])))])
    .range([top + height, top])
    .nice(6);
  const yTop = y.domain()[1] as number;
  const clipped = input.series
    .map((s) => ({ id: s.id, label: s.label, maxValue: Math.max(...s.values.filter(isNum)) }))
    .filter((c) => c.maxValue > yTop);
  const depth = input.depthCm;
  // One x pixel per depth, shared by every curve.
  const xPx = Float64Array.from(depth, (z) => x(z));
  const curves = input.series.map((s) => ({
    id: s.id,
    label: s.label,
    color: s.color,
    dash: s.dash,
    d: polylinePath(xPx, s.values, y),
  }));
  const sigmaBands = input.series
    .filter((s) => s.sigma && s.sigma.length === depth.length)
    .map((s) => {
      const sigma = s.sigma as readonly number[];
      const gen = area<number>()
        .defined((i) => isNum(s.values[i]) && isNum(sigma[i]))
        .x((i) => x(depth[i] ?? 0))
        .y0((i) => y((s.values[i] ?? 0) - (sigma[i] ?? 0)))
        .y1((i) => y((s.values[i] ?? 0) + (sigma[i] ?? 0)))
        .digits(1);
      return { id: s.id, color: s.color, d: gen(depth.map((_, i) => i)) ?? '' };
    });
  const bands = (input.bands ?? []).map((b) => {
    const x0 = x(Math.max(0, Math.min(b.fromCm, b.toCm)));
    const x1 = x(Math.min(input.maxDepthCm, Math.max(b.fromCm, b.toCm)));
    return { key: b.key, severity: b.severity, x: round1(x0), width: round1(Math.max(2, x1 - x0)) };
  });
  return {
    x,
    y,
    xTicks: depthTicks(x),
    yTicks: ticksOf(y, Math.max(3, Math.floor(height / 50))),
    plot: {
      left: frame.margin.left,
      top,
      width: round1(x.range()[1] as number) - frame.margin.left,
      height,
    },
    curves,
    sigmaBands,
    bands,
    interfaces: (input.interfacesCm ?? []).map((z) => round1(x(z))),
    clipped,
    empty: !input.series.some((s) => s.values.some(isNum)),
  };
}

/** Index of the grid depth nearest to `depthCm` (grid ascending). */
export function nearestIndex(depthCm: readonly number[], target: number): number {
  let lo = 0;
  let hi = depthCm.length - 1;
  if (hi < 0) return -1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if ((depthCm[mid] ?? 0) <= target) lo = mid;
    else hi = mid;
  }
  return Math.abs((depthCm[hi] ?? 0) - target) < Math.abs((depthCm[lo] ?? 0) - target) ? hi : lo;
}
