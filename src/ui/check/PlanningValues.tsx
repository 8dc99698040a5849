// The planning system's values to compare with: dose and MU per beam and point. Beam 1's values
// are saved in the case (points[].planningDoseCGy / planningMu); extra beams keep them in theirs.
import type { CasePoint } from '../../io/caseSchema';
import { editCase, useAppStore } from '../../state/store';
import { patchExtraBeam, useCheckStore } from './checkStore';
import { NumInput } from './NumInput';

type Field = 'planningDoseCGy' | 'planningMu';

function withValue<P extends CasePoint>(p: P, field: Field, v: number | null): P {
  const next = { ...p };
  if (v === null) delete next[field];
  else next[field] = v;
  return next;
}

function Row({
  beamId,
  point,
  onSet,
}: {
  beamId: string;
  point: CasePoint;
  onSet: (field: Field, v: number | null) => void;
}) {
  const tid = `${beamId}-${point.id}`.replace(/[^A-Za-z0-9_-]/g, '_');
  return (
    <tr>
      <td>{beamId}</td>
      <td>{point.id}</td>
      <td>{point.depthCm.toFixed(2)}</td>
      <td>
        <NumInput
          label={`Planning dose, beam ${beamId}, point ${point.id}`}
          hideLabel
          allowEmpty
          min={-1e-12}
          value={point.planningDoseCGy}
          testId={`plan-dose-${tid}`}
          onCommit={(v) => onSet('planningDoseCGy', v)}
        />
      </td>
      <td>
        <NumInput
          label={`Planning MU, beam ${beamId}, point ${point.id}`}
          hideLabel
          allowEmpty
          value={point.planningMu}
          testId={`plan-mu-${tid}`}
          onCommit={(v) => onSet('planningMu', v)}
        />
      </td>
    </tr>
  );
}

export function PlanningValues() {
  const points = useAppStore((s) => s.history.present.points);
  const first = useCheckStore((s) => s.firstBeam);
  const extra = useCheckStore((s) => s.extraBeams);
  return (
    <table className="check-table" data-testid="planning-values">
      <caption>Planning system values (per beam, at each point; leave empty to skip)</caption>
      <thead>
        <tr>
          <th scope="col">Beam</th>
          <th scope="col">Point</th>
          <th scope="col">Depth (cm)</th>
          <th scope="col">Planning dose (cGy)</th>
          <th scope="col">Planning MU</th>
        </tr>
      </thead>
      <tbody>
        {points.map((p) => (
          <Row
            key={p.key}
            beamId={first.id}
            point={p}
            onSet={(field, v) =>
              editCase(
                (c) => ({
                  ...c,
                  points: c.points.map((q) => (q.key === p.key ? withValue(q, field, v) : q)),
                }),
                `planning-${field}-${p.key}`,
              )
            }
          />
        ))}
        {extra.flatMap((b) =>
          b.case.points.map((p, i) => (
            <Row
              key={`${b.key}-${i}`}
              beamId={b.id}
              point={p}
              onSet={(field, v) => {
                const now = useCheckStore.getState().extraBeams.find((x) => x.key === b.key);
                if (!now) return;
                const pts = now.case.points.map((q, k) => (k === i ? withValue(q, field, v) : q));
                patchExtraBeam(b.key, { case: { ...now.case, points: pts } });
              }}
            />
          )),
        )}
      </tbody>
    </table>
  );
}
