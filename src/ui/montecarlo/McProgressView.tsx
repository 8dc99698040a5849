// Progress of the run (bar, histories, elapsed time) and the live estimate at each point of
// interest: dose per MU with its 1σ statistical uncertainty, absolute and in per cent, and CF.
import { useEffect, useState } from 'react';
import type { McProgress } from '../../compute/mcRunState';
import type { McResult } from '../../engine/montecarlo/monteCarloResult';
import {
  formatDoseSigma,
  formatElapsed,
  fractionDone,
  groupDigits,
  projectedRelativeSigma,
  remainingMs,
} from './mcRunModel';

/** Wall-clock time, refreshed while `ticking`. */
function useNow(ticking: boolean): number {
  const [now, setNow] = useState(() => Date.now());
  useEffect(() => {
    if (!ticking) return;
    const t = window.setInterval(() => setNow(Date.now()), 250);
    return () => window.clearInterval(t);
  }, [ticking]);
  return now;
}

export function McProgressView({
  progress,
  result,
  running,
  startedAtMs,
}: {
  progress: McProgress | null;
  result: McResult | null;
  running: boolean;
  startedAtMs: number | null;
}) {
  const now = useNow(running);
  const elapsedMs =
    running && startedAtMs !== null ? now - startedAtMs : (progress?.elapsedMs ?? null);
  const fraction = progress ? fractionDone(progress.tasksDone, progress.totalTasks) : 0;
  const left = running && elapsedMs !== null ? remainingMs(elapsedMs, fraction) : null;
  const projected = (rel: number | null): string => {
    if (rel === null || !progress) return '—';
    const p = projectedRelativeSigma(rel, progress.histories, progress.totalHistories);
    return p === null ? '—' : `${(100 * p).toFixed(2)} %`;
  };
  const cfById = new Map(result?.method.points.map((p) => [p.id, p.cf]) ?? []);
  return (
    <div className="mc-progress">
      <div className="mc-bar-row">
        <progress
          data-testid="mc-progress"
          max={1}
          value={fraction}
          aria-label="Monte Carlo progress"
        />
        <span className="num">{(100 * fraction).toFixed(0)} %</span>
      </div>
      <dl className="mc-figures">
        <dt>Histories done (case run)</dt>
        <dd data-testid="mc-histories-done">
          {progress
            ? `${groupDigits(progress.histories)} of ${groupDigits(progress.totalHistories)}`
            : '—'}
        </dd>
        <dt>Batches done (all runs)</dt>
        <dd>{progress ? `${progress.tasksDone} of ${progress.totalTasks}` : '—'}</dd>
        <dt>Elapsed</dt>
        <dd data-testid="mc-elapsed">{elapsedMs === null ? '—' : formatElapsed(elapsedMs)}</dd>
        {running ? (
          <>
            <dt>Remaining (estimate)</dt>
            <dd data-testid="mc-remaining">{left === null ? '—' : formatElapsed(left)}</dd>
          </>
        ) : null}
      </dl>
      {progress && progress.points.length > 0 ? (
        <div className="table-wrap">
          <table className="mc-points" data-testid="mc-points">
            <caption>
              Estimate at the points of interest, 1σ statistical uncertainty (updates after every
              batch; shown once every run has two batches)
            </caption>
            <thead>
              <tr>
                <th scope="col">Point</th>
                <th scope="col">Dose per MU ± 1σ</th>
                <th scope="col">1σ (%)</th>
                <th scope="col">CF</th>
                {running ? <th scope="col">1σ at the end (projected, σ ∝ 1/√N)</th> : null}
              </tr>
            </thead>
            <tbody>
              {progress.points.map((p) => {
                const f = formatDoseSigma(p.dosePerMuCGy, p.sigmaDosePerMuCGy);
                const cf = cfById.get(p.id);
                return (
                  <tr key={p.id}>
                    <th scope="row">{p.id}</th>
                    <td className="num" data-testid={`mc-dose-${p.id}`}>
                      {f.absolute}
                    </td>
                    <td className="num" data-testid={`mc-sigma-${p.id}`}>
                      {f.relative}
                    </td>
                    <td className="num">{cf === null || cf === undefined ? '—' : cf.toFixed(3)}</td>
                    {running ? <td className="num">{projected(p.relativeSigma)}</td> : null}
                  </tr>
                );
              })}
            </tbody>
          </table>
        </div>
      ) : null}
    </div>
  );
}
