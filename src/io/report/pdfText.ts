// jsPDF's standard fonts cover WinAnsi (Latin-1 plus a few signs) only; other characters are
// spelled out so a printed record never shows garbage.
const REPLACEMENTS: Record<string, string> = {
  Δ: 'diff ',
  '⁻': '-',
  '′': "'",
  '₀': '0',
  '≤': '<=',
  '≥': '>=',
  μ: 'u',
  ρ: 'rho',
  σ: 'sigma',
  '→': '->',
  '≈': '~',
  '−': '-',
  '✓': 'ok',
  '✗': 'x',
};

/** Characters of Windows-1252 above 0x7F outside Latin-1 that the standard fonts print. */
const WIN_ANSI_EXTRA = new Set('€‚ƒ„…†‡ˆ‰Š‹ŒŽ‘’“”•–—˜™š›œžŸ');

export function pdfText(text: string): string {
  let out = '';
  for (const ch of text) {
    const code = ch.codePointAt(0) ?? 0;
    if (code < 0x80 || (code >= 0xa0 && code <= 0xff) || WIN_ANSI_EXTRA.has(ch)) out += ch;
    else out += REPLACEMENTS[ch] ?? '?';
  }
  return out;
}
