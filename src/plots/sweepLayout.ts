// Layout of a CF sweep chart: the CF of each method against the swept quantity, one panel per
// beam energy (shared scales, so panels compare at a glance), a gap where a method gives no
// value, and a marker at each computed value (sweeps are coarse). Pure: numbers in, drawables out.
import { scaleLinear } from 'd3-scale';
import { line } from 'd3-shape';
import { innerHeight, innerWidth, ticksOf, type PlotFrame, type Tick } from './depthAxis';

export interface SweepLine {
  id: string;
  label: string;
  color: string;
  dash: string;
  /** CF at each x (NaN: no value). */
  values: ArrayLike<number>;
}

export interface SweepPanelInput {
  title: string;
  lines: SweepLine[];
}

export interface SweepChartInput {
  x: ArrayLike<number>;
  panels: SweepPanelInput[];
  /** Width of the chart and height of one panel (px), with the panel's margins. */
  frame: PlotFrame;
  /** Labels for the x ticks at the data (energy sweep), instead of numeric ticks. */
  xNames?: readonly string[];
}

export interface SweepPanelLayout {
  title: string;
  /** Offset of the panel from the chart's top (px). */
  top: number;
  curves: {
    id: string;
    label: string;
    color: string;
    dash: string;
    d: string;
    dots: [number, number][];
  }[];
  yTicks: Tick[];
}

export interface SweepChartLayout {
  width: number;
  height: number;
  plot: { left: number; top: number; width: number; height: number };
  xTicks: Tick[];
  panels: SweepPanelLayout[];
  /** No panel has a single finite value. */
  empty: boolean;
}

const round1 = (v: number) => Math.round(v * 10) / 10;
const finite = (v: number | undefined): v is number => v !== undefined && Number.isFinite(v);

export function sweepChartLayout(input: SweepChartInput): SweepChartLayout {
  const { frame } = input;
  const xs = Array.from(input.x);
  const all = input.panels
    .flatMap((p) => p.lines.flatMap((l) => Array.from(l.values)))
    .filter(finite);
  const xLo = Math.min(...xs);
  const xHi = Math.max(...xs);
  const x = scaleLinear()
    .domain(xLo === xHi ? [xLo - 1, xHi + 1] : [xLo, xHi])
    .range([frame.margin.left, frame.margin.left + innerWidth(frame)]);
  const yLo = all.length ? Math.min(1, ...all) : 0.9;
  const yHi = all.length ? Math.max(1, ...all) : 1.1;
  const pad = Math.max(0.01, 0.05 * (yHi - yLo));
  const height = innerHeight(frame);
  const y = scaleLinear()
    .domain([yLo - pad, yHi + pad])
    .range([frame.margin.top + height, frame.margin.top])
    .nice(5);
  const xTicks = input.xNames
    ? xs.map((v, i) => ({ value: v, px: round1(x(v)), label: input.xNames?.[i] ?? String(v) }))
    : ticksOf(x, Math.max(2, Math.floor(innerWidth(frame) / 80)));
  const panels = input.panels.map((p, k) => ({
    title: p.title,
    top: k * frame.height,
    yTicks: ticksOf(y, Math.max(3, Math.floor(height / 45))),
    curves: p.lines.map((l) => {
      const gen = line<number>()
        .defined((i) => finite(l.values[i]))
        .x((i) => x(xs[i] as number))
        .y((i) => y(l.values[i] as number))
        .digits(1);
      const index = xs.map((_, i) => i);
      return {
        id: l.id,
        label: l.label,
        color: l.color,
        dash: l.dash,
        d: gen(index) ?? '',
        dots: index
          .filter((i) => finite(l.values[i]))
          .map(
            (i) =>
              [round1(x(xs[i] as number)), round1(y(l.values[i] as number))] as [number, number],
          ),
      };
    }),
  }));
  return {
    width: frame.width,
    height: frame.height * input.panels.length,
    plot: { left: frame.margin.left, top: frame.margin.top, width: innerWidth(frame), height },
    xTicks,
    panels,
    empty: all.length === 0,
  };
}
