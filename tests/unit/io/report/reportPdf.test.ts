import type { MethodId } from '../../../../src/engine/methodRegistry';
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { calculatePlan, type PlanReport } from '../../../../src/compute/calculatePlan';
import { checkPlan } from '../../../../src/engine/check/planCheck';
import { DEFAULT_TOLERANCES } from '../../../../src/engine/check/tolerance';
import type { MethodResult } from '../../../../src/engine/methodResult';
import { checkInputOf } from '../../../../src/compute/calculatePlan';
import { validatePlan } from '../../../../src/io/planFile';
import { buildReportModel, reportFileName } from '../../../../src/io/report/reportModel';
import { pdfTextOf } from '../../../helpers/pdfTextOf';
import { reportPdfBytes } from '../../../../src/io/report/reportPdf';
import { pointTableRows, totalTableRows } from '../../../../src/io/report/reportTables';
import { APP_VERSION } from '../../../../src/io/report/appVersion';

const demo = JSON.parse(readFileSync('public/cases/lung-slab-6mv.json', 'utf8')) as Record<
  string,
  unknown
>;
const plan = validatePlan({
  format: 'lamina.plan',
  version: 1,
  name: 'Opposed pair through lung (invented)',
  beams: [
    {
      id: 'AP',
      weight: 1,
      case: {
        ...demo,
        version: 1,
        points: [{ id: 'P1', depthCm: 15, planningMu: 140, planningDoseCGy: 100 }],
      },
    },
    {
      id: 'PA',
      weight: 1,
      case: {
        ...demo,
        version: 1,
        points: [{ id: 'P1', depthCm: 5, planningMu: 130, planningDoseCGy: 100 }],
      },
    },
  ],
  prescription: { pointId: 'P1', doseCGy: 200 },
});
if (!plan.ok) throw new Error('plan must be valid');

/** A synthetic method (an exporter test, not physics): dose per MU 0.8·exp(−0.05 d). */
function synthetic(depths: number[], points: { id: string; depthCm: number }[]): MethodResult {
  const dpm = (d: number) => 0.8 * Math.exp(-0.05 * d);
  return {
    id: 'synthetic' as MethodId, // an exporter test: any id
    label: 'Synthetic exponential',
    variant: 'test curve',
    methodClass: 'none',
    waterData: 'modelled beam',
    curve: { depthCm: depths, dosePerMuCGy: depths.map(dpm), cf: depths.map(() => 1) },
    points: points.map((p) => ({
      id: p.id,
      depthCm: p.depthCm,
      cf: 1,
      dosePerMuCGy: dpm(p.depthCm),
      flags: [],
    })),
  };
}

function reportWithSynthetic(): PlanReport {
  const r = calculatePlan(plan.ok ? plan.value : (undefined as never), { depthStepCm: 0.25 });
  const beams = r.beams.map((b) => ({
    ...b,
    report: { ...b.report, methods: [synthetic(b.report.depthCm, b.report.points)] },
  }));
  const check = checkPlan(
    beams.map((b, i) =>
      checkInputOf(b, plan.ok ? plan.value.beams[i]!.case : (undefined as never), b.report),
    ),
    { tolerances: DEFAULT_TOLERANCES, prescription: { pointId: 'P1', doseCGy: 200 } },
  );
  return { ...r, beams, check };
}

const latin1 = (buf: ArrayBuffer) => Buffer.from(buf).toString('latin1');
/** The lines of text the PDF shows. */
const shownLines = (pdf: string) => pdfTextOf(pdf).split('\n');

describe('printed record', () => {
  it('reportFileName(date) is ISO-dated', () => {
    expect(reportFileName(new Date('2026-12-01T23:10:00Z'))).toBe('lamina-check-2026-12-01.pdf');
  });

  it('reportPdfBytes(model) writes a PDF whose text holds the point and total tables', async () => {
    if (!plan.ok) return;
    const result = reportWithSynthetic();
    const model = buildReportModel({
      plan: plan.value,
      result,
      date: new Date('2026-12-01T23:10:00Z'),
      appVersion: APP_VERSION,
      waterChains: { AP: { P1: { formula: 'D/MU = 1.0 × 1.0 = 1.0 cGy/MU' } } },
    });
    const rows = pointTableRows(result.check);
    expect(rows).toHaveLength(2); // two beams × one point × one method
    const pdf = latin1(await reportPdfBytes(model));
    expect(pdf.startsWith('%PDF-')).toBe(true);
    const lines = shownLines(pdf);
    const text = lines.join('\n');
    for (const row of [...rows, ...totalTableRows(result.check)])
      for (const cellText of row) expect(lines).toContain(cellText);
    for (const t of ['Cautions', 'Checked by (name, signature): ______________________________'])
      expect(lines).toContain(t);
    expect(text).toContain('Synthetic exponential');
    expect(text).toContain('modelled beam');
    expect(text).toContain(`Lamina ${APP_VERSION}`);
    expect(text).toContain('2026-12-01T23:10:00');
    expect(text).toContain('Water chain at P1');
  });

  it('a method with a ±1σ curve gets its band drawn (a filled path) and named in the PDF figure', async () => {
    if (!plan.ok) return;
    const base = reportWithSynthetic();
    const withSigma = (k: number): PlanReport => ({
      ...base,
      beams: base.beams.map((b) => ({
        ...b,
        report: {
          ...b.report,
          methods: b.report.methods.map((m) => ({
            ...m,
            curve: {
              ...m.curve,
              sigmaDosePerMuCGy: m.curve.dosePerMuCGy.map((v) => k * (v ?? 0)),
            },
          })),
        },
      })),
    });
    const pdfOf = async (result: PlanReport) =>
      latin1(
        await reportPdfBytes(
          buildReportModel({
            plan: plan.ok ? plan.value : (undefined as never),
            result,
            date: new Date('2026-12-01T23:10:00Z'),
            appVersion: APP_VERSION,
            waterChains: {},
          }),
        ),
      );
    const fills = (pdf: string) => pdf.match(/(?:^|\s)f(?=\s)/g)?.length ?? 0;
    const banded = await pdfOf(withSigma(0.03));
    const flat = await pdfOf(withSigma(0)); // σ = 0: no band
    expect(shownLines(banded)).toContain('Synthetic exponential (band: ±1σ)');
    // One filled band per beam figure (two beams) more than without σ.
    expect(fills(banded) - fills(flat)).toBe(2);
  });

  it('buildReportModel(...) carries warnings, the figure and the verdict', () => {
    if (!plan.ok) return;
    const result = reportWithSynthetic();
    const model = buildReportModel({
      plan: plan.value,
      result,
      date: new Date('2026-12-01T00:00:00Z'),
      appVersion: '9.9.9',
    });
    const figures = model.blocks.filter((b) => b.kind === 'figure');
    expect(figures).toHaveLength(2);
    const fig = figures[0]?.kind === 'figure' ? figures[0].figure : null;
    expect(fig?.series[0]?.runs[0]?.length).toBeGreaterThan(10);
    // Warnings of the lung path (INTERFACE-DOWNSTREAM etc.) appear in a list block.
    const lists = model.blocks
      .filter((b) => b.kind === 'list')
      .flatMap((b) => (b.kind === 'list' ? b.items : []));
    expect(lists.some((l) => l.includes('INTERFACE-DOWNSTREAM') || l.includes('BUILDUP'))).toBe(
      result.beams[0]!.report.warnings.length > 0,
    );
    expect(model.verdict).toBe(result.check.verdict);
    expect(model.fileName).toBe('lamina-check-2026-12-01.pdf');
  });
});
