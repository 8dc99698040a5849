// A small number input for the check panel: keeps the typed text, commits a valid number (or
// null when emptied and allowed), and marks text that does not parse or breaks the minimum.
import { useId, useState } from 'react';

export interface NumInputProps {
  label: string;
  value: number | null | undefined;
  onCommit: (value: number | null) => void;
  allowEmpty?: boolean;
  /** Exclusive minimum (default 0: values must be > 0). */
  min?: number;
  testId?: string;
  hideLabel?: boolean;
  unit?: string;
}

export function NumInput(p: NumInputProps) {
  const id = useId();
  const shown = p.value === null || p.value === undefined ? '' : String(p.value);
  // The typed text while editing (or while it is invalid); otherwise the value from outside.
  const [editing, setEditing] = useState<string | null>(null);
  const [bad, setBad] = useState<string | null>(null);
  const text = editing ?? shown;
  const onChange = (t: string) => {
    setEditing(t);
    if (t.trim() === '') {
      if (p.allowEmpty) {
        setBad(null);
        p.onCommit(null);
      } else setBad('a value is needed');
      return;
    }
    const v = Number(t.replace(',', '.'));
    if (!Number.isFinite(v)) setBad('not a number');
    else if (v <= (p.min ?? 0)) setBad(`must be > ${p.min ?? 0}`);
    else {
      setBad(null);
      p.onCommit(v);
    }
  };
  return (
    <span className={`num-input${bad ? ' invalid' : ''}`}>
      <label htmlFor={id} className={p.hideLabel ? 'sr-only' : undefined}>
        {p.label}
        {p.unit && !p.hideLabel ? ` (${p.unit})` : ''}
      </label>
      <input
        id={id}
        type="text"
        inputMode="decimal"
        value={text}
        data-testid={p.testId}
        aria-invalid={bad ? true : undefined}
        title={bad ?? undefined}
        onChange={(e) => onChange(e.target.value)}
        onBlur={() => {
          if (!bad) setEditing(null);
        }}
      />
      {bad ? <span className="num-msg">{bad}</span> : null}
    </span>
  );
}
