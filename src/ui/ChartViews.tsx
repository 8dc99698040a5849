// The two comparison views: depth dose (with normalisation) and correction factors (with the
// path's radiological depth). Both sit under the slab strip and share its depth axis.
import { memo, useDeferredValue, useMemo } from 'react';
import type { CalcReport } from '../contract/reports';
import { displayWarnings, visibleWarnings } from '../plots/warnings';
import { NORMALISATION_LABELS, type NormalisationMode } from '../plots/normalise';
import { setNormalisation, useAppStore } from '../state/store';
import { CurveChart } from './CurveChart';
import { MethodLegend } from './MethodLegend';
import { PointTable } from './PointTable';
import { cfSeries, doseSeries, methodStyles } from './series';
import { WarningList } from './WarningList';
import { nearestIndex, type CurveSeries } from '../plots/curveLayout';
import { curvesCsv } from '../io/csvExport';
import { downloadText } from './download';

const SHORT_LABELS: Record<NormalisationMode, string> = {
  dosePerMu: 'Dose per MU (cGy/MU)',
  percentWaterDmax: '% of water maximum',
  relativeToWater: 'Ratio to water, same depth',
};

function interfacesOf(report: CalcReport): number[] {
  return report.layers.slice(0, -1).map((l) => l.bottomCm);
}

/** "lung, radiological 4.42 cm" for the readout. */
function depthDescriber(report: CalcReport): (depthCm: number) => string {
  return (depthCm) => {
    const layer = report.layers.find((l) => depthCm <= l.bottomCm + 1e-9) ?? report.layers.at(-1);
    const i = nearestIndex(report.depthCm, depthCm);
    const rad = report.radiologicalDepthCm[i];
    const name = layer ? layer.material.replace(/ \(.*\)$/, '') : '';
    return rad === undefined ? name : `${name}, radiological ${rad.toFixed(2)} cm`;
  };
}

/** Radiological against geometric depth: the path's curve over the water diagonal. */
function radiologicalSeries(report: CalcReport): CurveSeries[] {
  return [
    {
      id: 'geometric',
      label: 'Water (geometric depth)',
      color: '#888888',
      dash: '3 3',
      values: report.depthCm,
    },
    {
      id: 'radiological',
      label: 'This path',
      color: 'currentColor',
      dash: '',
      values: report.radiologicalDepthCm,
    },
  ];
}

function maxDepthOf(report: CalcReport): number {
  return report.layers[report.layers.length - 1]?.bottomCm ?? 1;
}

/**
 * The tables under a chart (point values, warnings) take the report deferred, so an edit's frame
 * draws the curves first and the tables follow in the next idle moment. The deferral lives in
 * these small components: the deferred render re-renders the tables only, not the views and
 * their charts (which the urgent render has already drawn).
 */
const DeferredPointTable = memo(function DeferredPointTable({ report }: { report: CalcReport }) {
  return <PointTable report={useDeferredValue(report)} />;
});

const DeferredWarningList = memo(function DeferredWarningList({ report }: { report: CalcReport }) {
  const slow = useDeferredValue(report);
  const warnings = useMemo(() => displayWarnings(slow.warnings), [slow]);
  return <WarningList warnings={warnings} />;
});

/** y values every chart of its kind keeps on its axis (constants: the chart's props stay equal). */
const INCLUDE_ZERO: readonly number[] = [0];
const INCLUDE_ONE: readonly number[] = [1];

/**
 * What a view's charts draw besides the curves, computed once per report (and filter): the
 * charts are memoised and redraw only when one of these changes.
 */
function useChartFrame(report: CalcReport) {
  const hidden = useAppStore((s) => s.hiddenWarningMethods);
  const hiddenMethods = useAppStore((s) => s.hiddenMethods);
  const bands = useMemo(() => {
    const all = displayWarnings(report.warnings);
    return visibleWarnings(all, [...hidden, ...hiddenMethods])
      .filter((w) => w.range)
      .map((w) => ({
        key: w.key,
        fromCm: w.range!.fromCm,
        toCm: w.range!.toCm,
        severity: w.severity,
        title: `${w.code} (${w.severity}): ${w.message}${w.numbers ? `\n${w.numbers}` : ''}`,
      }));
  }, [report, hidden, hiddenMethods]);
  const fixed = useMemo(
    () => ({
      interfaces: interfacesOf(report),
      maxDepth: maxDepthOf(report),
      describeDepth: depthDescriber(report),
      styles: methodStyles(report),
    }),
    [report],
  );
  return { bands, ...fixed };
}

