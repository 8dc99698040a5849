// A dose plane drawn as a colour map (thin renderer over doseMapLayout): the raster, layer
// interfaces across, optional isodose lines with their labels, axes in cm, a marker at the
// profile depth (a click on the map moves it) and a horizontal colour bar underneath.
import { useId, useMemo, useState, type PointerEvent } from 'react';
import { colourBar, doseMapLayout, parseRgb, planeRaster } from '../../plots/doseMapLayout';
import { indexMapper, isodoseLines } from '../../plots/isodose';
import { bilinearAt, type PlaneGrid } from '../../plots/planeGrid';
import { SIDE_MARGIN } from '../frame';
import { XTicks, YTicks } from '../AxisTicks';

export interface PlaneMapProps {
  title: string;
  testId: string;
  grid: PlaneGrid;
  width: number;
  height: number;
  maxDepthCm: number;
  halfWidthCm: number;
  interfacesCm: readonly number[];
  /** Colour of t in [0, 1] (CSS colour) and the value range mapped onto it. */
  interpolate: (t: number) => string;
  domain: readonly [number, number];
  /** Colour-bar domain and title in the displayed unit. */
  bar: { domain: readonly [number, number]; label: string };
  isodose?: { normDose: number; percents: readonly number[] };
  markerDepthCm?: number;
  onPickDepth?: (depthCm: number) => void;
  /** Points of interest, marked on the central axis. */
  points?: readonly { id: string; depthCm: number }[];
  /** Readout of a value under the pointer, e.g. "0.812 cGy/MU". */
  formatValue: (v: number) => string;
}

const BAR_H = 10;
const BAR_BLOCK = 44;

function rasterUrl(grid: PlaneGrid, interpolate: (t: number) => string, lo: number, hi: number) {
  if (typeof document === 'undefined') return '';
  const lut = Array.from({ length: 256 }, (_, i) => parseRgb(interpolate(i / 255)));
  const span = hi - lo || 1;
  const r = planeRaster(grid, (v) => {
    const k = Math.round(((Math.min(hi, Math.max(lo, v)) - lo) / span) * 255);
    return lut[k] ?? [0, 0, 0];
  });
  const canvas = document.createElement('canvas');
  canvas.width = r.width;
  canvas.height = r.height;
  const ctx = canvas.getContext('2d');
  if (!ctx) return '';
  ctx.putImageData(new ImageData(r.rgba, r.width, r.height), 0, 0);
  return canvas.toDataURL('image/png');
}

