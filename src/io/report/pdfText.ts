// The characters the record's embedded font has (DejaVu Sans cut down by
// scripts/subsetReportFont.sh to these ranges: Latin-1, Greek, punctuation, sub- and
// superscripts, arrows, the mathematical signs used). Anything else is spelled out or shown as
// "?", so a printed record never shows an empty box.
export const FONT_UNICODE_RANGES =
  'U+0020-007E,U+00A0-00FF,U+0131,U+0152-0153,U+0160-0161,U+0178,U+017D-017E,U+0192,U+02C6,U+02DC,U+0300-0304,U+0391-03A9,U+03B1-03C9,U+03D1,U+03D5,U+2002-2015,U+2018-201E,U+2020-2022,U+2026,U+2030,U+2032-2033,U+2039-203A,U+2070-209C,U+20AC,U+2122,U+2190-2195,U+21D2,U+2202,U+2206,U+2211-2212,U+2218-221A,U+221D-221E,U+2229-222B,U+2248,U+2260-2265,U+22C5,U+2713,U+2717,U+25CF';

const RANGES: [number, number][] = FONT_UNICODE_RANGES.split(',').map((r) => {
  const [a, b] = r.replace(/U\+/g, '').split('-');
  const lo = parseInt(a ?? '0', 16);
  return [lo, b === undefined ? lo : parseInt(b, 16)];
});

const REPLACEMENTS: Record<string, string> = {
  '\t': ' ',
  '≲': '<~',
  '≳': '>~',
  '⇒': '=>',
};

export function isInReportFont(ch: string): boolean {
  const c = ch.codePointAt(0) ?? 0;
  return RANGES.some(([lo, hi]) => c >= lo && c <= hi);
}

export function pdfText(text: string): string {
  let out = '';
  for (const ch of text) out += isInReportFont(ch) ? ch : (REPLACEMENTS[ch] ?? '?');
  return out;
}
