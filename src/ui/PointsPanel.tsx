// Points of interest on the central axis: typed here, or placed by clicking the depth ruler.
import { editCase, useAppStore, endGesture } from '../state/store';
import { totalThicknessCm } from '../state/editorCase';
import { NumberField } from './NumberField';
import { RULES } from './fieldRules';
import { addPoint, removePoint, updatePoint } from './pointOps';

export function PointsPanel() {
  const points = useAppStore((s) => s.history.present.points);
  const total = useAppStore((s) => totalThicknessCm(s.history.present));
  return (
    <section className="panel" aria-labelledby="points-h">
      <div className="panel-head">
        <h2 id="points-h">Points of interest</h2>
        <button type="button" onClick={() => editCase((c) => addPoint(c, Math.min(10, total / 2)))}>
          + Add point
        </button>
      </div>
      <p className="hint">Or click the depth ruler under the slabs to place one.</p>
      {points.length === 0 ? <p className="empty">No points yet.</p> : null}
      <ul className="point-list">
        {points.map((p, i) => (
          <li key={p.key} className="row">
            <div className="field">
              <label htmlFor={`pid-${p.key}`}>Name</label>
              <input
                id={`pid-${p.key}`}
                type="text"
                value={p.id}
                maxLength={40}
                onChange={(e) =>
                  editCase((c) => updatePoint(c, i, { id: e.target.value }), `${p.key}.id`)
                }
                onBlur={endGesture}
              />
            </div>
            <NumberField
              draftKey={`${p.key}.depthCm`}
              label="Depth"
              rule={RULES.pointDepth(p.id)}
              value={p.depthCm}
              testId={`point-${p.id}-depth`}
              onCommit={(v) => editCase((c) => updatePoint(c, i, { depthCm: v }), `${p.key}.depth`)}
            />
            <button
              type="button"
              className="icon"
              aria-label={`Remove point ${p.id}`}
              onClick={() => editCase((c) => removePoint(c, i))}
            >
              ✕
            </button>
          </li>
        ))}
      </ul>
    </section>
  );
}