// Memoised: an edit re-renders the workbench around these views, but they change only with the
// report (or their own store fields), so the case edit's frame does not redraw the charts.
export const DoseView = memo(function DoseView({
  report,
  width,
}: {
  report: CalcReport;
  width: number;
}) {
  const hidden = useAppStore((s) => s.hiddenMethods);
  const updatingIds = useAppStore((s) => s.calc.updatingMethodIds);
  const mode = useAppStore((s) => s.normalisation);
  const f = useChartFrame(report);
  const s = useMemo(() => doseSeries(report, hidden, mode), [report, hidden, mode]);
  return (
    <div className="view">
      {report.methods.length > 0 ? (
        <div className="chart-controls">
          <MethodLegend methods={report.methods} styles={f.styles} />
          <div className="field">
            <button
              type="button"
              className="export"
              onClick={() =>
                downloadText(
                  `${report.caseName || 'case'}-curves.csv`,
                  curvesCsv(report),
                  'text/csv',
                )
              }
              title="Every method's dose per MU and CF at each depth, full precision"
            >
              Export curves (CSV)
            </button>
            <label htmlFor="norm">Normalise dose as</label>
            <select
              id="norm"
              value={mode}
              onChange={(e) => setNormalisation(e.target.value as NormalisationMode)}
            >
              {(Object.keys(NORMALISATION_LABELS) as NormalisationMode[]).map((k) => (
                <option key={k} value={k}>
                  {SHORT_LABELS[k]}
                </option>
              ))}
            </select>
          </div>
        </div>
      ) : null}
      {report.methods.length > 0 && !s.ok ? <p className="notice info">{s.reason}</p> : null}
      {report.methods.length > 0 && s.ok ? (
        <CurveChart
          title="Central-axis depth dose, one curve per method"
          testId="dose-chart"
          depthCm={report.depthCm}
          maxDepthCm={f.maxDepth}
          series={s.series}
          axisLabel={s.axisLabel}
          width={width}
          height={320}
          interfacesCm={f.interfaces}
          bands={f.bands}
          points={report.points}
          digits={mode === 'percentWaterDmax' ? 1 : 3}
          describeDepth={f.describeDepth}
          yInclude={mode === 'relativeToWater' ? INCLUDE_ONE : INCLUDE_ZERO}
          updatingIds={updatingIds}
        />
      ) : null}
      <DeferredPointTable report={report} />
      <DeferredWarningList report={report} />
    </div>
  );
});

export const CfView = memo(function CfView({
  report,
  width,
}: {
  report: CalcReport;
  width: number;
}) {
  const hidden = useAppStore((s) => s.hiddenMethods);
  const updatingIds = useAppStore((s) => s.calc.updatingMethodIds);
  const f = useChartFrame(report);
  const series = useMemo(() => cfSeries(report, hidden), [report, hidden]);
  const radiological = useMemo(() => radiologicalSeries(report), [report]);
  return (
    <div className="view">
      {report.methods.length > 0 ? (
        <>
          <div className="chart-controls">
            <MethodLegend methods={report.methods} styles={f.styles} />
          </div>
          <CurveChart
            title="Correction factor against depth, one curve per method"
            testId="cf-chart"
            depthCm={report.depthCm}
            maxDepthCm={f.maxDepth}
            series={series}
            axisLabel="Correction factor D_het / D_water"
            width={width}
            height={280}
            interfacesCm={f.interfaces}
            bands={f.bands}
            points={report.points}
            digits={3}
            yInclude={INCLUDE_ONE}
            describeDepth={f.describeDepth}
            updatingIds={updatingIds}
          />
          <DeferredPointTable report={report} />
        </>
      ) : null}
      <CurveChart
        title="Radiological (water-equivalent) depth against geometric depth"
        testId="radiological-chart"
        depthCm={report.depthCm}
        maxDepthCm={f.maxDepth}
        series={radiological}
        axisLabel="Radiological depth (cm)"
        legend
        width={width}
        height={220}
        interfacesCm={f.interfaces}
        points={report.points}
        digits={2}
        yInclude={INCLUDE_ZERO}
      />
      <DeferredWarningList report={report} />
    </div>
  );
});
