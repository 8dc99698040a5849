// A number input that never loses what the user typed: a value that does not parse or breaks a
// rule stays in the field with a message naming the field; valid values go to the case at once.
import { useId, useState } from 'react';
import { endGesture, setDraft, useAppStore } from '../state/store';
import { formatField, parseNumberField, type NumberRule } from './fieldRules';

export interface NumberFieldProps {
  /** Draft key: stable across reordering (uses layer/point keys). */
  draftKey: string;
  label: string;
  rule: NumberRule;
  value: number | undefined;
  placeholder?: string;
  onCommit(value: number): void;
  /** Called when the field is emptied and empty is allowed (e.g. default density). */
  onClear?: () => void;
  testId?: string;
  hideLabel?: boolean;
}

export function NumberField(props: NumberFieldProps) {
  const id = useId();
  const draft = useAppStore((s) => s.drafts[props.draftKey]);
  const [editing, setEditing] = useState<string | null>(null);
  const text = draft?.text ?? editing ?? formatField(props.value);
  const onChange = (t: string) => {
    setEditing(t);
    if (t.trim() === '' && props.onClear) {
      setDraft(props.draftKey, null);
      props.onClear();
      return;
    }
    const r = parseNumberField(t, props.rule);
    if (r.ok) {
      setDraft(props.draftKey, null);
      props.onCommit(r.value);
    } else setDraft(props.draftKey, { text: t, message: r.message });
  };
  return (
    <div className={`field${draft ? ' invalid' : ''}`}>
      <label htmlFor={id} className={props.hideLabel ? 'sr-only' : undefined}>
        {props.label}
        {props.rule.unit && !props.hideLabel ? (
          <span className="unit"> ({props.rule.unit})</span>
        ) : null}
      </label>
      <input
        id={id}
        type="text"
        inputMode="decimal"
        value={text}
        placeholder={props.placeholder}
        aria-invalid={draft ? true : undefined}
        aria-describedby={draft ? `${id}-msg` : undefined}
        data-testid={props.testId}
        onChange={(e) => onChange(e.target.value)}
        onBlur={() => {
          setEditing(null);
          endGesture();
        }}
      />
      {props.hideLabel && props.rule.unit ? (
        <span className="unit-suffix">{props.rule.unit}</span>
      ) : null}
      {draft ? (
        <div className="field-message" id={`${id}-msg`} role="alert">
          {draft.message}
        </div>
      ) : null}
    </div>
  );
}
