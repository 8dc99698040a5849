// Layout of a lateral dose profile chart: lateral position across, dose up, one path per method
// (each on its own lateral nodes), with ticks on both axes. Pure: numbers in, drawables out.
import { scaleLinear, type ScaleLinear } from 'd3-scale';
import { line } from 'd3-shape';
import { innerHeight, innerWidth, ticksOf, type PlotFrame, type Tick } from './depthAxis';

export interface ProfileSeries {
  id: string;
  label: string;
  color: string;
  dash: string;
  xCm: readonly number[];
  values: readonly number[];
}

export interface ProfileLayout {
  x: ScaleLinear<number, number>;
  y: ScaleLinear<number, number>;
  plot: { left: number; top: number; width: number; height: number };
  xTicks: Tick[];
  yTicks: Tick[];
  curves: { id: string; color: string; dash: string; d: string }[];
  empty: boolean;
}

export function profileLayout(input: {
  series: readonly ProfileSeries[];
  halfWidthCm: number;
  frame: PlotFrame;
}): ProfileLayout {
  const { frame } = input;
  const left = frame.margin.left;
  const top = frame.margin.top;
  const width = innerWidth(frame);
  const height = innerHeight(frame);
  const x = scaleLinear()
    .domain([-input.halfWidthCm, input.halfWidthCm])
    .range([left, left + width]);
  let hi = 0;
  for (const s of input.series) for (const v of s.values) if (Number.isFinite(v) && v > hi) hi = v;
  const y = scaleLinear()
    .domain([0, hi > 0 ? hi * 1.05 : 1])
    .range([top + height, top])
    .nice(6);
  const curves = input.series.map((s) => {
    const gen = line<number>()
      .defined(
        (i) => Number.isFinite(s.values[i]) && Math.abs(s.xCm[i] ?? Infinity) <= input.halfWidthCm,
      )
      .x((i) => x(s.xCm[i] ?? 0))
      .y((i) => y(s.values[i] ?? 0))
      .digits(1);
    return { id: s.id, color: s.color, dash: s.dash, d: gen(s.xCm.map((_, i) => i)) ?? '' };
  });
  return {
    x,
    y,
    plot: { left, top, width, height },
    xTicks: ticksOf(x, Math.max(3, Math.floor(width / 70))),
    yTicks: ticksOf(y, Math.max(3, Math.floor(height / 45))),
    curves,
    empty: !curves.some((c) => c.d.length > 0),
  };
}
