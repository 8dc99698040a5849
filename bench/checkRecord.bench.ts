// Point-check speed: the two-beam demo plan calculated with its check (type-A methods), the
// record model built, and the PDF written (jsPDF, in Node), plus the share-link size.
import { readFileSync } from 'node:fs';
import { performance } from 'node:perf_hooks';
import { calculatePlan } from '../src/compute/calculatePlan';
import { parsePlanText } from '../src/io/planFile';
import { APP_VERSION } from '../src/io/report/appVersion';
import { buildReportModel } from '../src/io/report/reportModel';
import { reportPdfBytes } from '../src/io/report/reportPdf';
import { shareHashOf } from '../src/io/shareLink';
import type { BenchFigure } from './lib/row';

export const repeats = 3;

export async function run(): Promise<BenchFigure[]> {
  const parsed = parsePlanText(
    readFileSync('public/cases/opposed-pair-chest-6mv.plan.json', 'utf8'),
  );
  if (!parsed.ok) throw new Error('demo plan invalid');
  const methods = ['water', 'rtmr', 'epl-pdd', 'batho', 'batho-modified', 'etar'];
  let t = performance.now();
  const result = calculatePlan(parsed.value, { methods });
  const calcMs = performance.now() - t;
  t = performance.now();
  const model = buildReportModel({
    plan: parsed.value,
    result,
    date: new Date(),
    appVersion: APP_VERSION,
  });
  const modelMs = performance.now() - t;
  t = performance.now();
  const pdf = await reportPdfBytes(model);
  const pdfMs = performance.now() - t;
  const hash = await shareHashOf({ kind: 'plan', value: parsed.value });
  return [
    { name: 'calculatePlan, 2 beams, type-A methods + check', value: calcMs, unit: 'ms' },
    { name: 'record model', value: modelMs, unit: 'ms' },
    {
      name: 'record PDF (jsPDF)',
      value: pdfMs,
      unit: 'ms',
      note: `${(pdf.byteLength / 1024).toFixed(0)} kB`,
    },
    {
      name: 'share link of the demo plan',
      value: hash.length,
      unit: 'chars',
      note: 'includes two inline water tables',
    },
  ];
}
