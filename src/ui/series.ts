// From a report to plottable series: visible methods, their styles and normalised values.
import type { CalcReport } from '../contract/reports';
import type { CurveSeries } from '../plots/curveLayout';
import { normaliseMethods, type NormalisationMode } from '../plots/normalise';
import { seriesStyles } from '../plots/palette';

const isNum = (v: number | null | undefined): v is number =>
  typeof v === 'number' && Number.isFinite(v);

export function methodStyles(report: CalcReport) {
  return seriesStyles(report.methods.map((m) => m.id));
}

export function doseSeries(
  report: CalcReport,
  hidden: readonly string[],
  mode: NormalisationMode,
): { ok: true; axisLabel: string; series: CurveSeries[] } | { ok: false; reason: string } {
  const styles = methodStyles(report);
  // Normalise over every method (the water curve may be hidden but still the reference).
  const n = normaliseMethods(report.methods, mode);
  if (!n.ok) return n;
  return {
    ok: true,
    axisLabel: n.axisLabel,
    series: n.series
      .map((s, i) => ({ s, m: report.methods[i]! }))
      .filter(({ m }) => !hidden.includes(m.id))
      .map(({ s, m }) => {
        const st = styles.get(m.id)!;
        return {
          id: m.id,
          label: m.label,
          color: st.color,
          dash: st.dash,
          values: s.values,
          sigma: s.sigma,
        };
      }),
  };
}

export function cfSeries(report: CalcReport, hidden: readonly string[]): CurveSeries[] {
  const styles = methodStyles(report);
  return report.methods
    .filter((m) => !hidden.includes(m.id))
    .map((m) => {
      const st = styles.get(m.id)!;
      return {
        id: m.id,
        label: m.label,
        color: st.color,
        dash: st.dash,
        values: m.curve.cf.map((v) => (isNum(v) ? v : null)),
        sigma: m.curve.sigmaCf,
      };
    });
}
