// The printed record's layout rules, read back from the PDF's text: Greek letters and signs are
// printed as written, table headers wrap between words only, and the signature never stands
// alone on a page.
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { FONT_UNICODE_RANGES, pdfText } from '../../../../src/io/report/pdfText';
import type { ReportBlock, ReportModel } from '../../../../src/io/report/reportModel';
import { reportPdfBytes } from '../../../../src/io/report/reportPdf';
import { pdfPagesText, pdfTextOf } from '../../../helpers/pdfTextOf';

const SIGNATURE = 'Checked by (name, signature): ______________________________';

function model(blocks: ReportBlock[]): ReportModel {
  return {
    title: 'Layout test',
    dateIso: '2026-12-05',
    timestampIso: '2026-12-05T12:00:00.000Z',
    appVersion: '0.0.0',
    fileName: 'x.pdf',
    verdict: 'pass',
    blocks,
  };
}

const pdfOf = async (blocks: ReportBlock[]) =>
  Buffer.from(await reportPdfBytes(model(blocks))).toString('latin1');

describe('PDF record', () => {
  it('prints Greek letters and mathematical signs as written', async () => {
    const text = 'ΔMU −6.10 % beyond ±5 %; σ, μ_en/ρ, ρ_e ≥ 1.3, ≤ 2 %, → d_max';
    const pdf = await pdfOf([{ kind: 'paragraph', text }]);
    expect(pdfTextOf(pdf)).toContain(text);
  });

  it('embeds the font subset the coverage list names (script and code agree)', () => {
    const script = readFileSync('scripts/subsetReportFont.sh', 'utf8');
    expect(script).toContain(`UNICODES="${FONT_UNICODE_RANGES}"`);
    expect(pdfText('Δ σ ✓ 漢')).toBe('Δ σ ✓ ?');
  });

  it('wraps table headers between words only, even in a table too wide for the page', async () => {
    // Fourteen columns of long cells force the widest columns to shrink; the headers are long
    // words (invented test text).
    const headers = [
      'radiological depth',
      'equivalent square',
      'heterogeneity',
      'correction',
      'tolerance',
      'verdict',
      'prescription',
      'calibration',
      'uncertainty',
      'attenuation',
      'backscatter',
      'collimator',
      'phantom',
      'normalisation',
    ];
    const cell = 'a long cell text that has to wrap over several lines in this narrow column';
    const pdf = await pdfOf([
      { kind: 'table', headers, rows: [headers.map(() => cell), headers.map(() => '1.000')] },
    ]);
    const lines = pdfTextOf(pdf).split('\n');
    const words = headers.flatMap((h) => h.split(' '));
    // Every header word is printed whole on one line of its header cell.
    for (const w of words) expect(lines.some((l) => l.split(' ').includes(w))).toBe(true);
    // No printed line is a broken piece of a header word.
    for (const l of lines)
      for (const w of words) if (l !== w && w.startsWith(l) && l.length > 1) expect(l).toBe(w);
  });

  it('keeps the signature on a page with the cautions before it', async () => {
    // Filler paragraphs push the cautions and the signature down the first page, one line at a
    // time, through the positions where the signature alone no longer fits (with the old
    // layout, 45–49 lines of filler left the signature alone on page 2).
    const filler = Array.from({ length: 60 }, (_, i): ReportBlock => ({
      kind: 'paragraph',
      text: `Line ${i + 1} of the filler text.`,
    }));
    const tail: ReportBlock[] = [
      { kind: 'heading', text: 'Cautions' },
      { kind: 'list', items: ['A modelled beam is not a commissioned beam.'] },
      { kind: 'signature', lines: [SIGNATURE, 'Date: ______________'] },
    ];
    for (let n = 36; n <= 60; n++) {
      const pages = pdfPagesText(await pdfOf([...filler.slice(0, n), ...tail]));
      const last = pages[pages.length - 1] ?? [];
      expect(last).toContain(SIGNATURE);
      // The page with the signature also holds the cautions.
      expect(last, `${n} filler lines`).toContain('Cautions');
    }
  });
});
