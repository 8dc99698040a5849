// The "Factors & sweeps" view: at a chosen depth (a point of the case or any depth), every
// method's CF written out from the terms the method itself computed in the worker, and sweeps of
// the CF at that depth against density, field size, energy or depth.
import { useMemo, useState } from 'react';
import { toCaseFile, totalThicknessCm } from '../../state/editorCase';
import { useAppStore } from '../../state/store';
import { useElementWidth } from '../useElementWidth';
import { FactorCard } from './FactorCard';
import { num } from './formatNumber';
import { SweepSection } from './SweepSection';
import { useExplanation } from './useExplanation';
import './explain.css';

export function ExplainPanel() {
  const present = useAppStore((s) => s.history.present);
  const water = useAppStore((s) => s.waterSource);
  const doseTo = useAppStore((s) => s.check.doseTo);
  const raw = useMemo(() => toCaseFile(present), [present]);
  const key = useMemo(() => JSON.stringify(raw), [raw]);
  const totalCm = totalThicknessCm(present);
  const points = raw.points;
  const [pick, setPick] = useState<string>(() => (points[0] ? `point:${points[0].id}` : 'depth'));
  const [depthText, setDepthText] = useState<string>(() =>
    String(points[0]?.depthCm ?? Math.round(totalCm * 50) / 100),
  );
  const [retry, setRetry] = useState(0);
  const [rootRef, width] = useElementWidth<HTMLDivElement>();

  const picked = pick.startsWith('point:')
    ? points.find((p) => `point:${p.id}` === pick)
    : undefined;
  const typed = Number(depthText);
  const depthProblem =
    picked || (depthText.trim() !== '' && Number.isFinite(typed) && typed >= 0 && typed <= totalCm)
      ? null
      : `Depth: enter a number from 0 to ${num(totalCm, 4)} cm.`;
  const depthCm = picked ? picked.depthCm : depthProblem ? null : typed;
  const {
    explanation: e,
    updating,
    error,
  } = useExplanation(raw, key, depthCm, water, doseTo, retry);

  return (
    <div className="explain-view" ref={rootRef} data-testid="explain-view">
      <h2>Factors at a point</h2>
      <p className="explain-intro">
        Each method’s correction factor written out from the terms the method computed for the
        results: the product of the listed factors is the CF in the results. A teaching and checking
        aid; the cautions above apply.
      </p>
      <div className="explain-pick">
        <label>
          <span>Point of interest</span>
          <select
            value={pick}
            onChange={(ev) => setPick(ev.target.value)}
            data-testid="explain-point"
          >
            {points.map((p) => (
              <option key={p.id} value={`point:${p.id}`}>
                {p.id} at {p.depthCm} cm
              </option>
            ))}
            <option value="depth">Another depth…</option>
          </select>
        </label>
        {pick === 'depth' ? (
          <label>
            <span>Depth (cm)</span>
            <input
              type="number"
              inputMode="decimal"
              step="any"
              min={0}
              max={totalCm}
              value={depthText}
              aria-invalid={depthProblem !== null}
              aria-describedby={depthProblem ? 'explain-depth-problem' : undefined}
              onChange={(ev) => setDepthText(ev.target.value)}
              data-testid="explain-depth"
            />
          </label>
        ) : null}
        <span className="explain-status" role="status" data-testid="explain-status">
          {updating ? 'calculating…' : ''}
        </span>
      </div>
      {depthProblem && !picked ? (
        <p className="notice error" id="explain-depth-problem" role="alert">
          {depthProblem}
        </p>
      ) : null}
      {error ? (
        <p className="notice error" role="alert" data-testid="explain-error">
          {error}{' '}
          <button type="button" onClick={() => setRetry((r) => r + 1)}>
            Retry
          </button>
        </p>
      ) : null}
      {e ? (
        <>
          <p className="explain-where" data-testid="explain-where">
            Depth {num(e.depthCm, 4)} cm in layer {e.layerIndex + 1} (
            {e.layers[e.layerIndex]?.material.replace(/ \(.*\)$/, '')}), radiological depth{' '}
            {num(e.radiologicalDepthCm, 4)} cm;{' '}
            {e.doseTo === 'water' ? 'dose to water' : 'dose to medium'}; water data: {e.waterData}.
          </p>
          <div className={updating ? 'factor-cards stale' : 'factor-cards'}>
            {e.methods.map((m) => (
              <FactorCard key={m.id} m={m} layers={e.layers} />
            ))}
          </div>
          <ul className="explain-notes">
            {e.notes.map((n, i) => (
              <li key={i}>{n}</li>
            ))}
          </ul>
          <SweepSection
            raw={raw}
            depthCm={depthCm}
            layers={e.layers}
            water={water}
            doseTo={doseTo}
            width={width}
          />
        </>
      ) : !error ? (
        <p className="empty">Calculating…</p>
      ) : null}
    </div>
  );
}
