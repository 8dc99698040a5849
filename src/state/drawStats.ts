// Counters of chart redraws, for tests and support (read through the page's debug hooks,
// `?debug=1`): how many times each chart laid out its curves, and how many of those layouts
// repeated the one before with the same result (a redraw that changed nothing: the sign of a
// memo lost or of an extra render on the input path). Off unless the debug hooks switch it on.
export interface ChartDrawCount {
  /** Layouts computed (scales, ticks, one path per curve). */
  layouts: number;
  /** Layouts whose result equalled the chart's previous layout. */
  repeated: number;
}

const counts = new Map<string, ChartDrawCount>();
const lastSignature = new Map<string, string>();
let enabled = false;

export function enableDrawStats(): void {
  enabled = true;
}

/** Note a layout of chart `chartId`; `signature` describes what it draws (only read when on). */
export function noteChartLayout(chartId: string, signature: () => string): void {
  if (!enabled) return;
  const c = counts.get(chartId) ?? { layouts: 0, repeated: 0 };
  const sig = signature();
  c.layouts += 1;
  if (lastSignature.get(chartId) === sig) c.repeated += 1;
  lastSignature.set(chartId, sig);
  counts.set(chartId, c);
}

/** A copy of the counts, by chart id. */
export function chartDrawCounts(): Record<string, ChartDrawCount> {
  return Object.fromEntries([...counts].map(([k, v]) => [k, { ...v }]));
}
