// The depth-dose figure of a printed record as plain data: each method's dose per MU against
// depth, thinned to at most `maxPoints` per curve, with the axis domains and tick values, each
// method in the page's colour and dash pattern (so the curves differ in greyscale print too) and
// the page's axis cut above a narrow spike. The PDF and HTML renderers only map it to their own
// coordinates.
import type { CalcReport } from '../../contract/reports';
import { spikeLimit } from '../../plots/curveLayout';
import { seriesStyles } from '../../plots/palette';

export interface ReportSeries {
  label: string;
  /** CSS colour ('currentColor' = the text colour: black on paper). */
  color: string;
  /** SVG dash array ('' = solid). */
  dash: string;
  /** [depth cm, dose per MU cGy] pairs; gaps (null doses, or above a cut axis) split the curve into runs. */
  runs: [number, number][][];
  /** A statistical method's ±1σ band as runs of [depth cm, dose − σ, dose + σ] (else absent). */
  band?: [number, number, number][][];
}

export interface ReportFigure {
  title: string;
  xLabel: string;
  yLabel: string;
  xDomain: [number, number];
  yDomain: [number, number];
  xTicks: number[];
  yTicks: number[];
  series: ReportSeries[];
  /** When a spike cut the axis: what lies above it (else null). */
  clipNote: string | null;
}

/** Round tick values covering [lo, hi] with about `count` steps of 1, 2 or 5 × 10^k. */
export function niceTicks(lo: number, hi: number, count: number): number[] {
  if (!(hi > lo)) return [lo];
  const raw = (hi - lo) / count;
  const mag = 10 ** Math.floor(Math.log10(raw));
  const step = ([1, 2, 5, 10].find((m) => m * mag >= raw) ?? 10) * mag;
  const out: number[] = [];
  for (let v = Math.ceil(lo / step - 1e-9) * step; v <= hi + step * 1e-9; v += step)
    out.push(Number(v.toPrecision(12)));
  return out;
}

export function depthDoseFigure(report: CalcReport, title: string, maxPoints = 160): ReportFigure {
  const n = report.depthCm.length;
  const stride = Math.max(1, Math.ceil(n / maxPoints));
  const styles = seriesStyles(report.methods.map((m) => m.id));
  // The same axis cut as the page's chart: a narrow spike must not flatten every other curve.
  const limit = spikeLimit(
    report.methods.map((m) => ({
      id: m.id,
      label: m.label,
      color: '',
      dash: '',
      values: m.curve.dosePerMuCGy,
    })),
  );
  const above: string[] = [];
  let yMax = 0;
  const series = report.methods.map((m): ReportSeries => {
    const sigma = m.curve.sigmaDosePerMuCGy;
    const runs: [number, number][][] = [];
    const band: [number, number, number][][] = [];
    let run: [number, number][] = [];
    let bandRun: [number, number, number][] = [];
    let peak = 0;
    for (let i = 0; i < n; i++) {
      if (i % stride !== 0 && i !== n - 1) continue;
      const y = m.curve.dosePerMuCGy[i];
      const x = report.depthCm[i];
      const shown = y !== null && y !== undefined && x !== undefined && Number.isFinite(y);
      if (shown) peak = Math.max(peak, y);
      if (!shown || (limit !== null && y > limit)) {
        if (run.length > 0) runs.push(run);
        if (bandRun.length > 0) band.push(bandRun);
        run = [];
        bandRun = [];
        continue;
      }
      yMax = Math.max(yMax, y);
      run.push([x, y]);
      const s = sigma?.[i];
      if (s !== undefined && Number.isFinite(s) && s > 0) {
        const hi = limit !== null ? Math.min(y + s, limit) : y + s;
        bandRun.push([x, Math.max(0, y - s), hi]);
        yMax = Math.max(yMax, hi);
      }
    }
    if (run.length > 0) runs.push(run);
    if (bandRun.length > 0) band.push(bandRun);
    if (limit !== null && peak > limit) above.push(`${m.label} (up to ${peak.toFixed(3)})`);
    const style = styles.get(m.id) ?? { color: 'currentColor', dash: '' };
    return {
      label: sigma ? `${m.label} (band: ±1σ)` : m.label,
      color: style.color,
      dash: style.dash,
      runs,
      ...(band.length > 0 ? { band } : {}),
    };
  });
  const xMax = report.depthCm[n - 1] ?? 1;
  const yTop = limit ?? (yMax > 0 ? yMax * 1.05 : 1);
  return {
    title,
    xLabel: 'depth (cm)',
    yLabel: 'dose per MU (cGy/MU)',
    xDomain: [0, xMax],
    yDomain: [0, yTop],
    xTicks: niceTicks(0, xMax, 8),
    yTicks: niceTicks(0, yTop, 5),
    series,
    clipNote:
      above.length > 0
        ? `Axis cut at ${yTop.toFixed(2)} cGy/MU to keep the other curves readable; above it: ${above.join(', ')}.`
        : null,
  };
}
