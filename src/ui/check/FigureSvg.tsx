// The record's depth-dose figure drawn as SVG from the same plain data the PDF uses.
import { forwardRef } from 'react';
import type { ReportFigure } from '../../io/report/reportFigure';

export const FigureSvg = forwardRef<
  SVGSVGElement,
  { figure: ReportFigure; width?: number; height?: number }
>(function FigureSvg({ figure, width = 640, height: plotHeight = 240 }, ref) {
  const legendRows = Math.ceil(figure.series.length / 2);
  // The axis-cut note takes two lines under the legend (it is part of the exported figure).
  const noteLines = figure.clipNote ? figure.clipNote.split(/; (?=above it)/) : [];
  const m = { left: 52, right: 12, top: 22, bottom: 44 + legendRows * 14 + noteLines.length * 12 };
  const height = plotHeight + m.bottom;
  const w = width - m.left - m.right;
  const h = height - m.top - m.bottom;
  const [x0, x1] = figure.xDomain;
  const [y0, y1] = figure.yDomain;
  const px = (x: number) => m.left + ((x - x0) / (x1 - x0 || 1)) * w;
  const py = (y: number) => m.top + h - ((y - y0) / (y1 - y0 || 1)) * h;
  return (
    <svg
      ref={ref}
      className="check-figure"
      width={width}
      height={height}
      viewBox={`0 0 ${width} ${height}`}
      role="img"
      aria-label={figure.title}
      data-testid="check-figure"
    >
      <text x={m.left} y={14} fontSize={12} fontWeight="bold" fill="currentColor">
        {figure.title}
      </text>
      <rect
        x={m.left}
        y={m.top}
        width={w}
        height={h}
        fill="none"
        stroke="currentColor"
        strokeWidth={0.8}
      />
      {figure.xTicks.map((t) => (
        <g key={`x${t}`}>
          <line x1={px(t)} x2={px(t)} y1={m.top + h} y2={m.top + h + 4} stroke="currentColor" />
          <text x={px(t)} y={m.top + h + 15} fontSize={10} textAnchor="middle" fill="currentColor">
            {t}
          </text>
        </g>
      ))}
      {figure.yTicks.map((t) => (
        <g key={`y${t}`}>
          <line x1={m.left - 4} x2={m.left} y1={py(t)} y2={py(t)} stroke="currentColor" />
          <text x={m.left - 6} y={py(t) + 3} fontSize={10} textAnchor="end" fill="currentColor">
            {t}
          </text>
        </g>
      ))}
      <text
        x={m.left + w / 2}
        y={m.top + h + 30}
        fontSize={11}
        textAnchor="middle"
        fill="currentColor"
      >
        {figure.xLabel}
      </text>
      <text
        transform={`translate(14 ${m.top + h / 2}) rotate(-90)`}
        fontSize={11}
        textAnchor="middle"
        fill="currentColor"
      >
        {figure.yLabel}
      </text>
      {figure.series.map((s, i) =>
        (s.band ?? []).map((run, k) => (
          <path
            key={`b${i}-${k}`}
            d={`M${run.map(([x, , hi]) => `${px(x).toFixed(1)},${py(hi).toFixed(1)}`).join('L')}L${[
              ...run,
            ]
              .reverse()
              .map(([x, lo]) => `${px(x).toFixed(1)},${py(lo).toFixed(1)}`)
              .join('L')}Z`}
            fill={s.color}
            fillOpacity={0.18}
            stroke="none"
          />
        )),
      )}
      {figure.series.map((s, i) =>
        s.runs.map((run, k) => (
          <polyline
            key={`${i}-${k}`}
            points={run.map(([x, y]) => `${px(x).toFixed(1)},${py(y).toFixed(1)}`).join(' ')}
            fill="none"
            stroke={s.color}
            strokeDasharray={s.dash || undefined}
            strokeWidth={1.4}
          />
        )),
      )}
      {figure.series.map((s, i) => {
        const lx = m.left + (i % 2) * (w / 2);
        const ly = m.top + h + 46 + Math.floor(i / 2) * 14;
        return (
          <g key={`l${i}`}>
            <line
              x1={lx}
              x2={lx + 18}
              y1={ly - 4}
              y2={ly - 4}
              stroke={s.color}
              strokeDasharray={s.dash || undefined}
              strokeWidth={2}
            />
            <text x={lx + 22} y={ly} fontSize={10} fill="currentColor">
              {s.label}
            </text>
          </g>
        );
      })}
      {noteLines.map((line, k) => (
        <text
          key={`n${k}`}
          x={m.left}
          y={m.top + h + 46 + legendRows * 14 + k * 12}
          fontSize={9}
          fill="currentColor"
          data-testid="check-figure-note"
        >
          {k === 0 && noteLines.length > 1 ? `${line};` : line}
        </text>
      ))}
    </svg>
  );
});
