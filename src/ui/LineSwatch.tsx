// A short sample of a series' line (colour and dash pattern), for legends and readouts.
export function LineSwatch({
  color,
  dash,
  widthPx = 26,
  heightPx = 10,
  strokeWidth,
}: {
  color: string;
  dash?: string | undefined;
  widthPx?: number;
  heightPx?: number;
  strokeWidth?: number;
}) {
  return (
    <svg width={widthPx} height={heightPx} aria-hidden="true">
      <line
        x1="0"
        x2={widthPx}
        y1={heightPx / 2}
        y2={heightPx / 2}
        stroke={color}
        strokeWidth={strokeWidth}
        strokeDasharray={dash || undefined}
      />
    </svg>
  );
}

/** The legend under a line chart: one swatch and label per series. */
export function ChartLegend({
  series,
}: {
  series: readonly { id: string; label: string; color: string; dash?: string | undefined }[];
}) {
  return (
    <div className="chart-legend">
      {series.map((s) => (
        <span key={s.id}>
          <LineSwatch color={s.color} dash={s.dash} strokeWidth={2} />
          {s.label}
        </span>
      ))}
    </div>
  );
}
