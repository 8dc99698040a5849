// Writes a report model as an A4 PDF with jsPDF: tables that wrap and break across pages with
// their header repeated, the depth-dose figure as vector lines, and a footer on every page.
// jsPDF is imported lazily so it stays out of the page's main chunk.
import type { jsPDF as JsPdf } from 'jspdf';
import type { ReportBlock, ReportModel } from './reportModel';
import type { ReportFigure } from './reportFigure';
import { pdfText } from './pdfText';

const PAGE = { width: 210, height: 297, margin: 14 };
const CONTENT_WIDTH = PAGE.width - 2 * PAGE.margin;
const BOTTOM = PAGE.height - PAGE.margin - 6;
const PT_TO_MM = 0.3528;
/** '#RRGGBB' → [r, g, b]; anything else (e.g. 'currentColor', the text colour) → black. */
function rgbOf(color: string): [number, number, number] {
  const m = /^#([0-9a-f]{2})([0-9a-f]{2})([0-9a-f]{2})$/i.exec(color);
  return m ? [parseInt(m[1]!, 16), parseInt(m[2]!, 16), parseInt(m[3]!, 16)] : [0, 0, 0];
}

/** An SVG dash array in px as a PDF dash pattern in mm (1 px ≈ 0.35 mm at the figure's scale). */
function dashMm(dash: string): number[] {
  return dash
    .split(/\s+/)
    .filter((t) => t !== '')
    .map((t) => Number(t) * 0.35);
}

interface Cursor {
  y: number;
}

function ensureRoom(doc: JsPdf, c: Cursor, heightMm: number): void {
  if (c.y + heightMm > BOTTOM) {
    doc.addPage();
    c.y = PAGE.margin;
  }
}

function writeLines(doc: JsPdf, c: Cursor, text: string, sizePt: number, style = 'normal'): void {
  doc.setFont('helvetica', style);
  doc.setFontSize(sizePt);
  const lines = doc.splitTextToSize(pdfText(text), CONTENT_WIDTH) as string[];
  const lh = sizePt * PT_TO_MM * 1.3;
  for (const line of lines) {
    ensureRoom(doc, c, lh);
    doc.text(line, PAGE.margin, c.y + sizePt * PT_TO_MM);
    c.y += lh;
  }
}

function writeTable(doc: JsPdf, c: Cursor, block: Extract<ReportBlock, { kind: 'table' }>): void {
  if (block.caption) writeLines(doc, c, block.caption, 8, 'bold');
  const sizePt = block.headers.length > 9 ? 6 : 7;
  const lh = sizePt * PT_TO_MM * 1.25;
  const pad = 1.2;
  doc.setFontSize(sizePt);
  doc.setFont('helvetica', 'normal');
  const headers = block.headers.map(pdfText);
  const rows = block.rows.map((r) => r.map(pdfText));
  const natural = headers.map(
    (h, i) =>
      Math.max(doc.getTextWidth(h), ...rows.map((r) => doc.getTextWidth(r[i] ?? ''))) +
      2 * pad +
      0.8,
  );
  const total = natural.reduce((s, w) => s + w, 0);
  // Shrink only the widest columns (wrapping their text) until the table fits the page.
  let widths = natural;
  if (total > CONTENT_WIDTH) {
    let cap = CONTENT_WIDTH / natural.length;
    for (let k = 0; k < 40; k++) {
      const capped = natural.map((w) => Math.min(w, cap));
      const rest = CONTENT_WIDTH - capped.reduce((s, w) => s + w, 0);
      if (rest <= 0.5) break;
      cap += rest / Math.max(1, natural.filter((w) => w > cap).length);
    }
    widths = natural.map((w) => Math.min(w, cap));
  }
  const drawRow = (cells: string[], bold: boolean) => {
    doc.setFont('helvetica', bold ? 'bold' : 'normal');
    const wrapped = cells.map(
      (t, i) => doc.splitTextToSize(t, (widths[i] ?? 10) - 2 * pad) as string[],
    );
    const h = Math.max(1, ...wrapped.map((w) => w.length)) * lh + 1;
    return { wrapped, h };
  };
  const paint = (row: { wrapped: string[][]; h: number }, bold: boolean) => {
    doc.setFont('helvetica', bold ? 'bold' : 'normal');
    let x = PAGE.margin;
    row.wrapped.forEach((lines, i) => {
      lines.forEach((line, k) => doc.text(line, x + pad, c.y + (k + 1) * lh - 0.4));
      x += widths[i] ?? 0;
    });
    c.y += row.h;
    doc.setDrawColor(200);
    doc.line(PAGE.margin, c.y, PAGE.margin + widths.reduce((s, w) => s + w, 0), c.y);
  };
  const head = drawRow(headers, true);
  ensureRoom(doc, c, head.h * 2);
  paint(head, true);
  for (const r of rows) {
    const row = drawRow(r, false);
    if (c.y + row.h > BOTTOM) {
      doc.addPage();
      c.y = PAGE.margin;
      paint(drawRow(headers, true), true);
    }
    paint(row, false);
  }
  c.y += 2;
}

