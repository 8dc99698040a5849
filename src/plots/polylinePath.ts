// SVG path text of a curve sampled at pixel positions, with gaps where a value is missing: the
// text d3's line generator (linear curve, .digits(1)) writes for the same points — "M" at the
// start of each run of finite values, "L" between them, a lone value closed with "Z",
// coordinates rounded to 0.1 px — written in one loop, without the generator's per-point
// callbacks. It runs on the page's main thread in the frame of an edit (bench/curveChartLayout).

/**
 * `String(Math.round(v × 10) / 10)` (d3-path's digits(1)), written from the whole number of
 * tenths: integers print much faster than fractions. Beyond ±10⁹ px (never on a chart) it falls
 * back to the plain conversion.
 */
function tenths(v: number): string {
  const t = Math.round(v * 10);
  if (!(Math.abs(t) < 1e10)) return String(t / 10);
  const a = t < 0 ? -t : t;
  const whole = (a - (a % 10)) / 10;
  const frac = a % 10;
  const sign = t < 0 ? '-' : '';
  return frac === 0 ? `${sign}${whole}` : `${sign}${whole}.${frac}`;
}

/**
 * Path text of the polyline through (xPx[i], yPx(values[i])) for every i whose value is a finite
 * number; `xPx` holds the x pixel of each sample (one array shared by a chart's curves).
 */
export function polylinePath(
  xPx: ArrayLike<number>,
  values: readonly (number | null | undefined)[],
  yPx: (value: number) => number,
): string {
  let d = '';
  let run = 0;
  const n = Math.min(xPx.length, values.length);
  for (let i = 0; i < n; i++) {
    const v = values[i];
    if (typeof v !== 'number' || !Number.isFinite(v)) {
      if (run === 1) d += 'Z';
      run = 0;
      continue;
    }
    d += `${run === 0 ? 'M' : 'L'}${tenths(xPx[i] as number)},${tenths(yPx(v))}`;
    run += 1;
  }
  if (run === 1) d += 'Z';
  return d;
}
