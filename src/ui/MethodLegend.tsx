// Legend and method filter: one checkbox per method in the report, drawn with its line style.
import type { MethodResult } from '../engine/methodResult';
import type { SeriesStyle } from '../plots/palette';
import { toggleMethod, useAppStore } from '../state/store';

export function MethodLegend({
  methods,
  styles,
}: {
  methods: readonly MethodResult[];
  styles: Map<string, SeriesStyle>;
}) {
  const hidden = useAppStore((s) => s.hiddenMethods);
  return (
    <fieldset className="legend">
      <legend>Methods shown</legend>
      {methods.map((m) => {
        const st = styles.get(m.id);
        return (
          <label
            key={m.id}
            className="legend-item"
            title={`${m.variant} — ${m.methodClass}; water data: ${m.waterData}`}
          >
            <input
              type="checkbox"
              checked={!hidden.includes(m.id)}
              onChange={() => toggleMethod(m.id)}
              data-testid={`toggle-${m.id}`}
            />
            <svg width="26" height="10" aria-hidden="true">
              <line
                x1="0"
                x2="26"
                y1="5"
                y2="5"
                stroke={st?.color}
                strokeWidth="2.5"
                strokeDasharray={st?.dash || undefined}
              />
            </svg>
            <span>{m.label}</span>
            <span className="legend-class">{m.methodClass}</span>
          </label>
        );
      })}
    </fieldset>
  );
}
