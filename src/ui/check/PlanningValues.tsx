// The planning system's values to compare with: one MU per beam (saved in the beam's case as
// beam.planningMu) and the dose at each point from that beam (points[].planningDoseCGy). Beam 1
// is the editor's case (edits are undoable); extra beams keep the values in their own cases.
import type { CaseBeam, CasePoint, LaminaCase } from '../../io/caseSchema';
import { editCase, useAppStore } from '../../state/store';
import { patchExtraBeam, useCheckStore } from './checkStore';
import { NumInput } from './NumInput';

function testIdOf(...parts: string[]): string {
  return parts.join('-').replace(/[^A-Za-z0-9_-]/g, '_');
}

function withMu(beam: CaseBeam, v: number | null): CaseBeam {
  const next = { ...beam };
  if (v === null) delete next.planningMu;
  else next.planningMu = v;
  return next;
}

function withDose<P extends CasePoint>(p: P, v: number | null): P {
  const next = { ...p };
  if (v === null) delete next.planningDoseCGy;
  else next.planningDoseCGy = v;
  return next;
}

function patchExtraCase(key: string, fn: (c: LaminaCase) => LaminaCase): void {
  const now = useCheckStore.getState().extraBeams.find((x) => x.key === key);
  if (now) patchExtraBeam(key, { case: fn(now.case) });
}

interface BeamRow {
  key: string;
  id: string;
  mu: number | undefined;
  setMu: (v: number | null) => void;
  points: { key: string; point: CasePoint; setDose: (v: number | null) => void }[];
}

export function PlanningValues() {
  const editor = useAppStore((s) => s.history.present);
  const first = useCheckStore((s) => s.firstBeam);
  const extra = useCheckStore((s) => s.extraBeams);
  const rows: BeamRow[] = [
    {
      key: 'first',
      id: first.id,
      mu: editor.beam.planningMu,
      setMu: (v) => editCase((c) => ({ ...c, beam: withMu(c.beam, v) }), 'planning-mu'),
      points: editor.points.map((p) => ({
        key: p.key,
        point: p,
        setDose: (v) =>
          editCase(
            (c) => ({
              ...c,
              points: c.points.map((q) => (q.key === p.key ? withDose(q, v) : q)),
            }),
            `planning-dose-${p.key}`,
          ),
      })),
    },
    ...extra.map((b): BeamRow => ({
      key: b.key,
      id: b.id,
      mu: b.case.beam.planningMu,
      setMu: (v) => patchExtraCase(b.key, (c) => ({ ...c, beam: withMu(c.beam, v) })),
      points: b.case.points.map((p, i) => ({
        key: `${b.key}-${i}`,
        point: p,
        setDose: (v) =>
          patchExtraCase(b.key, (c) => ({
            ...c,
            points: c.points.map((q, k) => (k === i ? withDose(q, v) : q)),
          })),
      })),
    })),
  ];
  return (
    <table className="check-table" data-testid="planning-values">
      <caption>
        Planning system values: one MU per beam, and the dose from that beam at each point (leave
        empty to skip)
      </caption>
      <thead>
        <tr>
          <th scope="col">Beam</th>
          <th scope="col">Planning MU</th>
          <th scope="col">Point</th>
          <th scope="col">Depth (cm)</th>
          <th scope="col">Planning dose (cGy)</th>
        </tr>
      </thead>
      {rows.map((b) => (
        <tbody key={b.key} className="planning-beam">
          {(b.points.length > 0 ? b.points : [null]).map((p, k) => (
            <tr key={p?.key ?? 'none'}>
              {k === 0 ? (
                <>
                  <th scope="rowgroup" rowSpan={Math.max(1, b.points.length)}>
                    {b.id}
                  </th>
                  <td rowSpan={Math.max(1, b.points.length)}>
                    <NumInput
                      label={`Planning MU, beam ${b.id}`}
                      hideLabel
                      allowEmpty
                      value={b.mu}
                      testId={testIdOf('plan-mu', b.id)}
                      onCommit={b.setMu}
                    />
                  </td>
                </>
              ) : null}
              {p ? (
                <>
                  <td>{p.point.id}</td>
                  <td>{p.point.depthCm.toFixed(2)}</td>
                  <td>
                    <NumInput
                      label={`Planning dose, beam ${b.id}, point ${p.point.id}`}
                      hideLabel
                      allowEmpty
                      min={-1e-12}
                      value={p.point.planningDoseCGy}
                      testId={testIdOf('plan-dose', b.id, p.point.id)}
                      onCommit={p.setDose}
                    />
                  </td>
                </>
              ) : (
                <td colSpan={3}>(no points)</td>
              )}
            </tr>
          ))}
        </tbody>
      ))}
    </table>
  );
}
