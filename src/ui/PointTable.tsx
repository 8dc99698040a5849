// Every method's correction factor and dose per MU at each point of interest. A missing value
// is a dash with its reason (the method's flags at that point), never NaN.
import type { CalcReport } from '../compute/calculateCase';
import type { MethodPoint } from '../engine/methodResult';
import { useAppStore } from '../state/store';
import { methodStyles } from './series';

function cell(v: number | null | undefined, digits: number, reason: string) {
  if (v === null || v === undefined || !Number.isFinite(v))
    return (
      <span className="missing" title={reason}>
        —<span className="sr-only"> ({reason})</span>
      </span>
    );
  return v.toFixed(digits);
}

function reasonOf(p: MethodPoint | undefined): string {
  if (!p) return 'this method gave no value at this point';
  return p.flags.length ? p.flags.join('; ') : 'the method gives no value here';
}

export function PointTable({ report }: { report: CalcReport }) {
  const hidden = useAppStore((s) => s.hiddenMethods);
  const methods = report.methods.filter((m) => !hidden.includes(m.id));
  const styles = methodStyles(report);
  if (report.points.length === 0)
    return <p className="empty">No points of interest: add one to see values.</p>;
  if (methods.length === 0) return null;
  return (
    <div className="table-wrap">
      <table className="point-table" data-testid="point-table">
        <caption>Values at the points of interest</caption>
        <thead>
          <tr>
            <th scope="col">Point</th>
            <th scope="col">Depth (cm)</th>
            <th scope="col">Radiological depth (cm)</th>
            {methods.map((m) => (
              <th scope="colgroup" colSpan={2} key={m.id}>
                <span
                  className="swatch"
                  style={{ background: styles.get(m.id)?.color }}
                  aria-hidden="true"
                />
                {m.label}
              </th>
            ))}
          </tr>
          <tr className="sub">
            <th />
            <th />
            <th />
            {methods.map((m) => [
              <th scope="col" key={`${m.id}-cf`}>
                CF
              </th>,
              <th scope="col" key={`${m.id}-d`}>
                cGy/MU
              </th>,
            ])}
          </tr>
        </thead>
        <tbody>
          {report.points.map((p) => (
            <tr key={p.id} data-testid={`point-row-${p.id}`}>
              <th scope="row">{p.id}</th>
              <td className="num">{p.depthCm.toFixed(2)}</td>
              <td className="num">{p.radiologicalDepthCm.toFixed(2)}</td>
              {methods.map((m) => {
                const mp = m.points.find((q) => q.id === p.id);
                const reason = reasonOf(mp);
                return [
                  <td className="num" key={`${m.id}-cf`} data-testid={`cf-${m.id}-${p.id}`}>
                    {cell(mp?.cf, 3, reason)}
                  </td>,
                  <td className="num" key={`${m.id}-d`} data-testid={`dose-${m.id}-${p.id}`}>
                    {cell(mp?.dosePerMuCGy, 3, reason)}
                    {mp?.sigmaDosePerMuCGy !== undefined && Number.isFinite(mp.sigmaDosePerMuCGy)
                      ? ` ± ${mp.sigmaDosePerMuCGy.toFixed(3)}`
                      : ''}
                    {mp && mp.flags.length > 0 && mp.dosePerMuCGy !== null ? (
                      <span className="flag" title={mp.flags.join('; ')}>
                        {' '}
                        ⚑<span className="sr-only">{mp.flags.join('; ')}</span>
                      </span>
                    ) : null}
                  </td>,
                ];
              })}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
