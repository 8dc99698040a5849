// The layer table: material, thickness and density of each slab, with add, split, remove and
// reorder. The slab strip beside the chart shows the same stack to scale.
import { getMaterial, MATERIAL_IDS, isMaterialId } from '../engine/materials/materialLibrary';
import { memo, useDeferredValue } from 'react';
import { boundariesCm, type EditorLayer } from '../state/editorCase';
import { addLayer, moveLayer, removeLayer, splitLayer, updateLayer } from '../state/layerOps';
import { editCase, endGesture, useAppStore } from '../state/store';
import { NumberField } from './NumberField';
import { RULES } from './fieldRules';

export function LayerList() {
  // Deferred: while a boundary is dragged the strip and the curves are drawn first; the table's
  // typed values follow in the next idle moment.
  const layers = useDeferredValue(useAppStore((s) => s.history.present.layers));
  const bounds = boundariesCm({ layers });
  return (
    <section className="panel" aria-labelledby="layers-h">
      <div className="panel-head">
        <h2 id="layers-h">Layers</h2>
        <button type="button" onClick={() => editCase((c) => addLayer(c))} data-testid="add-layer">
          + Add layer
        </button>
      </div>
      <p className="hint">
        From the surface down. Thickness along the beam axis; density blank = material default.
      </p>
      <ol className="layer-list">
        {layers.map((l, i) => (
          <LayerRow
            key={l.key}
            layer={l}
            index={i}
            count={layers.length}
            fromCm={bounds[i] ?? 0}
            toCm={bounds[i + 1] ?? 0}
          />
        ))}
      </ol>
    </section>
  );
}

interface LayerRowProps {
  layer: EditorLayer;
  index: number;
  count: number;
  fromCm: number;
  toCm: number;
}

// Memoised: dragging a boundary changes two layers; the other rows (each with its material list)
// are left alone.
const LayerRow = memo(function LayerRow({
  layer: l,
  index: i,
  count,
  fromCm: from,
  toCm: to,
}: LayerRowProps) {
  const n = i + 1;
  const m = getMaterial(l.materialId);
  return (
    <li className="layer-row" data-testid={`layer-${n}`}>
      <div className="layer-title">
        <span className="layer-n">{n}</span>
        <input
          type="text"
          className="layer-label"
          aria-label={`Layer ${n} name`}
          placeholder={m.label.replace(/ \(.*\)$/, '')}
          maxLength={80}
          value={l.label ?? ''}
          onChange={(e) => {
            const label = e.target.value;
            editCase(
              (c) => updateLayer(c, i, { label: label === '' ? undefined : label }),
              `${l.key}.label`,
            );
          }}
          onBlur={endGesture}
        />
        <span className="layer-range">
          {from.toFixed(1)}–{to.toFixed(1)} cm
        </span>
        <span className="layer-actions">
          <button
            type="button"
            aria-label={`Move layer ${n} up`}
            title="Move up"
            disabled={i === 0}
            onClick={() => editCase((c) => moveLayer(c, i, -1))}
          >
            ↑
          </button>
          <button
            type="button"
            aria-label={`Move layer ${n} down`}
            title="Move down"
            disabled={i === count - 1}
            onClick={() => editCase((c) => moveLayer(c, i, 1))}
          >
            ↓
          </button>
          <button
            type="button"
            aria-label={`Split layer ${n}`}
            title="Split in two"
            onClick={() => editCase((c) => splitLayer(c, i))}
          >
            Split
          </button>
          <button
            type="button"
            aria-label={`Remove layer ${n}`}
            title="Remove"
            disabled={count <= 1}
            onClick={() => editCase((c) => removeLayer(c, i))}
          >
            ✕
          </button>
        </span>
      </div>
      <div className="row">
        <div className="field">
          <label htmlFor={`mat-${l.key}`}>Material</label>
          <select
            id={`mat-${l.key}`}
            data-testid={`layer-${n}-material`}
            value={l.materialId}
            onChange={(e) => {
              const id = e.target.value;
              if (isMaterialId(id)) editCase((c) => updateLayer(c, i, { materialId: id }));
            }}
          >
            {MATERIAL_IDS.map((id) => (
              <option key={id} value={id}>
                {getMaterial(id).label}
              </option>
            ))}
          </select>
        </div>
        <NumberField
          draftKey={`${l.key}.thicknessCm`}
          label="Thickness"
          rule={RULES.thickness(n)}
          value={l.thicknessCm}
          testId={`layer-${n}-thickness`}
          onCommit={(v) => editCase((c) => updateLayer(c, i, { thicknessCm: v }), `${l.key}.t`)}
        />
        <NumberField
          draftKey={`${l.key}.densityGPerCm3`}
          label="Density"
          rule={RULES.density(n)}
          value={l.densityGPerCm3}
          placeholder={String(m.defaultDensityGPerCm3)}
          testId={`layer-${n}-density`}
          onCommit={(v) => editCase((c) => updateLayer(c, i, { densityGPerCm3: v }), `${l.key}.d`)}
          onClear={() =>
            editCase((c) => updateLayer(c, i, { densityGPerCm3: undefined }), `${l.key}.d`)
          }
        />
      </div>
    </li>
  );
});
