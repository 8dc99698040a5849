// Writes a report model as an A4 PDF with jsPDF: text in an embedded DejaVu Sans subset (Greek
// and the mathematical signs print as written), tables that wrap and break across pages with
// their header repeated and header words never split, the depth-dose figure as vector lines, the
// signature kept on a page with the text before it, and a footer on every page. jsPDF and the
// font are imported lazily, when a PDF is made, so they stay out of the page's main chunk.
import type { jsPDF as JsPdf } from 'jspdf';
import type { ReportBlock, ReportModel } from './reportModel';
import type { ReportFigure } from './reportFigure';
import { pdfText } from './pdfText';

/** The embedded font's family name in the PDF. */
export const REPORT_FONT = 'DejaVuSans';

export interface ReportFonts {
  normalBase64: string;
  boldBase64: string;
}

function registerFonts(doc: JsPdf, fonts: ReportFonts): void {
  doc.addFileToVFS('DejaVuSans-Lamina.ttf', fonts.normalBase64);
  doc.addFont('DejaVuSans-Lamina.ttf', REPORT_FONT, 'normal');
  doc.addFileToVFS('DejaVuSans-Bold-Lamina.ttf', fonts.boldBase64);
  doc.addFont('DejaVuSans-Bold-Lamina.ttf', REPORT_FONT, 'bold');
}

function setFont(doc: JsPdf, style: 'normal' | 'bold'): void {
  doc.setFont(REPORT_FONT, style);
}

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

function linesOf(doc: JsPdf, text: string, sizePt: number, style: 'normal' | 'bold'): string[] {
  setFont(doc, style);
  doc.setFontSize(sizePt);
  return doc.splitTextToSize(pdfText(text), CONTENT_WIDTH) as string[];
}

const lineHeightMm = (sizePt: number) => sizePt * PT_TO_MM * 1.3;

function writeLines(
  doc: JsPdf,
  c: Cursor,
  text: string,
  sizePt: number,
  style: 'normal' | 'bold' = 'normal',
): void {
  const lines = linesOf(doc, text, sizePt, style);
  const lh = lineHeightMm(sizePt);
  for (const line of lines) {
    ensureRoom(doc, c, lh);
    doc.text(line, PAGE.margin, c.y + sizePt * PT_TO_MM);
    c.y += lh;
  }
}

const CELL_PAD_MM = 1.2;

/**
 * Column widths (mm) that fit the page: each column at least as wide as the longest word of its
 * bold header (headers wrap between words only), the widest columns shrunk (their cells wrap)
 * until the table fits. Null when even the header words do not fit at this size.
 */
export function tableColumnWidths(
  doc: JsPdf,
  headers: readonly string[],
  rows: readonly (readonly string[])[],
  sizePt: number,
  widthMm = CONTENT_WIDTH,
): number[] | null {
  const extra = 2 * CELL_PAD_MM + 0.8;
  doc.setFontSize(sizePt);
  setFont(doc, 'bold');
  const headerWidth = headers.map((h) => doc.getTextWidth(h));
  const minimum = headers.map(
    (h) => Math.max(0, ...h.split(/\s+/).map((w) => doc.getTextWidth(w))) + extra,
  );
  setFont(doc, 'normal');
  const natural = headers.map((_, i) =>
    Math.max(
      minimum[i] as number,
      (headerWidth[i] as number) + extra,
      ...rows.map((r) => doc.getTextWidth(r[i] ?? '') + extra),
    ),
  );
  if (minimum.reduce((s, w) => s + w, 0) > widthMm) return null;
  if (natural.reduce((s, w) => s + w, 0) <= widthMm) return natural;
  // Cap the widest columns at a common width (never below a column's minimum), raising the cap
  // until the table fills the page.
  const widthsAt = (cap: number) =>
    natural.map((w, i) => Math.min(w, Math.max(cap, minimum[i] as number)));
  let lo = 0;
  let hi = Math.max(...natural);
  for (let k = 0; k < 60; k++) {
    const mid = (lo + hi) / 2;
    if (widthsAt(mid).reduce((s, w) => s + w, 0) > widthMm) hi = mid;
    else lo = mid;
  }
  return widthsAt(lo);
}

