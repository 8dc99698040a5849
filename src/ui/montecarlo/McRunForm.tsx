// The run settings: histories (presets or typed, checked with a message), seed, dose to medium
// or to water, Start and Cancel.
import { useId } from 'react';
import { HISTORY_PRESETS, groupDigits, parseHistories, parseSeed, type Parsed } from './mcRunModel';
import { patchMcForm, useMcForm } from './mcRunner';

export interface McRunFormProps {
  running: boolean;
  /** Why Start is not possible (invalid case), or null. */
  blocked: string | null;
  onStart: (histories: number, seed: number, doseToWater: boolean) => void;
  onCancel: () => void;
}

function messageOf<T>(p: Parsed<T>): string | null {
  return p.ok ? null : p.message;
}

export function McRunForm({ running, blocked, onStart, onCancel }: McRunFormProps) {
  const form = useMcForm();
  const id = useId();
  const histories = parseHistories(form.historiesText);
  const seed = parseSeed(form.seedText);
  const canStart = histories.ok && seed.ok && !blocked && !running;
  return (
    <form
      className="mc-form"
      onSubmit={(e) => {
        e.preventDefault();
        if (canStart) onStart(histories.value, seed.value, form.doseToWater);
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
        <fieldset className="field segmented">
          <legend>Dose reported as</legend>
          <label>
            <input
              type="radio"
              name={`${id}-dm`}
              data-testid="mc-dose-medium"
              checked={!form.doseToWater}
              disabled={running}
              onChange={() => patchMcForm({ doseToWater: false })}
            />
            dose to medium
          </label>
          <label>
            <input
              type="radio"
              name={`${id}-dm`}
              data-testid="mc-dose-water"
              checked={form.doseToWater}
              disabled={running}
              onChange={() => patchMcForm({ doseToWater: true })}
            />
            dose to water (stopping-power ratio)
          </label>
        </fieldset>
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
