// The depth axis shared by the slab strip and the charts: the same scale and ticks everywhere,
// so an interface on the strip sits exactly above the same depth on every chart.
import { scaleLinear, type ScaleLinear } from 'd3-scale';

export interface PlotFrame {
  width: number;
  height: number;
  margin: { top: number; right: number; bottom: number; left: number };
}

export interface Tick {
  value: number;
  px: number;
  label: string;
}

export function innerWidth(f: PlotFrame): number {
  return Math.max(10, f.width - f.margin.left - f.margin.right);
}

export function innerHeight(f: PlotFrame): number {
  return Math.max(10, f.height - f.margin.top - f.margin.bottom);
}

export function depthScale(maxDepthCm: number, frame: PlotFrame): ScaleLinear<number, number> {
  return scaleLinear()
    .domain([0, Math.max(maxDepthCm, 1e-6)])
    .range([frame.margin.left, frame.margin.left + innerWidth(frame)]);
}

const round1 = (v: number) => Math.round(v * 10) / 10;

/** Ticks with labels that carry as many decimals as the step needs. */
export function ticksOf(scale: ScaleLinear<number, number>, count: number): Tick[] {
  const format = scale.tickFormat(count);
  return scale
    .ticks(count)
    .map((value) => ({ value, px: round1(scale(value)), label: format(value) }));
}

/** About one tick per 70 px of depth axis. */
export function depthTicks(scale: ScaleLinear<number, number>): Tick[] {
  const [a, b] = scale.range() as [number, number];
  return ticksOf(scale, Math.max(2, Math.floor(Math.abs(b - a) / 70)));
}
