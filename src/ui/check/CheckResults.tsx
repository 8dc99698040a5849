// The check's results: a verdict banner, the per-beam table (every method at every point) and
// the totals over beams. Verdicts are words as well as colours.
import type { PlanCheck } from '../../engine/check/planCheck';
import type { Verdict } from '../../engine/check/tolerance';
import { VERDICT_TEXT } from '../../io/report/reportModel';
import {
  decidingMethodText,
  spreadStatement,
  verdictStatement,
} from '../../io/report/verdictStatement';
import { doseQuantityLabel } from '../../engine/dose/doseQuantity';
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
  // "none: no plan MU" keeps the class of its verdict word.
  const word = v.split(':')[0] ?? v;
  return (
    <td
      className={`verdict verdict-${word}`}
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
  const v: Verdict = check.verdict;
  return (
    <div className={`check-verdict verdict-${v}`} role="status" data-testid="check-verdict">
      <p>
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
        <span data-testid="check-verdict-statement">{verdictStatement(check)}</span>
        {v === 'uncertain' ? ` (${VERDICT_TEXT.uncertain})` : ''}
      </p>
      <p className="check-verdict-detail" data-testid="check-deciding-method">
        Deciding method: {decidingMethodText(check)}.
        {check.doseTo ? ` Dose reported as ${doseQuantityLabel(check.doseTo)}.` : ''}
      </p>
      <p className="check-verdict-detail" data-testid="check-spread">
        {spreadStatement(check)}
      </p>
    </div>
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