export function PlaneMap(props: PlaneMapProps) {
  const clipId = useId().replace(/:/g, '');
  const frame = {
    width: props.width,
    height: props.height,
    margin: { ...SIDE_MARGIN, top: 10, bottom: 40 + BAR_BLOCK },
  };
  const layout = doseMapLayout({
    grid: props.grid,
    maxDepthCm: props.maxDepthCm,
    halfWidthCm: props.halfWidthCm,
    frame,
    interfacesCm: props.interfacesCm,
  });
  const [lo, hi] = props.domain;
  const url = useMemo(
    () => rasterUrl(props.grid, props.interpolate, lo, hi),
    [props.grid, props.interpolate, lo, hi],
  );
  const { plot } = layout;
  const bottom = plot.top + plot.height;
  const right = plot.left + plot.width;
  const lines = useMemo(
    () =>
      props.isodose
        ? isodoseLines(
            props.grid,
            props.isodose.normDose,
            props.isodose.percents,
            indexMapper(props.grid, (x, z) => [layout.x(z), layout.y(x)]),
            { left: plot.left, top: plot.top, right, bottom },
          )
        : [],
    // layout scales follow width/height/extent, listed below
    // eslint-disable-next-line react-hooks/exhaustive-deps
    [props.grid, props.isodose, props.width, props.height, props.maxDepthCm, props.halfWidthCm],
  );
  const bar = colourBar(props.bar.domain, props.interpolate, {
    x: plot.left,
    y: bottom + 40,
    width: Math.min(320, plot.width),
    height: BAR_H,
  });
  const [hover, setHover] = useState<{ x: number; z: number } | null>(null);
  const onMove = (e: PointerEvent<SVGRectElement>) => {
    const box = e.currentTarget.ownerSVGElement?.getBoundingClientRect();
    setHover({
      z: layout.x.invert(e.clientX - (box?.left ?? 0)),
      x: layout.y.invert(e.clientY - (box?.top ?? 0)),
    });
  };
  const g = props.grid;
  const inside =
    hover !== null &&
    hover.z >= (g.depthCm[0] ?? 0) &&
    hover.z <= (g.depthCm[g.depthCm.length - 1] ?? 0) &&
    hover.x >= (g.xCm[0] ?? 0) &&
    hover.x <= (g.xCm[g.xCm.length - 1] ?? 0);
  const hoverValue = inside ? bilinearAt(g, hover.x, hover.z) : NaN;
  const onClick = (e: PointerEvent<SVGRectElement>) => {
    if (!props.onPickDepth) return;
    const box = e.currentTarget.ownerSVGElement?.getBoundingClientRect();
    const z = layout.x.invert(e.clientX - (box?.left ?? 0));
    props.onPickDepth(Math.max(0, Math.min(props.maxDepthCm, z)));
  };
  const marker =
    props.markerDepthCm !== undefined ? Math.round(layout.x(props.markerDepthCm) * 10) / 10 : null;
  return (
    <figure className="chart plane-map" data-testid={props.testId}>
      <figcaption className="sr-only">{props.title}</figcaption>
      <svg width={props.width} height={props.height} role="img" aria-label={props.title}>
        <defs>
          <clipPath id={`clip-${clipId}`}>
            <rect x={plot.left} y={plot.top} width={plot.width} height={plot.height} />
          </clipPath>
          <linearGradient id={`bar-${clipId}`} x1="0" x2="1" y1="0" y2="0">
            {bar.stops.map((s) => (
              <stop key={s.offset} offset={s.offset} stopColor={s.color} />
            ))}
          </linearGradient>
        </defs>
        <rect
          x={plot.left}
          y={plot.top}
          width={plot.width}
          height={plot.height}
          className="plane-nodata"
        >
          <title>No dose values here</title>
        </rect>
        <g clipPath={`url(#clip-${clipId})`}>
          <image
            href={url}
            x={layout.image.x}
            y={layout.image.y}
            width={layout.image.width}
            height={layout.image.height}
            preserveAspectRatio="none"
            data-testid={`${props.testId}-raster`}
          />
          {layout.interfaces.map((x, i) => (
            <line
              key={`i${i}`}
              x1={x}
              x2={x}
              y1={plot.top}
              y2={bottom}
              className="plane-interface"
            />
          ))}
          {lines.map((l) => (
            <g key={l.percent} className="isodose" data-level={l.percent}>
              <path d={l.d} className="isodose-halo" />
              <path d={l.d} className="isodose-line" />
            </g>
          ))}
          {marker !== null ? (
            <line x1={marker} x2={marker} y1={plot.top} y2={bottom} className="profile-marker" />
          ) : null}
        </g>
        {lines.map((l) =>
          l.label ? (
            <text
              key={`t${l.percent}`}
              x={l.label.x}
              y={l.label.y - 3}
              textAnchor="middle"
              className="isodose-label"
            >
              {`${l.percent}%`}
            </text>
          ) : null,
        )}
        {(props.points ?? []).map((p) => {
          const px = Math.round(layout.x(Math.min(p.depthCm, props.maxDepthCm)) * 10) / 10;
          const py = Math.round(layout.y(0) * 10) / 10;
          return (
            <g key={p.id} className="plane-poi" pointerEvents="none">
              <path d={`M${px},${py} l-4,-7 h8 z`} />
              <title>{p.id}</title>
            </g>
          );
        })}
        <YTicks ticks={layout.yTicks} leftPx={plot.left} />
        <XTicks ticks={layout.xTicks} bottomPx={bottom} />
        <rect
          x={plot.left}
          y={plot.top}
          width={plot.width}
          height={plot.height}
          className="plane-frame"
          onClick={onClick}
          onPointerMove={onMove}
          onPointerLeave={() => setHover(null)}
        >
          {props.onPickDepth ? (
            <title>Click to show the lateral profile at this depth</title>
          ) : null}
        </rect>
        <text
          x={(plot.left + right) / 2}
          y={bottom + 33}
          textAnchor="middle"
          className="axis-label"
        >
          Depth along the beam axis (cm)
        </text>
        <text
          transform={`translate(14 ${plot.top + plot.height / 2}) rotate(-90)`}
          textAnchor="middle"
          className="axis-label"
        >
          Lateral x (cm)
        </text>
        <g className="colour-bar" data-testid={`${props.testId}-bar`}>
          <rect
            x={bar.x}
            y={bar.y}
            width={bar.width}
            height={bar.height}
            fill={`url(#bar-${clipId})`}
          />
          {bar.ticks.map((t) => (
            <g key={`b${t.value}`}>
              <line
                x1={t.px}
                x2={t.px}
                y1={bar.y + bar.height}
                y2={bar.y + bar.height + 4}
                className="axis-line"
              />
              <text x={t.px} y={bar.y + bar.height + 15} textAnchor="middle" className="tick-label">
                {t.label}
              </text>
            </g>
          ))}
          <text x={bar.x + bar.width + 10} y={bar.y + bar.height} className="axis-label">
            {props.bar.label}
          </text>
        </g>
      </svg>
      <div className="plane-readout" aria-live="off" data-testid={`${props.testId}-readout`}>
        {inside && Number.isFinite(hoverValue)
          ? `depth ${hover.z.toFixed(2)} cm, x ${hover.x.toFixed(2)} cm: ${props.formatValue(hoverValue)}`
          : '\u00a0'}
      </div>
    </figure>
  );
}
