// File bytes to text, one function for the page and the command line. Byte values are those of
// the Unicode standard's encoding forms (UTF-8, UTF-16, UTF-32 byte-order marks) and the WHATWG
// Encoding Standard's windows-1252 index (0x80 → U+20AC €, 0xB5 → U+00B5 µ, 0xE9 → U+00E9 é).
import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { decodeTextBytes, decodeWindows1252 } from '../../../src/io/textDecoding';

const utf16le = (s: string) => {
  const out = new Uint8Array(2 + 2 * s.length);
  out.set([0xff, 0xfe]);
  for (let i = 0; i < s.length; i++) {
    out[2 + 2 * i] = s.charCodeAt(i) & 0xff;
    out[3 + 2 * i] = s.charCodeAt(i) >> 8;
  }
  return out;
};
const utf16be = (s: string) => {
  const le = utf16le(s);
  const out = new Uint8Array(le.length);
  out.set([0xfe, 0xff]);
  for (let i = 2; i < le.length; i += 2) {
    out[i] = le[i + 1]!;
    out[i + 1] = le[i]!;
  }
  return out;
};
const utf8 = (s: string) => new TextEncoder().encode(s);
const withUtf8Bom = (s: string) => Uint8Array.from([0xef, 0xbb, 0xbf, ...utf8(s)]);

describe('decodeTextBytes(...)', () => {
  const text = 'depth cm,µ 10 × 10 °\n1.5,1.0\n';

  it('reads plain UTF-8 with no note', () => {
    expect(decodeTextBytes(utf8(text))).toEqual({ ok: true, text, encoding: 'UTF-8', note: null });
  });

  it('reads UTF-8 with a byte-order mark, removes the mark and says so', () => {
    expect(decodeTextBytes(withUtf8Bom(text))).toEqual({
      ok: true,
      text,
      encoding: 'UTF-8 with byte-order mark',
      note: 'read as UTF-8 (byte-order mark removed)',
    });
  });

  it('reads UTF-16 LE and BE with a byte-order mark and names them', () => {
    expect(decodeTextBytes(utf16le(text))).toMatchObject({
      ok: true,
      text,
      note: 'read as UTF-16 LE (byte-order mark)',
    });
    expect(decodeTextBytes(utf16be(text))).toMatchObject({
      ok: true,
      text,
      note: 'read as UTF-16 BE (byte-order mark)',
    });
  });

  it('reads bytes that are not UTF-8 as Latin-1 (Windows-1252) and names it', () => {
    const bytes = Uint8Array.from([0x80, 0x20, 0xb5, 0x20, 0xe9, 0x0a]);
    expect(decodeTextBytes(bytes)).toEqual({
      ok: true,
      text: '€ µ é\n',
      encoding: 'Latin-1 (Windows-1252)',
      note: 'read as Latin-1 (Windows-1252): the file is not valid UTF-8',
    });
  });

  it('refuses UTF-32, NUL bytes without a UTF-16 mark, and a broken UTF-16 file, saying why', () => {
    const refused = (b: Uint8Array) => {
      const r = decodeTextBytes(b);
      return r.ok ? null : r.problem;
    };
    expect(refused(Uint8Array.from([0xff, 0xfe, 0, 0, 0x41, 0, 0, 0]))).toMatch(
      /^the file is UTF-32/,
    );
    expect(refused(Uint8Array.from([0, 0, 0xfe, 0xff, 0, 0, 0, 0x41]))).toMatch(
      /^the file is UTF-32/,
    );
    expect(refused(utf16le(text).subarray(2))).toMatch(
      /NUL bytes: UTF-16 without a byte-order mark/,
    );
    expect(refused(Uint8Array.from([0xff, 0xfe, 0x41]))).toMatch(
      /marked UTF-16 LE but is not valid/,
    );
    expect(refused(Uint8Array.from([0xef, 0xbb, 0xbf, 0xc3]))).toMatch(/not valid UTF-8/);
  });

  it('an empty file is plain UTF-8 text (the readers then say it is empty)', () => {
    expect(decodeTextBytes(new Uint8Array(0))).toEqual({
      ok: true,
      text: '',
      encoding: 'UTF-8',
      note: null,
    });
  });
});

