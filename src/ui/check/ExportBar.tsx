// Print, PDF, CSV, JSON, chart images and the shareable link for the check. Everything is
// generated in the page; nothing is uploaded.
import { useState, type RefObject } from 'react';
import { serializeCase } from '../../io/caseFile';
import { pngBlobOf, svgTextOf } from '../../io/chartImage';
import { curvesCsv, pointCheckCsv, totalCheckCsv } from '../../io/csvExport';
import { caseOfPlainPlan, serializePlan } from '../../io/planFile';
import { APP_VERSION } from '../../io/report/appVersion';
import { buildReportModel, isoDate } from '../../io/report/reportModel';
import { downloadReportPdf } from '../../io/report/reportPdf';
import { shareUrlOf } from '../../io/shareLink';
import { setNotice } from '../../state/store';
import { downloadBlob, downloadText } from './download';
import { calcDocumentOf } from '../../compute/calcDocument';
import type { CheckView } from './useCheck';

const CSV = 'text/csv;charset=utf-8';
/** Why a record is not offered while the check recalculates: it would hold the previous input's numbers. */
const STALE_TITLE = 'Recalculating: available when the check shows the current input';

export function ExportBar({
  view,
  figureRef,
}: {
  view: CheckView;
  figureRef: RefObject<SVGSVGElement | null>;
}) {
  const [link, setLink] = useState('');
  const [busy, setBusy] = useState(false);
  const stamp = isoDate(new Date());
  const isPlan = view.isPlan;
  const fail = (what: string, e: unknown) =>
    setNotice({
      kind: 'error',
      title: `${what} failed`,
      lines: [e instanceof Error ? e.message : String(e)],
    });

  const pdf = async () => {
    setBusy(true);
    try {
      const model = buildReportModel({
        plan: view.plan,
        result: view.result,
        date: new Date(),
        appVersion: APP_VERSION,
      });
      await downloadReportPdf(model);
    } catch (e) {
      fail('PDF', e);
    } finally {
      setBusy(false);
    }
  };
  const share = async () => {
    try {
      const first = view.plan.beams[0];
      if (!first) return;
      const url = await shareUrlOf(
        window.location.href,
        isPlan
          ? { kind: 'plan', value: view.plan }
          : { kind: 'case', value: caseOfPlainPlan(view.plan) ?? first.case },
      );
      setLink(url);
      await navigator.clipboard?.writeText(url).catch(() => undefined);
    } catch (e) {
      fail('Share link', e);
    }
  };
  const svg = () => {
    if (figureRef.current)
      downloadText(svgTextOf(figureRef.current), `lamina-depth-dose-${stamp}.svg`, 'image/svg+xml');
  };
  const png = async () => {
    try {
      if (figureRef.current)
        downloadBlob(await pngBlobOf(figureRef.current), `lamina-depth-dose-${stamp}.png`);
    } catch (e) {
      fail('PNG', e);
    }
  };
  const first = view.reports[0];
  return (
    <div className="check-export" data-testid="check-export">
      <div className="check-actions">
        <button type="button" onClick={() => window.print()}>
          Print
        </button>
        <button
          type="button"
          disabled={busy || view.pending}
          title={view.pending ? STALE_TITLE : undefined}
          onClick={() => void pdf()}
        >
          {busy ? 'Writing PDF…' : 'Download PDF'}
        </button>
        <button
          type="button"
          disabled={view.pending}
          title={view.pending ? STALE_TITLE : undefined}
          onClick={() =>
            downloadText(pointCheckCsv(view.check), `lamina-check-points-${stamp}.csv`, CSV)
          }
        >
          CSV: point check
        </button>
        {isPlan ? (
          <button
            type="button"
            disabled={view.pending}
            title={view.pending ? STALE_TITLE : undefined}
            onClick={() =>
              downloadText(totalCheckCsv(view.check), `lamina-check-totals-${stamp}.csv`, CSV)
            }
          >
            CSV: totals
          </button>
        ) : null}
        {first ? (
          <button
            type="button"
            disabled={view.pending}
            title={view.pending ? STALE_TITLE : undefined}
            onClick={() => downloadText(curvesCsv(first.report), `lamina-curves-${stamp}.csv`, CSV)}
          >
            CSV: curves
          </button>
        ) : null}
        <button
          type="button"
          onClick={() =>
            isPlan
              ? downloadText(
                  serializePlan(view.plan),
                  `lamina-plan-${stamp}.json`,
                  'application/json',
                )
              : downloadText(
                  serializeCase(caseOfPlainPlan(view.plan) ?? view.plan.beams[0]!.case),
                  `lamina-case-${stamp}.json`,
                  'application/json',
                )
          }
        >
          {isPlan ? 'Save plan (JSON)' : 'Save case (JSON)'}
        </button>
        <button
          type="button"
          disabled={view.pending}
          data-testid="export-results-json"
          title="The calculation as the command line's --json document"
          onClick={() =>
            downloadText(
              `${JSON.stringify(calcDocumentOf(view.result, isPlan), null, 2)}\n`,
              `lamina-results-${stamp}.json`,
              'application/json',
            )
          }
        >
          Results (JSON)
        </button>
        <button type="button" onClick={svg}>
          Figure: SVG
        </button>
        <button type="button" onClick={() => void png()}>
          Figure: PNG
        </button>
        <button type="button" onClick={() => void share()}>
          Copy share link
        </button>
      </div>
      {link ? (
        <label className="share-link">
          Link with the whole {isPlan ? 'plan' : 'case'} (stays in your browser until you share it)
          <input
            readOnly
            value={link}
            data-testid="share-link"
            onFocus={(e) => e.target.select()}
          />
        </label>
      ) : null}
    </div>
  );
}
