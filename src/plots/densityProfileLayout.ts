// Layout of a density-profile chart: depth along the ray across, relative electron density up;
// the CT profile as a line, the slabs drawn over it as shaded blocks (shade by ρ_e, as on the
// slab strip) with their level as a step line, and the isocentre and extra points marked.
// Pure: numbers in, drawables out.
import { scaleLinear, type ScaleLinear } from 'd3-scale';
import { line } from 'd3-shape';
import { innerHeight, innerWidth, ticksOf, type PlotFrame, type Tick } from './depthAxis';
import { densityShade } from './slabLayout';

export interface ProfileSlab {
  thicknessCm: number;
  rhoE: number;
}

export interface DensityProfileLayout {
  x: ScaleLinear<number, number>;
  y: ScaleLinear<number, number>;
  plot: { left: number; top: number; width: number; height: number };
  xTicks: Tick[];
  yTicks: Tick[];
  profilePath: string;
  slabPath: string;
  blocks: { x: number; width: number; y: number; height: number; fill: string }[];
  markers: { id: string; x: number }[];
}

const r1 = (v: number) => Math.round(v * 10) / 10;

export function densityProfileLayout(input: {
  depthCm: ArrayLike<number>;
  rhoE: ArrayLike<number>;
  slabs: readonly ProfileSlab[];
  markers: readonly { id: string; depthCm: number }[];
  frame: PlotFrame;
}): DensityProfileLayout {
  const { frame } = input;
  const left = frame.margin.left;
  const top = frame.margin.top;
  const width = innerWidth(frame);
  const height = innerHeight(frame);
  const slabTotal = input.slabs.reduce((s, l) => s + l.thicknessCm, 0);
  const lastDepth =
    input.depthCm.length > 0 ? (input.depthCm[input.depthCm.length - 1] as number) : 0;
  const x = scaleLinear()
    .domain([0, Math.max(slabTotal, lastDepth, 1)])
    .range([left, left + width]);
  let hi = 1.2;
  for (let i = 0; i < input.rhoE.length; i++) hi = Math.max(hi, input.rhoE[i] as number);
  for (const s of input.slabs) hi = Math.max(hi, s.rhoE);
  const y = scaleLinear()
    .domain([0, hi * 1.05])
    .range([top + height, top])
    .nice(6);
  const idx = Array.from({ length: input.depthCm.length }, (_, i) => i);
  const profilePath =
    line<number>()
      .x((i) => x(input.depthCm[i] as number))
      .y((i) => y(input.rhoE[i] as number))
      .digits(1)(idx) ?? '';
  const blocks: DensityProfileLayout['blocks'] = [];
  const steps: [number, number][] = [];
  let z = 0;
  for (const s of input.slabs) {
    const x0 = x(z);
    z += s.thicknessCm;
    const x1 = x(z);
    const yTop = y(s.rhoE);
    blocks.push({
      x: r1(x0),
      width: r1(x1 - x0),
      y: r1(yTop),
      height: r1(top + height - yTop),
      fill: densityShade(s.rhoE).fill,
    });
    steps.push([x0, yTop], [x1, yTop]);
  }
  const slabPath =
    line<[number, number]>()
      .x((p) => p[0])
      .y((p) => p[1])
      .digits(1)(steps) ?? '';
  return {
    x,
    y,
    plot: { left, top, width, height },
    xTicks: ticksOf(x, Math.max(3, Math.floor(width / 70))),
    yTicks: ticksOf(y, Math.max(3, Math.floor(height / 40))),
    profilePath,
    slabPath,
    blocks,
    markers: input.markers.map((m) => ({ id: m.id, x: r1(x(m.depthCm)) })),
  };
}
