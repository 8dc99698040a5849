// The density profile along one beam's central ray with the slabs drawn over it (thin renderer
// over densityProfileLayout).
import { densityProfileLayout, type ProfileSlab } from '../../plots/densityProfileLayout';
import { XTicks, YTicks } from '../AxisTicks';
import { SIDE_MARGIN } from '../frame';

export function DensityProfileChart(props: {
  title: string;
  depthCm: ArrayLike<number>;
  rhoE: ArrayLike<number>;
  slabs: readonly ProfileSlab[];
  markers: readonly { id: string; depthCm: number }[];
  width: number;
  testId: string;
}) {
  const height = 230;
  const frame = { width: props.width, height, margin: { ...SIDE_MARGIN, top: 22, bottom: 40 } };
  const l = densityProfileLayout({ ...props, frame });
  const bottom = l.plot.top + l.plot.height;
  const right = l.plot.left + l.plot.width;
  return (
    <figure className="chart density-profile" data-testid={props.testId}>
      <figcaption className="sr-only">{props.title}</figcaption>
      <svg width={props.width} height={height} role="img" aria-label={props.title}>
        {l.blocks.map((b, i) => (
          <rect
            key={i}
            x={b.x}
            y={b.y}
            width={b.width}
            height={b.height}
            fill={b.fill}
            className="profile-slab"
          />
        ))}
        <YTicks ticks={l.yTicks} leftPx={l.plot.left} gridRightPx={right} />
        <XTicks ticks={l.xTicks} bottomPx={bottom} />
        <line x1={l.plot.left} x2={right} y1={bottom} y2={bottom} className="axis-line" />
        <line x1={l.plot.left} x2={l.plot.left} y1={l.plot.top} y2={bottom} className="axis-line" />
        <path d={l.profilePath} className="profile-ct" />
        <path d={l.slabPath} className="profile-slab-level" />
        {l.markers.map((m) => (
          <g key={m.id}>
            <line x1={m.x} x2={m.x} y1={l.plot.top} y2={bottom} className="profile-marker" />
            <text x={m.x} y={l.plot.top - 6} textAnchor="middle" className="tick-label">
              {m.id}
            </text>
          </g>
        ))}
        <text
          x={(l.plot.left + right) / 2}
          y={height - 4}
          textAnchor="middle"
          className="axis-label"
        >
          Depth along the ray from the skin (cm)
        </text>
        <text
          transform={`translate(14 ${l.plot.top + l.plot.height / 2}) rotate(-90)`}
          textAnchor="middle"
          className="axis-label"
        >
          ρe (relative)
        </text>
      </svg>
      <p className="profile-legend">
        <span className="swatch-line ct" /> CT profile through the calibration{' '}
        <span className="swatch-line slab" /> slabs used (shaded by ρe)
      </p>
    </figure>
  );
}
