import { memo } from 'react';
// Charged-particle-equilibrium and other warnings of the calculation: message, depth range,
// methods concerned, and the explanation on demand. Filterable per method.
import { visibleWarnings, type DisplayWarning } from '../plots/warnings';
import { toggleWarningMethod, useAppStore } from '../state/store';

export const WarningList = memo(function WarningList({
  warnings,
}: {
  warnings: readonly DisplayWarning[];
}) {
  const hidden = useAppStore((s) => s.hiddenWarningMethods);
  if (warnings.length === 0) return null;
  const methodIds = [...new Set(warnings.flatMap((w) => w.methods))];
  const shown = visibleWarnings(warnings, hidden);
  return (
    <section className="warnings" aria-labelledby="warn-h">
      <h3 id="warn-h">Warnings ({shown.length})</h3>
      {methodIds.length > 0 ? (
        <fieldset className="warn-filter">
          <legend>Warnings for</legend>
          {methodIds.map((m) => (
            <label key={m}>
              <input
                type="checkbox"
                checked={!hidden.includes(m)}
                onChange={() => toggleWarningMethod(m)}
              />
              {m}
            </label>
          ))}
        </fieldset>
      ) : null}
      <ul>
        {shown.map((w) => (
          <li key={w.key} className={`warning sev-${w.severity}`} data-testid="warning">
            <details>
              <summary>
                <span className="warn-code">{w.code}</span>{' '}
                <span className="warn-range">
                  {w.range ? `${w.range.fromCm.toFixed(1)}–${w.range.toCm.toFixed(1)} cm` : ''}
                </span>{' '}
                {w.message}
              </summary>
              {w.numbers ? <p>{w.numbers}</p> : null}
              {w.advice ? <p>{w.advice}</p> : null}
              <p className="hint">
                Severity {w.severity}. Concerns:{' '}
                {w.methods.length ? w.methods.join(', ') : 'no method in particular'}
                {w.approximate.length ? ` (approximately: ${w.approximate.join(', ')})` : ''}
                {w.unaffected.length ? `; modelled by: ${w.unaffected.join(', ')}` : ''}
                {w.pointIds.length ? `; points inside: ${w.pointIds.join(', ')}` : ''}.
              </p>
            </details>
          </li>
        ))}
      </ul>
    </section>
  );
});
