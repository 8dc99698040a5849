// A file's text for the command line, decoded as the page decodes picked files
// (src/io/textDecoding): a note names the encoding when it is not plain UTF-8.
import { readFileSync } from 'node:fs';
import { decodeTextBytes } from '../io/textDecoding';

export type ReadText =
  { ok: true; text: string; note: string | null } | { ok: false; problem: string };

export function readTextFile(path: string): ReadText {
  let bytes: Uint8Array;
  try {
    bytes = readFileSync(path);
  } catch (e) {
    return { ok: false, problem: `cannot read (${(e as Error).message})` };
  }
  const d = decodeTextBytes(bytes);
  return d.ok ? { ok: true, text: d.text, note: d.note } : d;
}

/** Reads a file, printing its encoding note on stderr ("note: a.csv: read as UTF-16 LE …"). */
export function readTextFileNoting(path: string): ReadText {
  const r = readTextFile(path);
  if (r.ok && r.note) console.error(`note: ${path}: ${r.note}`);
  return r;
}
