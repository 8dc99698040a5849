// Turning a file's bytes into text, the same way in the page and on the command line. Accepted:
// UTF-8 (with or without a byte-order mark), UTF-16 LE or BE with a byte-order mark, and, for
// bytes that are not valid UTF-8, Latin-1 as Windows writes it (Windows-1252, which is what the
// WHATWG encoding standard reads "latin1" as). Refused: UTF-32, and NUL bytes without a UTF-16
// byte-order mark (UTF-16 without one, or not a text file). Anything other than plain UTF-8 comes
// with a note naming the encoding read, for the page's notice and the command line's stderr.

export type TextEncodingName =
  'UTF-8' | 'UTF-8 with byte-order mark' | 'UTF-16 LE' | 'UTF-16 BE' | 'Latin-1 (Windows-1252)';

export type DecodedText =
  | {
      ok: true;
      text: string;
      encoding: TextEncodingName;
      /** "read as UTF-16 LE (byte-order mark)"; null for plain UTF-8. */
      note: string | null;
    }
  | { ok: false; problem: string };

const SAVE_AS_UTF8 = 'save it as UTF-8 and try again';

function startsWith(bytes: Uint8Array, prefix: readonly number[]): boolean {
  return prefix.length <= bytes.length && prefix.every((b, i) => bytes[i] === b);
}

function decodeStrict(label: string, bytes: Uint8Array): string | null {
  try {
    return new TextDecoder(label, { fatal: true, ignoreBOM: true }).decode(bytes);
  } catch {
    return null;
  }
}

/**
 * Code points of bytes 0x80–0x9F in Windows-1252 (WHATWG Encoding Standard, index-windows-1252;
 * the five unassigned bytes map to the C1 controls of the same value); every other byte is its
 * own code point. Written out because Node's TextDecoder reads "windows-1252" as ISO-8859-1
 * (0x80 → U+0080, not €), which would make the command line differ from the page.
 */
const WINDOWS_1252_80_9F = [
  0x20ac, 0x81, 0x201a, 0x192, 0x201e, 0x2026, 0x2020, 0x2021, 0x2c6, 0x2030, 0x160, 0x2039, 0x152,
  0x8d, 0x17d, 0x8f, 0x90, 0x2018, 0x2019, 0x201c, 0x201d, 0x2022, 0x2013, 0x2014, 0x2dc, 0x2122,
  0x161, 0x203a, 0x153, 0x9d, 0x17e, 0x178,
];

export function decodeWindows1252(bytes: Uint8Array): string {
  let out = '';
  for (let i = 0; i < bytes.length; i += 8192) {
    const chunk = Array.from(bytes.subarray(i, i + 8192), (b) =>
      b >= 0x80 && b <= 0x9f ? (WINDOWS_1252_80_9F[b - 0x80] as number) : b,
    );
    out += String.fromCharCode(...chunk);
  }
  return out;
}

export function decodeTextBytes(bytes: Uint8Array): DecodedText {
  if (startsWith(bytes, [0xff, 0xfe, 0x00, 0x00]) || startsWith(bytes, [0x00, 0x00, 0xfe, 0xff]))
    return { ok: false, problem: `the file is UTF-32, which is not read: ${SAVE_AS_UTF8}` };
  if (startsWith(bytes, [0xef, 0xbb, 0xbf])) {
    const text = decodeStrict('utf-8', bytes.subarray(3));
    return text === null
      ? { ok: false, problem: `the file starts as UTF-8 but is not valid UTF-8: ${SAVE_AS_UTF8}` }
      : {
          ok: true,
          text,
          encoding: 'UTF-8 with byte-order mark',
          note: 'read as UTF-8 (byte-order mark removed)',
        };
  }
  for (const [bom, label, encoding] of [
    [[0xff, 0xfe], 'utf-16le', 'UTF-16 LE'],
    [[0xfe, 0xff], 'utf-16be', 'UTF-16 BE'],
  ] as const) {
    if (!startsWith(bytes, bom)) continue;
    const text = decodeStrict(label, bytes.subarray(2));
    return text === null
      ? {
          ok: false,
          problem: `the file is marked ${encoding} but is not valid ${encoding}: ${SAVE_AS_UTF8}`,
        }
      : { ok: true, text, encoding, note: `read as ${encoding} (byte-order mark)` };
  }
  if (bytes.includes(0))
    return {
      ok: false,
      problem: `the file holds NUL bytes: UTF-16 without a byte-order mark, or not a text file; ${SAVE_AS_UTF8}`,
    };
  const utf8 = decodeStrict('utf-8', bytes);
  if (utf8 !== null) return { ok: true, text: utf8, encoding: 'UTF-8', note: null };
  return {
    ok: true,
    text: decodeWindows1252(bytes),
    encoding: 'Latin-1 (Windows-1252)',
    note: 'read as Latin-1 (Windows-1252): the file is not valid UTF-8',
  };
}
