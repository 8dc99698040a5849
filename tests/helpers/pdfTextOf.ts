// The text a PDF written by jsPDF (uncompressed) shows, page by page: hex strings of an
// embedded Unicode font decoded through that font's ToUnicode map, literal strings of a standard
// font as they are. Enough to test what the printed record says, not a general PDF reader.

interface PdfObject {
  body: string;
}

function objects(pdf: string): Map<number, PdfObject> {
  const out = new Map<number, PdfObject>();
  for (const m of pdf.matchAll(/(\d+) 0 obj([\s\S]*?)endobj/g))
    out.set(Number(m[1]), { body: m[2] ?? '' });
  return out;
}

function cmapOf(body: string): Map<string, string> {
  const map = new Map<string, string>();
  for (const block of body.matchAll(/beginbfchar([\s\S]*?)endbfchar/g))
    for (const m of (block[1] ?? '').matchAll(/<([0-9a-fA-F]+)>\s*<([0-9a-fA-F]+)>/g)) {
      const hex = m[2] ?? '';
      let text = '';
      for (let i = 0; i < hex.length; i += 4)
        text += String.fromCharCode(parseInt(hex.slice(i, i + 4), 16));
      map.set((m[1] ?? '').toLowerCase(), text);
    }
  return map;
}

function unescapeLiteral(s: string): string {
  return s.replace(/\\([()\\])/g, '$1');
}

/** Text of each page, one string per text-showing operator, in drawing order. */
export function pdfPagesText(pdf: string): string[][] {
  const objs = objects(pdf);
  // Font resource name → glyph-id map (embedded fonts only).
  const fonts = new Map<string, Map<string, string>>();
  for (const o of objs.values()) {
    const fontDict = /\/Font\s*<<([\s\S]*?)>>/.exec(o.body);
    if (!fontDict) continue;
    for (const m of (fontDict[1] ?? '').matchAll(/\/(F\d+)\s+(\d+) 0 R/g)) {
      const font = objs.get(Number(m[2]));
      const toUnicode = font ? /\/ToUnicode\s+(\d+) 0 R/.exec(font.body) : null;
      const cmap = toUnicode ? objs.get(Number(toUnicode[1])) : undefined;
      if (cmap) fonts.set(m[1] ?? '', cmapOf(cmap.body));
    }
  }
  const pages: string[][] = [];
  for (const o of objs.values()) {
    if (!/\/Type\s*\/Page\b(?!s)/.test(o.body)) continue;
    const contents = /\/Contents\s+(\d+) 0 R/.exec(o.body);
    const stream = contents ? (objs.get(Number(contents[1]))?.body ?? '') : '';
    const texts: string[] = [];
    let font: Map<string, string> | undefined;
    for (const m of stream.matchAll(
      /\/(F\d+)\s+[\d.]+\s+Tf|<([0-9a-fA-F]*)>\s*Tj|\(((?:\\.|[^\\)])*)\)\s*Tj/g,
    )) {
      if (m[1] !== undefined) font = fonts.get(m[1]);
      else if (m[2] !== undefined) {
        let t = '';
        for (let i = 0; i < m[2].length; i += 4)
          t += font?.get(m[2].slice(i, i + 4).toLowerCase()) ?? '\uFFFD';
        texts.push(t);
      } else if (m[3] !== undefined) texts.push(unescapeLiteral(m[3]));
    }
    pages.push(texts);
  }
  return pages;
}

/** All the text of a PDF, one line per text-showing operator. */
export function pdfTextOf(pdf: string): string {
  return pdfPagesText(pdf)
    .map((p) => p.join('\n'))
    .join('\n');
}
