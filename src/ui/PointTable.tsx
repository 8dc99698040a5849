import { memo } from 'react';
// Every method's correction factor and dose per MU at each point of interest: one row per
// method, one column pair per point. A missing value is a dash with its reason (the method's
// flags at that point), never NaN.
import type { CalcReport } from '../contract/reports';
import type { MethodPoint } from '../engine/methodResult';
import { useAppStore } from '../state/store';
import { methodStyles } from './series';

function reasonOf(p: MethodPoint | undefined): string {
  if (!p) return 'this method gave no value at this point';
  return p.flags.length ? p.flags.join('; ') : 'the method gives no value here';
}

function Value({
  v,
  digits,
  p,
}: {
  v: number | null | undefined;
  digits: number;
  p: MethodPoint | undefined;
}) {
  if (v === null || v === undefined || !Number.isFinite(v)) {
    const reason = reasonOf(p);
    return (
      <span className="missing" title={reason}>
        —<span className="sr-only"> ({reason})</span>
      </span>
    );
  }
  return <>{v.toFixed(digits)}</>;
}

export const PointTable = memo(function PointTable({ report }: { report: CalcReport }) {
  const hidden = useAppStore((s) => s.hiddenMethods);
  const methods = report.methods.filter((m) => !hidden.includes(m.id));
  const styles = methodStyles(report);
  if (report.points.length === 0)
    return <p className="empty">No points of interest: add one to see values.</p>;
  if (methods.length === 0) return null;
  return (
    <div className="table-wrap">
      <table className="point-table" data-testid="point-table">
        <caption>Values at the points of interest (CF = D_het / D_water at the same point)</caption>
        <thead>
          <tr>
            <th scope="col" rowSpan={2} className="method">
              Method
            </th>
            {report.points.map((p) => (
              <th scope="colgroup" colSpan={2} key={p.id} className="group-start">
                {p.id}
                <br />
                <span className="hint">
                  {p.depthCm.toFixed(2)} cm (radiological {p.radiologicalDepthCm.toFixed(2)} cm)
                </span>
              </th>
            ))}
          </tr>
          <tr className="sub">
            {report.points.map((p) => [
              <th scope="col" key={`${p.id}-cf`} className="group-start">
                CF
              </th>,
              <th scope="col" key={`${p.id}-d`}>
                cGy/MU
              </th>,
            ])}
          </tr>
        </thead>
        <tbody>
          {methods.map((m) => {
            const st = styles.get(m.id);
            return (
              <tr key={m.id}>
                <th
                  scope="row"
                  className="method"
                  title={`${m.variant}; water data: ${m.waterData}`}
                >
                  <svg width="22" height="8" aria-hidden="true">
                    <line
                      x1="0"
                      x2="22"
                      y1="4"
                      y2="4"
                      stroke={st?.color}
                      strokeWidth="2"
                      strokeDasharray={st?.dash || undefined}
                    />
                  </svg>{' '}
                  {m.label}
                </th>
                {report.points.map((p) => {
                  const mp = m.points.find((q) => q.id === p.id);
                  return [
                    <td
                      className="num group-start"
                      key={`${p.id}-cf`}
                      data-testid={`cf-${m.id}-${p.id}`}
                    >
                      <Value v={mp?.cf} digits={3} p={mp} />
                    </td>,
                    <td className="num" key={`${p.id}-d`} data-testid={`dose-${m.id}-${p.id}`}>
                      <Value v={mp?.dosePerMuCGy} digits={3} p={mp} />
                      {mp?.sigmaDosePerMuCGy !== undefined && Number.isFinite(mp.sigmaDosePerMuCGy)
                        ? ` ± ${mp.sigmaDosePerMuCGy.toFixed(3)}`
                        : ''}
                      {mp && mp.flags.length > 0 && mp.dosePerMuCGy !== null ? (
                        <span className="flag" title={mp.flags.join('; ')} tabIndex={0}>
                          {' '}
                          ⚑<span className="sr-only">{mp.flags.join('; ')}</span>
                        </span>
                      ) : null}
                    </td>,
                  ];
                })}
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
});
