// Lateral dose profiles at one depth, every method with a plane overlaid (thin renderer over
// profileLayout), with a legend and a readout of every method's value under the pointer.
import { useState, type PointerEvent } from 'react';
import { cellOf } from '../../plots/planeGrid';
import { profileLayout, type ProfileSeries } from '../../plots/profileLayout';
import { SIDE_MARGIN } from '../frame';
import { ChartLegend, LineSwatch } from '../LineSwatch';
import { XTicks, YTicks } from '../AxisTicks';

export function ProfileChart(props: {
  title: string;
  series: readonly ProfileSeries[];
  halfWidthCm: number;
  width: number;
  height: number;
  yLabel: string;
  digits: number;
}) {
  const frame = {
    width: props.width,
    height: props.height,
    margin: { ...SIDE_MARGIN, top: 12, bottom: 40 },
  };
  const layout = profileLayout({ series: props.series, halfWidthCm: props.halfWidthCm, frame });
  const { plot } = layout;
  const bottom = plot.top + plot.height;
  const right = plot.left + plot.width;
  const [hoverX, setHoverX] = useState<number | null>(null);
  const onMove = (e: PointerEvent<SVGRectElement>) => {
    const box = e.currentTarget.ownerSVGElement?.getBoundingClientRect();
    setHoverX(layout.x.invert(e.clientX - (box?.left ?? 0)));
  };
  const valueAt = (xs: readonly number[], vs: readonly number[], x: number): number => {
    if (xs.length < 2 || x < (xs[0] ?? 0) || x > (xs[xs.length - 1] ?? 0)) return NaN;
    const { i, t } = cellOf(xs, x);
    const a = vs[i] ?? NaN;
    const b = vs[i + 1] ?? NaN;
    return a + (b - a) * t;
  };
  const hx = hoverX === null ? null : Math.round(layout.x(hoverX) * 10) / 10;
  return (
    <figure className="chart" data-testid="plane-profile">
      <figcaption className="sr-only">{props.title}</figcaption>
      <svg width={props.width} height={props.height} role="img" aria-label={props.title}>
        <YTicks ticks={layout.yTicks} leftPx={plot.left} gridRightPx={right} />
        <XTicks ticks={layout.xTicks} bottomPx={bottom} />
        <line x1={plot.left} x2={right} y1={bottom} y2={bottom} className="axis-line" />
        <line x1={plot.left} x2={plot.left} y1={plot.top} y2={bottom} className="axis-line" />
        <text
          x={(plot.left + right) / 2}
          y={props.height - 4}
          textAnchor="middle"
          className="axis-label"
        >
          Lateral x (cm)
        </text>
        <text
          transform={`translate(14 ${plot.top + plot.height / 2}) rotate(-90)`}
          textAnchor="middle"
          className="axis-label"
        >
          {props.yLabel}
        </text>
        {layout.curves.map((c) => (
          <path
            key={c.id}
            d={c.d}
            stroke={c.color}
            strokeDasharray={c.dash || undefined}
            className="curve"
            data-method={c.id}
          />
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
          onPointerLeave={() => setHoverX(null)}
        />
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
      {hoverX !== null && hx !== null ? (
        <div
          className="readout"
          role="status"
          data-testid="plane-profile-readout"
          style={
            hx > plot.left + plot.width / 2 ? { right: props.width - hx + 10 } : { left: hx + 10 }
          }
        >
          <div className="readout-depth">x {hoverX.toFixed(2)} cm</div>
          {props.series.map((s) => {
            const v = valueAt(s.xCm, s.values, hoverX);
            return (
              <div key={s.id} className="readout-row">
                <LineSwatch color={s.color} dash={s.dash} widthPx={22} heightPx={8} />
                <span>{s.label}</span>
                <span className="num">{Number.isFinite(v) ? v.toFixed(props.digits) : '—'}</span>
              </div>
            );
          })}
        </div>
      ) : null}
      <ChartLegend series={props.series} />
    </figure>
  );
}
