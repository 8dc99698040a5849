// The "Monte Carlo run" view: settings, Start/Cancel, progress with live 1σ at the points of
// interest, and what the run models. The run belongs to the case it was started for: once the
// case is edited its result is marked stale and left out of the depth-dose and CF views.
import { getComputeWorker } from '../../compute/computeClient';
import { validateCase } from '../../io/caseFile';
import { toCaseFile } from '../../state/editorCase';
import { setMonteCarlo, useMonteCarloStore, type McRunStatus } from '../../state/monteCarloStore';
import { useAppStore } from '../../state/store';
import { doseQuantityLabel } from '../../engine/dose/doseQuantity';
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

export function MonteCarloPanel() {
  const present = useAppStore((s) => s.history.present);
  const mc = useMonteCarloStore();
  const run = useMcForm((s) => s.run);
  const currentKey = useCurrentMcCaseKey();
  const running = mc.status === 'running';
  const stale = mc.caseKey !== null && !isRunCurrent(mc.caseKey, currentKey);
  const valid = validateCase(toCaseFile(present));
  const blocked = valid.ok
    ? null
    : `The case cannot be run as it stands: ${valid.problems.map((p) => `${p.path}: ${p.message}`).join('; ')}`;

  const onStart = (histories: number, seed: number) => {
    if (!valid.ok) return;
    const caseData = valid.value;
    const { waterSource, check } = useAppStore.getState();
    // Calibration, engine options and the run's key come from the compute worker (one place for
    // the CLI and the page); the batches then run on the Monte Carlo worker pool.
    void getComputeWorker()
      .prepareMonteCarlo({
        purpose: 'monte-carlo',
        case: caseData,
        water: { kind: waterSource },
        run: { histories, seed, doseTo: check.doseTo },
      })
      .then((setup) => {
        if (setup.ok) startRun({ caseData, setup, histories, seed });
        else
          setMonteCarlo({
            status: 'failed',
            error: setup.problems.map((p) => `${p.path}: ${p.message}`).join('; '),
          });
      })
      .catch((e: unknown) =>
        setMonteCarlo({ status: 'failed', error: e instanceof Error ? e.message : String(e) }),
      );
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
            stale (case, water data or dose convention changed): this run is not drawn in the
            depth-dose and CF views; start a new run for the current case.
          </span>
        ) : null}
      </div>
      {run ? (
        <p className="hint" data-testid="mc-run-settings">
          Run: {groupDigits(run.histories)} histories per run, seed {run.seed},{' '}
          {doseQuantityLabel(run.doseTo)}; dose per MU:{' '}
          {run.calibration.mode === 'cf-times-water'
            ? run.calibration.source
            : `calibration run × ${run.calibration.referenceDosePerMuCGy} cGy/MU × S_c ${run.calibration.collimatorScatterFactor.toFixed(3)} (${run.calibration.source})`}
          .
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
