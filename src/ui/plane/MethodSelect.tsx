// A choice of plane method; methods without a plane stay selectable (the view then says why).
import type { PlaneMethodId } from './planeSources';

export function MethodSelect(props: {
  id: string;
  label: string;
  value: PlaneMethodId;
  onChange: (id: PlaneMethodId) => void;
  sources: readonly { id: PlaneMethodId; label: string; grid: unknown; reason: string | null }[];
}) {
  return (
    <label className="inline">
      <span>{props.label}</span>
      <select
        data-testid={props.id}
        value={props.value}
        onChange={(e) => props.onChange(e.target.value as PlaneMethodId)}
      >
        {props.sources.map((s) => (
          <option key={s.id} value={s.id}>
            {s.label}
            {s.grid ? '' : s.reason === 'being calculated…' ? ' (calculating…)' : ' (no plane)'}
          </option>
        ))}
      </select>
    </label>
  );
}