describe('the command line reads the same bytes the same way', () => {
  const calc = (args: string[]) => {
    const r = spawnSync(process.execPath, ['--import', 'tsx', 'src/cli/calc.ts', ...args], {
      encoding: 'utf8',
    });
    return { code: r.status, out: r.stdout, err: r.stderr };
  };
  const dir = mkdtempSync(join(tmpdir(), 'lamina-enc-'));
  const demo = readFileSync('public/cases/water-reference-6mv.json', 'utf8').replace(
    '"name": "Demo:',
    '"name": "Démo µ:',
  );

  it('a case in UTF-16 LE, UTF-8 with a mark or Latin-1 gives the UTF-8 file’s result, with a note', () => {
    const files = {
      'utf8.json': utf8(demo),
      'utf16.json': utf16le(demo),
      'bom.json': withUtf8Bom(demo),
      'latin1.json': Uint8Array.from([...demo].map((ch) => ch.charCodeAt(0))), // é, µ < 0x100
    };
    for (const [name, bytes] of Object.entries(files)) writeFileSync(join(dir, name), bytes);
    const run = (name: string) => calc([join(dir, name), '--json', '--methods', 'water,rtmr']);
    const plain = run('utf8.json');
    expect(plain.code).toBe(0);
    expect(plain.err).toBe('');
    const doc = JSON.parse(plain.out) as { caseName: string };
    expect(doc.caseName).toMatch(/^Démo µ:/);
    for (const [name, note] of [
      ['utf16.json', 'read as UTF-16 LE (byte-order mark)'],
      ['bom.json', 'read as UTF-8 (byte-order mark removed)'],
      ['latin1.json', 'read as Latin-1 (Windows-1252): the file is not valid UTF-8'],
    ] as const) {
      const r = run(name);
      expect(r.code, name).toBe(0);
      expect(JSON.parse(r.out)).toEqual(doc);
      expect(r.err).toBe(`note: ${join(dir, name)}: ${note}\n`);
    }
  });

  it('a water table in UTF-16 reads as its UTF-8 copy; a UTF-16 file without a mark is refused', () => {
    const csv = readFileSync('public/tables/demo-6mv-tmr.csv', 'utf8');
    writeFileSync(join(dir, 't16.csv'), utf16le(csv));
    writeFileSync(join(dir, 'nomark.csv'), utf16le(csv).subarray(2));
    const CASE = 'public/cases/lung-slab-6mv.json';
    const a = calc([
      CASE,
      '--tmr',
      'public/tables/demo-6mv-tmr.csv',
      '--dmax',
      '1.5',
      '--json',
      '--methods',
      'rtmr',
    ]);
    const b = calc([
      CASE,
      '--tmr',
      join(dir, 't16.csv'),
      '--dmax',
      '1.5',
      '--json',
      '--methods',
      'rtmr',
    ]);
    expect(b.code).toBe(0);
    const points = (out: string) =>
      (JSON.parse(out) as { methods: { points: unknown[] }[] }).methods[0]!.points;
    expect(points(b.out)).toEqual(points(a.out));
    expect(b.err).toMatch(/^note: .*t16\.csv: read as UTF-16 LE \(byte-order mark\)$/m);
    const c = calc([CASE, '--tmr', join(dir, 'nomark.csv'), '--methods', 'rtmr']);
    expect(c.code).toBe(2);
    expect(c.err).toMatch(
      /nomark\.csv: the file holds NUL bytes: UTF-16 without a byte-order mark/,
    );
  });
});

describe('decodeWindows1252(...)', () => {
  it('maps 0x80–0x9F by the WHATWG windows-1252 index and every other byte to itself', () => {
    // WHATWG Encoding Standard, index-windows-1252 (the same as Python's cp1252 for the 27
    // assigned bytes; the five unassigned ones stay C1 controls).
    const all = decodeWindows1252(Uint8Array.from({ length: 256 }, (_, i) => i));
    expect(all.length).toBe(256);
    expect(all.slice(0x80, 0xa0)).toBe('€\u0081‚ƒ„…†‡ˆ‰Š‹Œ\u008dŽ\u008f\u0090‘’“”•–—˜™š›œ\u009džŸ');
    for (const b of [0, 0x41, 0x7f, 0xa0, 0xb5, 0xe9, 0xff]) expect(all.charCodeAt(b)).toBe(b);
  });
});
