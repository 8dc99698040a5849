// The run settings: histories (presets or typed, checked with a message), seed, Start and
// Cancel. The dose convention is the page's (one choice for every method), shown here.
import { useId } from 'react';
import { HISTORY_PRESETS, groupDigits, parseHistories, parseSeed, type Parsed } from './mcRunModel';
import { patchMcForm, useMcForm } from './mcRunner';
import { doseQuantityLabel } from '../../engine/dose/doseQuantity';
import { useAppStore } from '../../state/store';

export interface McRunFormProps {
  running: boolean;
  /** Why Start is not possible (invalid case), or null. */
  blocked: string | null;
  onStart: (histories: number, seed: number) => void;
  onCancel: () => void;
}

function messageOf<T>(p: Parsed<T>): string | null {
  return p.ok ? null : p.message;
}

export function McRunForm({ running, blocked, onStart, onCancel }: McRunFormProps) {
  const form = useMcForm();
  const doseTo = useAppStore((s) => s.check.doseTo);
  const id = useId();
  const histories = parseHistories(form.historiesText);
  const seed = parseSeed(form.seedText);
  const canStart = histories.ok && seed.ok && !blocked && !running;
  return (
    <form
      className="mc-form"
      onSubmit={(e) => {
        e.preventDefault();
        if (canStart) onStart(histories.value, seed.value);
      }}
    >
      <fieldset className="field">
        <legend>Histories per run (case, water and calibration runs each)</legend>
        <div className="mc-presets">
          {HISTORY_PRESETS.map((p) => (
            <button
              key={p.histories}
              type="button"
              data-testid={`mc-preset-${p.histories}`}
              aria-pressed={histories.ok && histories.value === p.histories}
              disabled={running}
              onClick={() => patchMcForm({ historiesText: String(p.histories) })}
            >
              {p.label}
            </button>
          ))}
        </div>
        <div className={histories.ok ? 'field' : 'field invalid'}>
          <label htmlFor={`${id}-h`}>Histories (typed; 2e5, 1 000 000 accepted)</label>
          <input
            id={`${id}-h`}
            data-testid="mc-histories"
            type="text"
            inputMode="numeric"
            value={form.historiesText}
            disabled={running}
            aria-invalid={!histories.ok}
            aria-describedby={`${id}-hm`}
            onChange={(e) => patchMcForm({ historiesText: e.target.value })}
          />
          <span id={`${id}-hm`} className={histories.ok ? 'hint' : 'field-message'} role="status">
            {histories.ok ? `${groupDigits(histories.value)} histories` : messageOf(histories)}
          </span>
        </div>
      </fieldset>
      <div className="row">
        <div className={seed.ok ? 'field' : 'field invalid'}>
          <label htmlFor={`${id}-s`}>Seed (same seed, same result)</label>
          <input
            id={`${id}-s`}
            data-testid="mc-seed"
            type="text"
            inputMode="numeric"
            value={form.seedText}
            disabled={running}
            aria-invalid={!seed.ok}
            onChange={(e) => patchMcForm({ seedText: e.target.value })}
          />
          {seed.ok ? null : <span className="field-message">{messageOf(seed)}</span>}
        </div>
        <p className="hint" data-testid="mc-dose-to">
          Scored as dose to medium; reported as {doseQuantityLabel(doseTo)}, the page&apos;s choice
          for every method (Dose reported as, above the charts).
        </p>
      </div>
      <div className="mc-actions">
        <button type="submit" data-testid="mc-start" disabled={!canStart}>
          Start
        </button>
        <button type="button" data-testid="mc-cancel" disabled={!running} onClick={onCancel}>
          Cancel
        </button>
        {blocked ? <span className="field-message">{blocked}</span> : null}
      </div>
    </form>
  );
}
