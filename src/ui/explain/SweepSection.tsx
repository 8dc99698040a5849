// The sweep form: which input varies (a layer's density, the square field, the energy, the
// point's depth), over which range, for which energies; Run asks the factor-view worker, Cancel
// stops it (the worker is terminated and restarted on the next call). The chart and the CSV
// export show the answer with its conditions and notes.
import { useState } from 'react';
import { cancelExplainWork, getExplainWorker } from '../../compute/explainClient';
import type { ExplainLayer, SweepResult, SweepVariable } from '../../contract/explain';
import type { LaminaCase } from '../../io/caseSchema';
import type { WaterChoice } from '../../compute/waterSource';
import type { DoseQuantity } from '../../engine/dose/doseQuantity';
import { sweepCsv } from '../../io/sweepCsv';
import { downloadText } from '../download';
import { num } from './formatNumber';
import { SweepChart } from './SweepChart';

const VARIABLES: { id: SweepVariable; label: string }[] = [
  { id: 'density', label: 'Density of a layer' },
  { id: 'field', label: 'Square field size' },
  { id: 'energy', label: 'Beam energy (all six)' },
  { id: 'depth', label: 'Depth of the point' },
];
const ENERGIES = [
  ['Co-60', 'Co-60'],
  ['4MV', '4 MV'],
  ['6MV', '6 MV'],
  ['10MV', '10 MV'],
  ['15MV', '15 MV'],
  ['18MV', '18 MV'],
] as const;

interface Range {
  from: string;
  to: string;
  count: string;
}

function defaultRange(v: SweepVariable, totalCm: number): Range {
  if (v === 'density') return { from: '0.1', to: '1', count: '19' };
  if (v === 'field') return { from: '3', to: '30', count: '10' };
  return { from: '0', to: String(Math.round(totalCm * 100) / 100), count: '41' };
}

type Status =
  | { kind: 'idle' }
  | { kind: 'running' }
  | { kind: 'done'; result: SweepResult }
  | { kind: 'error'; message: string }
  | { kind: 'cancelled' };

