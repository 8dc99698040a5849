// The printable record of a point check as plain blocks (headings, paragraphs, tables, the
// depth-dose figure, lists, the signature line). Pure data: the PDF writer and the page's print
// view render the same model, and tests read it in Node.
import type { CalcReport } from '../../contract/reports';
import type { PlanReport } from '../../contract/reports';
import type { PlanCheck } from '../../engine/check/planCheck';
import type { Verdict } from '../../engine/check/tolerance';
import type { LaminaPlan } from '../planFile';
import { monteCarloRecordLines } from './monteCarloNote';
import { decidingMethodText, spreadStatement, verdictStatement } from './verdictStatement';
import { doseQuantityLabel } from '../../engine/dose/doseQuantity';
import { depthDoseFigure, type ReportFigure } from './reportFigure';
import {
  beamVerdictHeaders,
  beamVerdictRows,
  pointTableRows,
  POINT_TABLE_HEADERS,
  totalTableRows,
  TOTAL_TABLE_HEADERS,
} from './reportTables';

export type ReportBlock =
  | { kind: 'heading'; text: string }
  | { kind: 'paragraph'; text: string }
  | { kind: 'table'; caption?: string; headers: string[]; rows: string[][] }
  | { kind: 'figure'; figure: ReportFigure }
  | { kind: 'list'; items: string[] }
  | { kind: 'signature'; lines: string[] };

export interface ReportModel {
  title: string;
  /** ISO date of the record, e.g. 2026-12-01. */
  dateIso: string;
  /** ISO date and time (UTC) of the record. */
  timestampIso: string;
  appVersion: string;
  fileName: string;
  verdict: Verdict;
  blocks: ReportBlock[];
}

export interface ReportInput {
  plan: LaminaPlan;
  result: PlanReport;
  date: Date;
  appVersion: string;
  /**
   * Water-data factor chains per beam and point (the `formula` line of the dose-per-MU factors),
   * when the caller has them.
   */
  waterChains?: Record<string, Record<string, { formula: string }>>;
}

export const VERDICT_TEXT: Record<Verdict, string> = {
  pass: 'within tolerance',
  fail: 'OUTSIDE tolerance',
  uncertain:
    'UNCERTAIN: within the tolerance ± 2σ of the Monte Carlo statistics (run more histories)',
  none: 'not compared (a planning value is missing)',
};

export function isoDate(d: Date): string {
  return d.toISOString().slice(0, 10);
}

export function reportFileName(d: Date, ext = 'pdf'): string {
  return `lamina-check-${isoDate(d)}.${ext}`;
}

function warningLines(warnings: readonly unknown[]): string[] {
  return warnings.map((w) => {
    const o = (typeof w === 'object' && w !== null ? w : {}) as Record<string, unknown>;
    const s = (k: string) => (typeof o[k] === 'string' ? o[k] : '');
    const head = [s('id'), s('severity') && `(${s('severity')})`].filter(Boolean).join(' ');
    return [
      head && `${head}:`,
      s('numbers'),
      s('explanation'),
      s('advice') && `What to do: ${s('advice')}`,
    ]
      .filter(Boolean)
      .join(' ');
  });
}

