// A chart of curves against depth (thin renderer over curveChartLayout): layer shading, warning
// bands, ±1σ bands, one path per series, points of interest, and a crosshair readout that
// lists every series' value at the hovered depth (pointer or arrow keys).
import { memo, useId, useMemo, useState, type KeyboardEvent, type PointerEvent } from 'react';
import { flushSync } from 'react-dom';
import {
  curveChartLayout,
  nearestIndex,
  type CurveChartLayout,
  type CurveSeries,
  type DepthBand,
} from '../plots/curveLayout';
import { noteChartLayout } from '../state/drawStats';
import { SIDE_MARGIN } from './frame';
import { labelRows } from '../plots/labelRows';
import { ChartLegend, LineSwatch } from './LineSwatch';
import { XTicks, YTicks } from './AxisTicks';

export interface CurveChartProps {
  title: string;
  depthCm: readonly number[];
  maxDepthCm: number;
  series: readonly CurveSeries[];
  axisLabel: string;
  width: number;
  height: number;
  interfacesCm: readonly number[];
  bands?: readonly (DepthBand & { title: string })[];
  points?: readonly { id: string; depthCm: number }[];
  yInclude?: readonly number[];
  digits: number;
  testId?: string;
  /** Depth-axis title; the beam-axis depth when absent. */
  xLabel?: string;
  /** Extra words about a depth for the readout (layer, radiological depth). */
  describeDepth?: (depthCm: number) => string;
  /** Draw a legend under the chart (for charts without the method legend). */
  legend?: boolean;
  /** Series drawn from an earlier calculation while a newer one runs: dimmed, with a label. */
  updatingIds?: readonly string[];
}

/** What a layout draws, for the redraw counters (src/state/drawStats). */
function layoutSignature(l: CurveChartLayout, width: number, height: number): string {
  const bands = l.bands.map((b) => `${b.key}:${b.x}:${b.width}`).join(',');
  const curves = l.curves.map((c) => `${c.id}:${c.color}:${c.dash}:${c.d}`).join('|');
  return `${width}x${height};${l.y.domain().join(',')};${l.interfaces.join(',')};${bands};${curves}`;
}

