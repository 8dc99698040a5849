// Lateral dose profiles at one depth, every method with a plane overlaid (thin renderer over
// profileLayout), with a legend.
import { profileLayout, type ProfileSeries } from '../../plots/profileLayout';
import { SIDE_MARGIN } from '../frame';

export function ProfileChart(props: {
  title: string;
  series: readonly ProfileSeries[];
  halfWidthCm: number;
  width: number;
  height: number;
  yLabel: string;
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
  return (
    <figure className="chart" data-testid="plane-profile">
      <figcaption className="sr-only">{props.title}</figcaption>
      <svg width={props.width} height={props.height} role="img" aria-label={props.title}>
        {layout.yTicks.map((t) => (
          <g key={`y${t.value}`}>
            <line x1={plot.left} x2={right} y1={t.px} y2={t.px} className="grid" />
            <text x={plot.left - 6} y={t.px + 4} textAnchor="end" className="tick-label">
              {t.label}
            </text>
          </g>
        ))}
        {layout.xTicks.map((t) => (
          <g key={`x${t.value}`}>
            <line x1={t.px} x2={t.px} y1={bottom} y2={bottom + 5} className="axis-line" />
            <text x={t.px} y={bottom + 18} textAnchor="middle" className="tick-label">
              {t.label}
            </text>
          </g>
        ))}
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
      <div className="chart-legend">
        {props.series.map((s) => (
          <span key={s.id}>
            <svg width="26" height="10" aria-hidden="true">
              <line
                x1="0"
                x2="26"
                y1="5"
                y2="5"
                stroke={s.color}
                strokeWidth="2"
                strokeDasharray={s.dash || undefined}
              />
            </svg>
            {s.label}
          </span>
        ))}
      </div>
    </figure>
  );
}
