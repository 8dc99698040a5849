// The "Monte Carlo run" view: settings, Start/Cancel, progress with live 1σ at the points of
// interest, and what the run models. The run belongs to the case it was started for: once the
// case is edited its result is marked stale and left out of the depth-dose and CF views.
import { depthGridCm } from '../../compute/depthGrid';
import { validateCase } from '../../io/caseFile';
import { toCaseFile, totalThicknessCm } from '../../state/editorCase';
import { useMonteCarloStore, type McRunStatus } from '../../state/monteCarloStore';
import { useAppStore } from '../../state/store';
import { McExplanation } from './McExplanation';
import { McProgressView } from './McProgressView';
import { McRunForm } from './McRunForm';
import { groupDigits, isRunCurrent } from './mcRunModel';
import { cancelRun, startRun, useMcForm } from './mcRunner';
import { useCurrentMcCaseKey } from './useShownReport';
import './montecarlo.css';

const STATUS_TEXT: Record<McRunStatus, string> = {
  idle: 'No run yet.',
  running: 'Running…',
  done: 'Finished.',
  cancelled: 'Cancelled.',
  failed: 'Failed.',
};

function gridFor(reportGrid: readonly number[] | undefined, totalCm: number): number[] {
  const last = reportGrid?.[reportGrid.length - 1];
  if (reportGrid && last !== undefined && Math.abs(last - totalCm) < 1e-9) return [...reportGrid];
  return depthGridCm(totalCm, 0.05);
}

export function MonteCarloPanel() {
  const present = useAppStore((s) => s.history.present);
  const reportGrid = useAppStore((s) => s.calc.report?.depthCm);
  const mc = useMonteCarloStore();
  const run = useMcForm((s) => s.run);
  const currentKey = useCurrentMcCaseKey();
  const running = mc.status === 'running';
  const stale = mc.caseKey !== null && !isRunCurrent(mc.caseKey, currentKey);
  const valid = validateCase(toCaseFile(present));
  const blocked = valid.ok
    ? null
    : `The case cannot be run as it stands: ${valid.problems.map((p) => `${p.path}: ${p.message}`).join('; ')}`;

  const onStart = (histories: number, seed: number, doseToWater: boolean) => {
    if (!valid.ok) return;
    const waterSource = (useAppStore.getState() as { waterSource?: string }).waterSource;
    startRun({
      caseData: valid.value,
      caseKey: currentKey,
      histories,
      seed,
      doseToWater,
      waterSource,
      depthGridCm: gridFor(reportGrid, totalThicknessCm(present)),
    });
  };

  return (
    <section className="mc-panel" aria-label="Monte Carlo run">
      <h2>Monte Carlo run</h2>
      <McRunForm running={running} blocked={blocked} onStart={onStart} onCancel={cancelRun} />
      <div className="mc-status" role="status" aria-live="polite" data-testid="mc-status">
        <strong>{STATUS_TEXT[mc.status]}</strong>{' '}
        {mc.status === 'cancelled'
          ? mc.result
            ? `Showing what was merged before Cancel (${groupDigits(mc.result.histories)} histories in the case run).`
            : 'Stopped before every run had two batches: no estimate.'
          : null}
        {mc.status === 'failed' && mc.error ? (
          <span className="field-message">{mc.error}</span>
        ) : null}
        {stale ? (
          <span className="mc-stale" data-testid="mc-stale">
            stale (case changed): this run is not drawn in the depth-dose and CF views; start a new
            run for the current case.
          </span>
        ) : null}
      </div>
      {run ? (
        <p className="hint" data-testid="mc-run-settings">
          Run: {groupDigits(run.histories)} histories per run, seed {run.seed},{' '}
          {run.doseToWater ? 'dose to water' : 'dose to medium'}; dose per MU from the calibration
          run × {run.calibration.referenceDosePerMuCGy} cGy/MU × S_c{' '}
          {run.calibration.collimatorScatterFactor.toFixed(3)} ({run.calibration.source}).
        </p>
      ) : null}
      {mc.status !== 'idle' ? (
        <div className={stale ? 'mc-stale-values' : undefined}>
          <McProgressView
            progress={mc.progress}
            result={mc.result}
            running={running}
            startedAtMs={run?.startedAtMs ?? null}
          />
        </div>
      ) : null}
      {mc.result && !stale ? (
        <p className="hint">
          The Monte Carlo curve and its ±1σ band are drawn in the Depth dose and Correction factors
          views{running ? ' and keep updating as batches arrive' : ''}.
        </p>
      ) : null}
      <McExplanation />
    </section>
  );
}
