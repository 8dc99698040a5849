// Tick marks and labels of a chart's axes, shared by every line chart and map.
interface Tick {
  value: number;
  px: number;
  label: string;
}

/** Left-axis ticks: a grid line across the plot to `gridRightPx`, or a 5 px mark when absent. */
export function YTicks({
  ticks,
  leftPx,
  gridRightPx,
}: {
  ticks: readonly Tick[];
  leftPx: number;
  gridRightPx?: number;
}) {
  const grid = gridRightPx !== undefined;
  return (
    <>
      {ticks.map((t) => (
        <g key={`y${t.value}`}>
          <line
            x1={grid ? leftPx : leftPx - 5}
            x2={grid ? gridRightPx : leftPx}
            y1={t.px}
            y2={t.px}
            className={grid ? 'grid' : 'axis-line'}
          />
          <text x={leftPx - (grid ? 6 : 8)} y={t.px + 4} textAnchor="end" className="tick-label">
            {t.label}
          </text>
        </g>
      ))}
    </>
  );
}

/** Bottom-axis ticks: a 5 px mark below `bottomPx` and the label under it. */
export function XTicks({ ticks, bottomPx }: { ticks: readonly Tick[]; bottomPx: number }) {
  return (
    <>
      {ticks.map((t) => (
        <g key={`x${t.value}`}>
          <line x1={t.px} x2={t.px} y1={bottomPx} y2={bottomPx + 5} className="axis-line" />
          <text x={t.px} y={bottomPx + 18} textAnchor="middle" className="tick-label">
            {t.label}
          </text>
        </g>
      ))}
    </>
  );
}
