// The check's results: a verdict banner, the per-beam table (every method at every point) and
// the totals over beams. Verdicts are words as well as colours.
import type { PlanCheck } from '../../engine/check/planCheck';
import type { Verdict } from '../../engine/check/tolerance';
import { VERDICT_TEXT } from '../../io/report/reportModel';
import {
  beamVerdictHeaders,
  beamVerdictRows,
  pointTableRows,
  POINT_TABLE_HEADERS,
  totalTableRows,
  TOTAL_TABLE_HEADERS,
} from '../../io/report/reportTables';

const CELL_TEXT: Record<string, string> = {
  fail: 'FAIL',
  pass: 'pass',
  uncertain: 'run longer (±2σ)',
};

function VerdictCell({ v }: { v: string }) {
  return (
    <td
      className={`verdict verdict-${v}`}
      title={v === 'uncertain' ? VERDICT_TEXT.uncertain : undefined}
    >
      {CELL_TEXT[v] ?? v}
    </td>
  );
}

function RowsTable({
  caption,
  headers,
  rows,
  testId,
}: {
  caption: string;
  headers: string[];
  rows: string[][];
  testId: string;
}) {
  const last = headers.length - 1;
  return (
    <div className="table-wrap">
      <table className="check-table results" data-testid={testId}>
        <caption>{caption}</caption>
        <thead>
          <tr>
            {headers.map((h) => (
              <th key={h} scope="col">
                {h}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {rows.map((r, i) => (
            <tr key={i}>
              {r.map((c, k) => (k === last ? <VerdictCell key={k} v={c} /> : <td key={k}>{c}</td>))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

function VerdictGrid({ check }: { check: PlanCheck }) {
  const headers = beamVerdictHeaders(check);
  return (
    <div className="table-wrap">
      <table className="check-table results" data-testid="check-beam-verdicts">
        <caption>Verdict per beam and method</caption>
        <thead>
          <tr>
            {headers.map((h, k) => (
              <th key={h} scope="col" title={k > 0 ? check.methods[k - 1]?.label : undefined}>
                {h}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {beamVerdictRows(check).map(([beam, ...vs]) => (
            <tr key={beam}>
              <th scope="row">{beam}</th>
              {vs.map((v, k) => (
                <VerdictCell key={k} v={v} />
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

export function VerdictBanner({ check }: { check: PlanCheck }) {
  const m = check.methods.find((x) => x.id === check.decisiveMethodId);
  const v: Verdict = check.verdict;
  return (
    <p className={`check-verdict verdict-${v}`} role="status" data-testid="check-verdict">
      <strong>
        {v === 'pass'
          ? 'Within tolerance'
          : v === 'fail'
            ? 'Outside tolerance'
            : v === 'uncertain'
              ? 'Not decided'
              : 'Not compared'}
      </strong>
      {' — '}
      {m ? `decided by ${m.label}` : 'no method computed'}; {VERDICT_TEXT[v]}.
    </p>
  );
}

export function CheckResults({ check }: { check: PlanCheck }) {
  if (check.methods.length === 0)
    return (
      <p className="empty">No dose method has a result yet (type-A methods need water data).</p>
    );
  return (
    <>
      <VerdictGrid check={check} />
      <RowsTable
        caption="Per beam: dose per MU, MU for the dose, and differences from the planning system (Monte Carlo: value ± 1σ)"
        headers={POINT_TABLE_HEADERS}
        rows={pointTableRows(check)}
        testId="check-point-table"
      />
      {check.beams.length > 1 ? (
        <RowsTable
          caption="Total at each point (sum over beams, planning MU × dose per MU)"
          headers={TOTAL_TABLE_HEADERS}
          rows={totalTableRows(check)}
          testId="check-total-table"
        />
      ) : null}
    </>
  );
}