function beamBlocks(
  beamId: string,
  plan: LaminaPlan,
  report: CalcReport,
  chains: Record<string, { formula: string }> | undefined,
): ReportBlock[] {
  const pb = plan.beams.find((b) => b.id === beamId);
  const out: ReportBlock[] = [];
  out.push({ kind: 'heading', text: `Beam ${beamId}${pb?.label ? ` — ${pb.label}` : ''}` });
  out.push({
    kind: 'paragraph',
    text: `${report.beam.energy}, ${report.beam.setup} (SSD ${report.beam.ssdCm.toFixed(1)} cm), field ${report.beam.fieldXCm} × ${report.beam.fieldYCm} cm at 100 cm, weight ${pb?.weight ?? 1}. Case: ${report.caseName || '(unnamed)'}.`,
  });
  out.push({
    kind: 'table',
    caption: 'Slab path',
    headers: ['#', 'material', 'top cm', 'bottom cm', 'density g/cm³', 'rel. e⁻ density'],
    rows: report.layers.map((l) => [
      String(l.index + 1),
      l.material,
      l.topCm.toFixed(2),
      l.bottomCm.toFixed(2),
      l.densityGPerCm3.toFixed(3),
      l.relativeElectronDensity.toFixed(3),
    ]),
  });
  out.push({
    kind: 'table',
    caption: 'Points of interest',
    headers: ['point', 'depth cm', 'radiological depth cm'],
    rows: report.points.map((p) => [p.id, p.depthCm.toFixed(2), p.radiologicalDepthCm.toFixed(3)]),
  });
  const sources = [...new Set(report.methods.map((m) => m.waterData))];
  out.push({
    kind: 'paragraph',
    text: `Beam data: ${sources.length > 0 ? sources.join('; ') : 'no method computed'}.`,
  });
  if (report.methods.length > 0)
    out.push({
      kind: 'table',
      caption: 'Methods and factor chain: D/MU(method) = D/MU(water) × CF(method)',
      headers: ['method', 'variant', 'class', 'point', 'D/MU water', 'CF', 'D/MU cGy', 'flags'],
      rows: report.methods.flatMap((m) =>
        m.points.map((p) => {
          const water = report.methods
            .find((w) => w.id === 'water')
            ?.points.find((q) => q.id === p.id);
          return [
            m.label,
            m.variant,
            m.methodClass,
            p.id,
            fmt(water?.dosePerMuCGy, 4),
            fmt(p.cf, 4),
            p.sigmaDosePerMuCGy === undefined || fmt(p.dosePerMuCGy, 4) === '—'
              ? fmt(p.dosePerMuCGy, 4)
              : `${fmt(p.dosePerMuCGy, 4)} ± ${fmt(p.sigmaDosePerMuCGy, 4)}`,
            p.flags.join('; '),
          ];
        }),
      ),
    });
  const doseLines = report.methods
    .filter((m) => m.dose)
    .map((m) => `${m.label}: ${doseQuantityLabel(m.dose!.quantity)} — ${m.dose!.conversion}`);
  if (doseLines.length > 0) {
    out.push({ kind: 'paragraph', text: `Dose convention of each method, beam ${beamId}:` });
    out.push({ kind: 'list', items: doseLines });
  }
  for (const [pointId, f] of Object.entries(chains ?? {}))
    out.push({ kind: 'paragraph', text: `Water chain at ${pointId}: ${f.formula}` });
  out.push({ kind: 'figure', figure: depthDoseFigure(report, `Depth dose, beam ${beamId}`) });
  out.push({ kind: 'heading', text: `Warnings, beam ${beamId}` });
  const w = warningLines(report.warnings);
  out.push(w.length > 0 ? { kind: 'list', items: w } : { kind: 'paragraph', text: 'None raised.' });
  return out;
}

export function fmt(v: number | null | undefined, digits: number): string {
  return v === null || v === undefined || !Number.isFinite(v) ? '—' : v.toFixed(digits);
}

function checkSummary(check: PlanCheck): ReportBlock[] {
  return [
    { kind: 'paragraph', text: `Verdict: ${verdictStatement(check)}.` },
    { kind: 'paragraph', text: `Deciding method: ${decidingMethodText(check)}.` },
    { kind: 'paragraph', text: spreadStatement(check) },
    {
      kind: 'paragraph',
      text: `Tolerances: ${check.tolerances.homogeneousPercent} % (homogeneous path), ${check.tolerances.heterogeneousPercent} % (heterogeneous path).${check.doseTo ? ` Dose reported as ${doseQuantityLabel(check.doseTo)} by every method (conversions in the methods table).` : ''}`,
    },
  ];
}

export function buildReportModel(input: ReportInput): ReportModel {
  const { plan, result, date, appVersion } = input;
  const check = result.check;
  const blocks: ReportBlock[] = [];
  blocks.push({
    kind: 'paragraph',
    text: `Plan: ${plan.name || '(unnamed)'} · ${plan.beams.length} beam${plan.beams.length === 1 ? '' : 's'} · Lamina ${appVersion} · ${date.toISOString().slice(0, 19)}Z`,
  });
  if (check.prescription)
    blocks.push({
      kind: 'paragraph',
      text: `Prescription: ${check.prescription.doseCGy} cGy at point ${check.prescription.pointId} (all beams).`,
    });
  blocks.push(...checkSummary(check));
  blocks.push({
    kind: 'table',
    caption: 'Verdict per beam and method',
    headers: beamVerdictHeaders(check),
    rows: beamVerdictRows(check),
  });
  blocks.push({ kind: 'heading', text: 'Point check per beam' });
  blocks.push({ kind: 'table', headers: POINT_TABLE_HEADERS, rows: pointTableRows(check) });
  for (const text of monteCarloRecordLines(result.beams)) blocks.push({ kind: 'paragraph', text });
  if (check.beams.length > 1) {
    blocks.push({ kind: 'heading', text: 'Total at each point (sum over beams)' });
    blocks.push({ kind: 'table', headers: TOTAL_TABLE_HEADERS, rows: totalTableRows(check) });
  }
  for (const b of result.beams)
    blocks.push(...beamBlocks(b.id, plan, b.report, input.waterChains?.[b.id] ?? b.waterChains));
  blocks.push({ kind: 'heading', text: 'Cautions' });
  blocks.push({ kind: 'list', items: result.beams[0]?.report.cautions ?? [] });
  blocks.push({
    kind: 'signature',
    lines: ['Checked by (name, signature): ______________________________', 'Date: ______________'],
  });
  return {
    title: `Lamina point check — ${plan.name || '(unnamed)'}`,
    dateIso: isoDate(date),
    timestampIso: date.toISOString(),
    appVersion,
    fileName: reportFileName(date),
    verdict: check.verdict,
    blocks,
  };
}