function writeFigure(doc: JsPdf, c: Cursor, fig: ReportFigure): void {
  const h = 70;
  const legendRows = Math.ceil(fig.series.length / 2);
  ensureRoom(doc, c, h + 14 + legendRows * 4);
  writeLines(doc, c, fig.title, 8, 'bold');
  const box = { x: PAGE.margin + 14, y: c.y + 2, w: CONTENT_WIDTH - 18, h: h - 12 };
  const [x0, x1] = fig.xDomain;
  const [y0, y1] = fig.yDomain;
  const px = (x: number) => box.x + ((x - x0) / (x1 - x0 || 1)) * box.w;
  const py = (y: number) => box.y + box.h - ((y - y0) / (y1 - y0 || 1)) * box.h;
  doc.setDrawColor(0);
  doc.setLineWidth(0.2);
  doc.rect(box.x, box.y, box.w, box.h);
  doc.setFont('helvetica', 'normal');
  doc.setFontSize(6);
  for (const t of fig.xTicks) {
    doc.line(px(t), box.y + box.h, px(t), box.y + box.h + 1);
    doc.text(String(t), px(t), box.y + box.h + 3.5, { align: 'center' });
  }
  for (const t of fig.yTicks) {
    doc.line(box.x - 1, py(t), box.x, py(t));
    doc.text(String(t), box.x - 1.5, py(t) + 0.8, { align: 'right' });
  }
  doc.setFontSize(7);
  doc.text(pdfText(fig.xLabel), box.x + box.w / 2, box.y + box.h + 7, { align: 'center' });
  doc.text(pdfText(fig.yLabel), PAGE.margin + 2, box.y + box.h / 2, { angle: 90, align: 'center' });
  doc.setLineWidth(0.35);
  // ±1σ bands first, under every curve: the curve's colour mixed 80 % with white (no transparency).
  for (const s of fig.series)
    for (const run of s.band ?? []) {
      if (run.length < 2) continue;
      const [r, g, b] = rgbOf(s.color).map((v) => Math.round(v + 0.8 * (255 - v)));
      doc.setFillColor(r!, g!, b!);
      const pts: [number, number][] = [
        ...run.map(([x, , hi]): [number, number] => [px(x), py(hi)]),
        ...[...run].reverse().map(([x, lo]): [number, number] => [px(x), py(lo)]),
      ];
      const [x0p, y0p] = pts[0]!;
      const steps = pts.slice(1).map(([x, y], k) => [x - pts[k]![0], y - pts[k]![1]]);
      doc.lines(steps, x0p, y0p, [1, 1], 'F', true);
    }
  fig.series.forEach((s, i) => {
    const [r, g, b] = rgbOf(s.color);
    doc.setDrawColor(r, g, b);
    // The page's dash pattern (px) scaled to the PDF's mm: the curves differ in greyscale too.
    doc.setLineDashPattern(dashMm(s.dash), 0);
    for (const run of s.runs)
      for (let k = 1; k < run.length; k++) {
        const a = run[k - 1] as [number, number];
        const z = run[k] as [number, number];
        doc.line(px(a[0]), py(a[1]), px(z[0]), py(z[1]));
      }
    const lx = box.x + (i % 2) * (box.w / 2);
    const ly = box.y + box.h + 11 + Math.floor(i / 2) * 4;
    doc.line(lx, ly - 0.8, lx + 6, ly - 0.8);
    doc.setLineDashPattern([], 0);
    doc.setFontSize(6.5);
    doc.text(pdfText(s.label), lx + 7.5, ly);
  });
  doc.setDrawColor(0);
  doc.setLineWidth(0.2);
  c.y = box.y + box.h + 13 + legendRows * 4;
  if (fig.clipNote) writeLines(doc, c, fig.clipNote, 6.5, 'normal');
}

function writeBlock(doc: JsPdf, c: Cursor, block: ReportBlock): void {
  switch (block.kind) {
    case 'heading':
      ensureRoom(doc, c, 14);
      c.y += 2;
      writeLines(doc, c, block.text, 11, 'bold');
      c.y += 1;
      break;
    case 'paragraph':
      writeLines(doc, c, block.text, 8.5);
      c.y += 1;
      break;
    case 'list':
      for (const item of block.items) writeLines(doc, c, `• ${item}`, 8);
      c.y += 1;
      break;
    case 'table':
      writeTable(doc, c, block);
      break;
    case 'figure':
      writeFigure(doc, c, block.figure);
      break;
    case 'signature':
      ensureRoom(doc, c, 8 + block.lines.length * 10);
      c.y += 6;
      for (const line of block.lines) {
        writeLines(doc, c, line, 9);
        c.y += 5;
      }
      break;
  }
}

/** Lay the model out on a new jsPDF document. */
export function writeReportPdf(model: ReportModel, JsPdfClass: typeof JsPdf): JsPdf {
  const doc = new JsPdfClass({ unit: 'mm', format: 'a4', compress: false });
  doc.setProperties({ title: pdfText(model.title), creator: `Lamina ${model.appVersion}` });
  const c: Cursor = { y: PAGE.margin };
  writeLines(doc, c, model.title, 14, 'bold');
  for (const block of model.blocks) writeBlock(doc, c, block);
  const pages = doc.getNumberOfPages();
  for (let i = 1; i <= pages; i++) {
    doc.setPage(i);
    doc.setFont('helvetica', 'normal');
    doc.setFontSize(7);
    doc.setTextColor(90);
    doc.text(
      pdfText(
        `Lamina ${model.appVersion} · ${model.timestampIso} · teaching and independent-check aid · page ${i} of ${pages}`,
      ),
      PAGE.margin,
      PAGE.height - PAGE.margin + 2,
    );
    doc.setTextColor(0);
  }
  return doc;
}

/** The PDF as bytes (jsPDF loaded on first use). */
export async function reportPdfBytes(model: ReportModel): Promise<ArrayBuffer> {
  const { jsPDF } = await import('jspdf');
  return writeReportPdf(model, jsPDF).output('arraybuffer');
}

/** Save the PDF through the browser's download (file name from the model). */
export async function downloadReportPdf(model: ReportModel): Promise<void> {
  const { jsPDF } = await import('jspdf');
  writeReportPdf(model, jsPDF).save(model.fileName);
}
