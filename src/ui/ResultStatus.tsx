// What the calculation could and could not do, in plain words: case problems with their field
// paths, methods that are unavailable and why, or that no method has produced results.
import { NEEDS_WATER_DATA } from '../contract/reports';
import { setTab, setWaterSource, useAppStore } from '../state/store';
import { loadDemoTables } from './demoTables';
import { RetryButton } from './RetryButton';

export function ResultStatus() {
  const calc = useAppStore((s) => s.calc);
  const r = calc.report;
  return (
    <div className="result-status" aria-live="polite">
      {calc.status === 'invalid' ? (
        <div className="notice error" role="alert" data-testid="case-problems">
          <strong>The case cannot be calculated as it stands:</strong>
          <ul>
            {calc.problems.map((p, i) => (
              <li key={i}>
                <code>{p.path}</code>: {p.message}
              </li>
            ))}
          </ul>
          <span className="hint">The results below are from the last valid case.</span>
        </div>
      ) : null}
      {calc.status === 'error' ? (
        <div className="notice error" role="alert">
          The calculation failed: {calc.error} <RetryButton />
        </div>
      ) : null}
      {r && r.methods.length === 0 ? (
        <div className="notice info" data-testid="no-methods">
          <strong>No dose method produced results for this case.</strong>{' '}
          {r.unavailable.length === 0
            ? 'No dose method is available in this build yet; the geometry and radiological depths below are computed.'
            : null}
        </div>
      ) : null}
      {r && r.unavailable.some((u) => u.reason === NEEDS_WATER_DATA) ? (
        <div className="notice info" data-testid="needs-water">
          <strong>The type-A methods need water data</strong>: the case has no measured table.{' '}
          <button
            type="button"
            onClick={() => setWaterSource('modelled')}
            data-testid="quick-modelled"
          >
            Use the modelled beam
          </button>{' '}
          <button type="button" onClick={() => setTab('water')}>
            Load a measured table…
          </button>{' '}
          <button type="button" onClick={loadDemoTables} data-testid="quick-demo-water">
            Use the demo 6 MV table (invented data)
          </button>
        </div>
      ) : null}
      {r && r.unavailable.length > 0 ? (
        <details className="notice info" open={r.methods.length === 0} data-testid="unavailable">
          <summary>
            {r.unavailable.length} method{r.unavailable.length > 1 ? 's' : ''} not available
          </summary>
          <ul>
            {r.unavailable.map((u) => (
              <li key={u.id}>
                <code>{u.id}</code>: {u.reason}
              </li>
            ))}
          </ul>
        </details>
      ) : null}
    </div>
  );
}