export function SweepSection(props: {
  raw: LaminaCase;
  depthCm: number | null;
  layers: ExplainLayer[];
  water: WaterChoice;
  doseTo: DoseQuantity;
  width: number;
}) {
  const { raw, depthCm, layers, water, doseTo, width } = props;
  const totalCm = layers.at(-1)?.bottomCm ?? 1;
  const lightest = layers.reduce(
    (best, l) =>
      l.relativeElectronDensity < (layers[best]?.relativeElectronDensity ?? 2) ? l.index : best,
    0,
  );
  const [variable, setVariable] = useState<SweepVariable>('density');
  const [layerIndex, setLayerIndex] = useState<number | null>(null);
  const [range, setRange] = useState<Range>(() => defaultRange('density', totalCm));
  const [energies, setEnergies] = useState<string[]>(['6MV', '18MV']);
  const [status, setStatus] = useState<Status>({ kind: 'idle' });
  const layer = layerIndex ?? lightest;

  const run = () => {
    if (depthCm === null && variable !== 'depth') return;
    setStatus({ kind: 'running' });
    getExplainWorker()
      .cfSweep({
        case: raw,
        water: { kind: water },
        variable,
        depthCm: depthCm ?? 0,
        layerIndex: layer,
        from: Number(range.from),
        to: Number(range.to),
        count: Number(range.count),
        energies,
        options: { doseTo },
      })
      .then(
        (a) =>
          setStatus(
            a.ok
              ? { kind: 'done', result: a.result }
              : {
                  kind: 'error',
                  message: a.problems.map((p) => `${p.path}: ${p.message}`).join('; '),
                },
          ),
        (e: unknown) =>
          setStatus((s) =>
            s.kind === 'cancelled'
              ? s
              : { kind: 'error', message: e instanceof Error ? e.message : String(e) },
          ),
      );
  };
  const setVar = (v: SweepVariable) => {
    setVariable(v);
    setRange(defaultRange(v, totalCm));
  };
  const toggleEnergy = (e: string, on: boolean) =>
    setEnergies((list) =>
      on ? [...list, e].filter((x, i, a) => a.indexOf(x) === i) : list.filter((x) => x !== e),
    );
  const running = status.kind === 'running';
  const noEnergy = variable !== 'energy' && energies.length === 0;
  const noPoint = depthCm === null && variable !== 'depth';
  return (
    <section className="sweep" aria-labelledby="sweep-heading">
      <h3 id="sweep-heading">Sweep: CF at the point as one input varies</h3>
      <form
        className="sweep-form"
        onSubmit={(e) => {
          e.preventDefault();
          if (!running) run();
        }}
      >
        <label>
          <span>Vary</span>
          <select
            value={variable}
            onChange={(e) => setVar(e.target.value as SweepVariable)}
            data-testid="sweep-variable"
          >
            {VARIABLES.map((v) => (
              <option key={v.id} value={v.id}>
                {v.label}
              </option>
            ))}
          </select>
        </label>
        {variable === 'density' ? (
          <label>
            <span>Layer</span>
            <select
              value={layer}
              onChange={(e) => setLayerIndex(Number(e.target.value))}
              data-testid="sweep-layer"
            >
              {layers.map((l) => (
                <option key={l.index} value={l.index}>
                  {l.index + 1}: {l.material.replace(/ \(.*\)$/, '')}, {num(l.topCm, 4)}–
                  {num(l.bottomCm, 4)} cm
                </option>
              ))}
            </select>
          </label>
        ) : null}
        {variable !== 'energy' ? (
          <>
            {(['from', 'to', 'count'] as const).map((k) => (
              <label key={k}>
                <span>
                  {k === 'count'
                    ? 'Values'
                    : `${k === 'from' ? 'From' : 'To'} (${variable === 'density' ? 'g/cm³' : 'cm'})`}
                </span>
                <input
                  type="number"
                  inputMode="decimal"
                  step="any"
                  value={range[k]}
                  onChange={(e) => setRange({ ...range, [k]: e.target.value })}
                  data-testid={`sweep-${k}`}
                />
              </label>
            ))}
            <fieldset className="sweep-energies">
              <legend>Energies (one panel each)</legend>
              {ENERGIES.map(([id, label]) => (
                <label key={id} className="inline">
                  <input
                    type="checkbox"
                    checked={energies.includes(id)}
                    onChange={(e) => toggleEnergy(id, e.target.checked)}
                  />
                  {label}
                </label>
              ))}
            </fieldset>
          </>
        ) : null}
        <div className="sweep-actions">
          <button type="submit" disabled={running || noEnergy || noPoint} data-testid="sweep-run">
            Run sweep
          </button>
          {running ? (
            <button
              type="button"
              onClick={() => {
                setStatus({ kind: 'cancelled' });
                cancelExplainWork();
              }}
              data-testid="sweep-cancel"
            >
              Cancel
            </button>
          ) : null}
          {status.kind === 'done' ? (
            <button
              type="button"
              data-testid="sweep-export"
              onClick={() =>
                downloadText(
                  `lamina-sweep-${status.result.variable}.csv`,
                  sweepCsv(status.result),
                  'text/csv',
                )
              }
            >
              Export CSV
            </button>
          ) : null}
          <span className="sweep-status" role="status" data-testid="sweep-status">
            {running
              ? 'Sweeping… every method at each value'
              : status.kind === 'cancelled'
                ? 'Cancelled.'
                : noEnergy
                  ? 'Choose at least one energy.'
                  : noPoint
                    ? 'Enter a valid depth above first.'
                    : ''}
          </span>
        </div>
      </form>
      {status.kind === 'error' ? (
        <p className="notice error" role="alert" data-testid="sweep-error">
          {status.message}
        </p>
      ) : null}
      {status.kind === 'done' ? (
        <>
          <p className="sweep-conditions" data-testid="sweep-conditions">
            {status.result.conditions};{' '}
            {status.result.doseTo === 'water' ? 'dose to water' : 'dose to medium'}.
          </p>
          <SweepChart result={status.result} width={width} />
          <ul className="sweep-notes">
            {status.result.notes.map((n, i) => (
              <li key={i}>{n}</li>
            ))}
          </ul>
        </>
      ) : null}
    </section>
  );
}