function writeTable(doc: JsPdf, c: Cursor, block: Extract<ReportBlock, { kind: 'table' }>): void {
  const headers = block.headers.map(pdfText);
  const rows = block.rows.map((r) => r.map(pdfText));
  // The largest size (7 pt, 6 pt for wide tables) at which the header words fit, down to 3 pt
  // (a last resort for very many columns; the record's own tables fit at 6–7 pt).
  let sizePt = block.headers.length > 9 ? 6 : 7;
  let fitted = tableColumnWidths(doc, headers, rows, sizePt);
  while (!fitted && sizePt > 3) {
    sizePt -= 0.5;
    fitted = tableColumnWidths(doc, headers, rows, sizePt);
  }
  const widths = fitted ?? headers.map(() => CONTENT_WIDTH / Math.max(1, headers.length));
  const lh = sizePt * PT_TO_MM * 1.25;
  const pad = CELL_PAD_MM;
  doc.setFontSize(sizePt);
  const drawRow = (cells: string[], bold: boolean) => {
    setFont(doc, bold ? 'bold' : 'normal');
    const wrapped = cells.map(
      (t, i) => doc.splitTextToSize(t, (widths[i] ?? 10) - 2 * pad) as string[],
    );
    const h = Math.max(1, ...wrapped.map((w) => w.length)) * lh + 1;
    return { wrapped, h };
  };
  const paint = (row: { wrapped: string[][]; h: number }, bold: boolean) => {
    setFont(doc, bold ? 'bold' : 'normal');
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
  // The caption, the header and a first row start on the same page.
  const captionMm = block.caption
    ? linesOf(doc, block.caption, 8, 'bold').length * lineHeightMm(8)
    : 0;
  ensureRoom(doc, c, captionMm + head.h * 2);
  if (block.caption) writeLines(doc, c, block.caption, 8, 'bold');
  doc.setFontSize(sizePt);
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
  setFont(doc, 'normal');
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
      ensureRoom(doc, c, signatureHeightMm(block.lines.length));
      c.y += 6;
      for (const line of block.lines) {
        writeLines(doc, c, line, 9);
        c.y += 5;
      }
      break;
  }
}

const signatureHeightMm = (lines: number) => 6 + lines * (lineHeightMm(9) + 5);

/** Height (mm) a text block takes (headings, paragraphs, lists), as writeBlock lays it out. */
function textBlockHeightMm(doc: JsPdf, block: ReportBlock): number | null {
  switch (block.kind) {
    case 'heading':
      return 3 + linesOf(doc, block.text, 11, 'bold').length * lineHeightMm(11);
    case 'paragraph':
      return 1 + linesOf(doc, block.text, 8.5, 'normal').length * lineHeightMm(8.5);
    case 'list':
      return (
        1 +
        block.items.reduce((s, i) => s + linesOf(doc, `• ${i}`, 8, 'normal').length, 0) *
          lineHeightMm(8)
      );
    case 'signature':
      return signatureHeightMm(block.lines.length);
    default:
      return null;
  }
}

/**
 * Index of the first block that must share the signature's page: the run of text blocks before
 * the signature, back to its heading (e.g. the cautions), when together they fit on one page.
 * A signature never stands alone on a page.
 */
function signatureGroupStart(blocks: readonly ReportBlock[]): number {
  const sig = blocks.findIndex((b) => b.kind === 'signature');
  if (sig < 0) return -1;
  let start = sig;
  for (let i = sig - 1; i >= 0; i--) {
    const b = blocks[i] as ReportBlock;
    if (b.kind !== 'heading' && b.kind !== 'paragraph' && b.kind !== 'list') break;
    start = i;
    if (b.kind === 'heading') break;
  }
  return start;
}

/** Lay the model out on a new jsPDF document. */
export function writeReportPdf(
  model: ReportModel,
  JsPdfClass: typeof JsPdf,
  fonts: ReportFonts,
): JsPdf {
  const doc = new JsPdfClass({ unit: 'mm', format: 'a4', compress: false });
  registerFonts(doc, fonts);
  doc.setProperties({ title: pdfText(model.title), creator: `Lamina ${model.appVersion}` });
  const c: Cursor = { y: PAGE.margin };
  writeLines(doc, c, model.title, 14, 'bold');
  const keepFrom = signatureGroupStart(model.blocks);
  model.blocks.forEach((block, i) => {
    if (i === keepFrom) {
      // The signature and the text before it start a page together when they do not fit here.
      const group = model.blocks.slice(
        keepFrom,
        model.blocks.findIndex((b) => b.kind === 'signature') + 1,
      );
      const h = group.reduce((s, b) => s + (textBlockHeightMm(doc, b) ?? 0), 0);
      if (h <= BOTTOM - PAGE.margin) ensureRoom(doc, c, h);
    }
    writeBlock(doc, c, block);
  });
  const pages = doc.getNumberOfPages();
  for (let i = 1; i <= pages; i++) {
    doc.setPage(i);
    setFont(doc, 'normal');
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

/** jsPDF and the embedded font, loaded on first use (separate chunks of the page). */
async function loadPdfTools(): Promise<{ jsPDF: typeof JsPdf; fonts: ReportFonts }> {
  const [{ jsPDF }, font] = await Promise.all([
    import('jspdf'),
    import('./fonts/dejaVuSansSubset'),
  ]);
  return {
    jsPDF,
    fonts: { normalBase64: font.DEJAVU_SANS_BASE64, boldBase64: font.DEJAVU_SANS_BOLD_BASE64 },
  };
}

/** The PDF as bytes. */
export async function reportPdfBytes(model: ReportModel): Promise<ArrayBuffer> {
  const { jsPDF, fonts } = await loadPdfTools();
  return writeReportPdf(model, jsPDF, fonts).output('arraybuffer');
}

/** Save the PDF through the browser's download (file name from the model). */
export async function downloadReportPdf(model: ReportModel): Promise<void> {
  const { jsPDF, fonts } = await loadPdfTools();
  writeReportPdf(model, jsPDF, fonts).save(model.fileName);
}