// Memoised, and the layout (scales, ticks, one path string per curve) kept until its inputs
// change: a hover readout, a legend or status change elsewhere redraws no curve.
export const CurveChart = memo(function CurveChart(props: CurveChartProps) {
  const { depthCm, maxDepthCm, series, width, height, interfacesCm, bands, yInclude } = props;
  const testId = props.testId;
  const layout = useMemo(() => {
    const l = curveChartLayout({
      depthCm,
      maxDepthCm,
      series,
      frame: { width, height, margin: { ...SIDE_MARGIN, top: 12, bottom: 40 } },
      interfacesCm,
      bands,
      yInclude,
    });
    if (testId) noteChartLayout(testId, () => layoutSignature(l, width, height));
    return l;
  }, [testId, depthCm, maxDepthCm, series, width, height, interfacesCm, bands, yInclude]);
  const [hover, setHover] = useState<number | null>(null);
  const clipId = `clip-${useId().replace(/[^A-Za-z0-9_-]/g, '')}`;
  const { plot } = layout;
  const bottom = plot.top + plot.height;
  const right = plot.left + plot.width;
  const onMove = (e: PointerEvent<SVGRectElement>) => {
    const box = e.currentTarget.ownerSVGElement?.getBoundingClientRect();
    const z = layout.x.invert(e.clientX - (box?.left ?? 0));
    // Synchronously: the crosshair is drawn in the frame of the pointer move, not the next one.
    flushSync(() => setHover(nearestIndex(props.depthCm, z)));
  };
  const onKey = (e: KeyboardEvent<SVGSVGElement>) => {
    const n = props.depthCm.length;
    if (n === 0) return;
    const step = e.shiftKey ? 20 : 2;
    if (e.key === 'ArrowRight') setHover((h) => Math.min(n - 1, (h ?? -step) + step));
    else if (e.key === 'ArrowLeft') setHover((h) => Math.max(0, (h ?? n) - step));
    else if (e.key === 'Escape') setHover(null);
    else return;
    e.preventDefault();
  };
  const hz = hover === null ? null : props.depthCm[hover];
  const hx = hz === undefined || hz === null ? null : layout.x(hz);
  const bandTitle = new Map((props.bands ?? []).map((b) => [b.key, b.title]));
  const updating = new Set(props.updatingIds ?? []);
  const updatingLabels = props.series.filter((s) => updating.has(s.id)).map((s) => s.label);
  return (
    <figure className="chart" data-testid={props.testId} data-samples={props.depthCm.length}>
      <figcaption className="sr-only">{props.title}</figcaption>
      <svg
        width={props.width}
        height={props.height}
        tabIndex={0}
        role="img"
        aria-label={`${props.title}. Arrow keys move the readout.`}
        onKeyDown={onKey}
        onBlur={() => setHover(null)}
      >
        {layout.bands.map((b) => (
          <rect
            key={b.key}
            x={b.x}
            y={plot.top}
            width={b.width}
            height={plot.height}
            className={`warn-band sev-${b.severity}`}
            tabIndex={0}
            aria-label={bandTitle.get(b.key)}
          >
            <title>{bandTitle.get(b.key)}</title>
          </rect>
        ))}
        <YTicks ticks={layout.yTicks} leftPx={plot.left} gridRightPx={right} />
        <XTicks ticks={layout.xTicks} bottomPx={bottom} />
        {layout.interfaces.map((x, i) => (
          <line key={`i${i}`} x1={x} x2={x} y1={plot.top} y2={bottom} className="interface" />
        ))}
        <line x1={plot.left} x2={right} y1={bottom} y2={bottom} className="axis-line" />
        <line x1={plot.left} x2={plot.left} y1={plot.top} y2={bottom} className="axis-line" />
        <text
          x={(plot.left + right) / 2}
          y={props.height - 4}
          textAnchor="middle"
          className="axis-label"
        >
          {props.xLabel ?? 'Depth along the beam axis (cm)'}
        </text>
        <text
          transform={`translate(14 ${plot.top + plot.height / 2}) rotate(-90)`}
          textAnchor="middle"
          className="axis-label"
        >
          {props.axisLabel}
        </text>
        <clipPath id={clipId}>
          <rect x={plot.left} y={plot.top - 1} width={plot.width} height={plot.height + 2} />
        </clipPath>
        <g clipPath={`url(#${clipId})`}>
          {layout.sigmaBands.map((b) => (
            <path key={`s${b.id}`} d={b.d} fill={b.color} className="sigma-band" />
          ))}
          {layout.curves.map((c) => (
            <path
              key={c.id}
              d={c.d}
              stroke={c.color}
              strokeDasharray={c.dash || undefined}
              className={updating.has(c.id) ? 'curve updating' : 'curve'}
              data-method={c.id}
            />
          ))}
        </g>
        {labelRows(
          props.points ?? [],
          (p) => layout.x(Math.min(p.depthCm, props.maxDepthCm)),
          (p) => p.id,
        ).map(({ item: p, x, row }) => (
          <g key={p.id} className="poi">
            <line x1={x} x2={x} y1={plot.top} y2={bottom} />
            <text x={x + 3} y={plot.top + 10 + 12 * row} className="poi-label">
              {p.id}
            </text>
          </g>
        ))}
        {hx !== null ? (
          <line x1={hx} x2={hx} y1={plot.top} y2={bottom} className="crosshair" />
        ) : null}
        <rect
          x={plot.left}
          y={plot.top}
          width={plot.width}
          height={plot.height}
          className="hit"
          onPointerMove={onMove}
          onPointerLeave={() => setHover(null)}
        />
        {updatingLabels.length > 0 ? (
          <text
            x={right - 4}
            y={bottom - 6}
            textAnchor="end"
            className="updating-note"
            data-testid="updating-note"
          >
            {`updating… (${updatingLabels.join(', ')})`}
          </text>
        ) : null}
        {layout.empty ? (
          <text
            x={(plot.left + right) / 2}
            y={plot.top + plot.height / 2}
            textAnchor="middle"
            className="empty-note"
          >
            No values to plot
          </text>
        ) : null}
      </svg>
      {layout.clipped.length ? (
        <p className="clip-note" data-testid="clip-note">
          Axis cut at {layout.y.domain()[1]} to keep the other curves readable; above it:{' '}
          {layout.clipped
            .map((c) => `${c.label} (up to ${c.maxValue.toFixed(props.digits)})`)
            .join(', ')}
          .
        </p>
      ) : null}
      {props.legend ? <ChartLegend series={props.series} /> : null}
      {hover !== null && hx !== null && hz !== undefined && hz !== null ? (
        <div
          className="readout"
          role="status"
          style={
            hx > plot.left + plot.width / 2 ? { right: props.width - hx + 10 } : { left: hx + 10 }
          }
        >
          <div className="readout-depth">
            depth {hz.toFixed(2)} cm{props.describeDepth ? ` · ${props.describeDepth(hz)}` : ''}
          </div>
          {props.series.map((s) => {
            const v = s.values[hover];
            const sd = s.sigma?.[hover];
            return (
              <div key={s.id} className="readout-row">
                <LineSwatch color={s.color} dash={s.dash} widthPx={22} heightPx={8} />
                <span>{s.label}</span>
                <span className="num">
                  {v === null || v === undefined || !Number.isFinite(v)
                    ? '—'
                    : v.toFixed(props.digits)}
                  {sd !== undefined && v !== null && v !== undefined
                    ? ` ± ${sd.toFixed(props.digits)}`
                    : ''}
                </span>
              </div>
            );
          })}
        </div>
      ) : null}
    </figure>
  );
});
