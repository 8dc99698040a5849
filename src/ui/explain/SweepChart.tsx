// The sweep chart: a thin renderer of sweepChartLayout (src/plots/sweepLayout.ts), one panel per
// energy with the method styles of the other charts, axis titles with units, and a legend.
import { useMemo } from 'react';
import type { SweepResult } from '../../contract/explain';
import { seriesStyles } from '../../plots/palette';
import { sweepChartLayout } from '../../plots/sweepLayout';
import { XTicks, YTicks } from '../AxisTicks';

const ENERGY_TITLES: Record<string, string> = { each: '' };

export function SweepChart({ result, width }: { result: SweepResult; width: number }) {
  const layout = useMemo(() => {
    const ids = [...new Set(result.series.map((s) => s.methodId))];
    const styles = seriesStyles(ids);
    const energies = [...new Set(result.series.map((s) => s.energy))];
    return {
      styles,
      ids,
      layout: sweepChartLayout({
        x: result.x,
        ...(result.xNames ? { xNames: result.xNames } : {}),
        frame: {
          width: Math.max(320, width),
          height: 230,
          margin: { top: 22, right: 16, bottom: 44, left: 58 },
        },
        panels: energies.map((e) => ({
          title: ENERGY_TITLES[e] ?? e.replace('MV', ' MV'),
          lines: result.series
            .filter((s) => s.energy === e)
            .map((s) => ({
              id: s.methodId,
              label: s.label,
              color: styles.get(s.methodId)?.color ?? 'currentColor',
              dash: styles.get(s.methodId)?.dash ?? '',
              values: s.cf,
            })),
        })),
      }),
    };
  }, [result, width]);
  const { layout: l, styles, ids } = layout;
  const labels = new Map(result.series.map((s) => [s.methodId, s.label]));
  const bottom = l.plot.top + l.plot.height;
  return (
    <figure className="sweep-figure">
      <svg
        width={l.width}
        height={l.height}
        role="img"
        aria-label={`CF against ${result.xLabel}; ${result.conditions}`}
        data-testid="sweep-chart"
        className="chart"
      >
        {l.panels.map((p) => (
          <g key={p.title} transform={`translate(0 ${p.top})`}>
            <YTicks
              ticks={p.yTicks}
              leftPx={l.plot.left}
              gridRightPx={l.plot.left + l.plot.width}
            />
            <XTicks ticks={l.xTicks} bottomPx={bottom} />
            <line
              x1={l.plot.left}
              x2={l.plot.left}
              y1={l.plot.top}
              y2={bottom}
              className="axis-line"
            />
            <line
              x1={l.plot.left}
              x2={l.plot.left + l.plot.width}
              y1={bottom}
              y2={bottom}
              className="axis-line"
            />
            {p.title ? (
              <text x={l.plot.left + 6} y={l.plot.top - 6} className="panel-title">
                {p.title}
              </text>
            ) : null}
            <text
              transform={`translate(14 ${l.plot.top + l.plot.height / 2}) rotate(-90)`}
              textAnchor="middle"
              className="axis-title"
            >
              CF (D_het/D_water)
            </text>
            <text
              x={l.plot.left + l.plot.width / 2}
              y={bottom + 36}
              textAnchor="middle"
              className="axis-title"
            >
              {result.xLabel}
            </text>
            {p.curves.map((c) => (
              <g key={c.id} data-method={c.id}>
                <path
                  d={c.d}
                  fill="none"
                  stroke={c.color}
                  strokeDasharray={c.dash || undefined}
                  strokeWidth={1.8}
                />
                {c.dots.map(([x, y], i) => (
                  <circle key={i} cx={x} cy={y} r={2.2} fill={c.color} />
                ))}
              </g>
            ))}
          </g>
        ))}
      </svg>
      <figcaption>
        <ul className="sweep-legend" aria-label="Methods">
          {ids.map((id) => (
            <li key={id}>
              <svg width="28" height="10" aria-hidden="true">
                <line
                  x1="0"
                  x2="28"
                  y1="5"
                  y2="5"
                  stroke={styles.get(id)?.color}
                  strokeDasharray={styles.get(id)?.dash || undefined}
                  strokeWidth="2"
                />
              </svg>{' '}
              {labels.get(id)}
            </li>
          ))}
        </ul>
        {l.empty ? (
          <p className="notice error">No method gave a value for these settings.</p>
        ) : null}
      </figcaption>
    </figure>
  );
}
