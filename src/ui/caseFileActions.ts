// Opening a case file into the editor and naming a saved one. An invalid file leaves the case
// as it was and lists its problems with their field paths.
import { parseCaseText } from '../io/caseFile';
import { replaceCase, setNotice } from '../state/store';
import { applyCheckSettings } from './check/pageCheckSettings';
import { readTextFile } from './readTextFile';

export function fileNameFor(name: string): string {
  const slug = name
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '')
    .slice(0, 60);
  return `${slug || 'case'}.json`;
}

/** Largest case file read (a valid case, inline water tables included, is under 1 MB). */
export const MAX_CASE_FILE_BYTES = 8 * 1024 * 1024;

export async function openCaseFile(file: File): Promise<void> {
  const refuse = (why: string) =>
    setNotice({
      kind: 'error',
      title: `${file.name} was not opened; the current case is unchanged.`,
      lines: [why],
    });
  if (file.size > MAX_CASE_FILE_BYTES) {
    refuse(
      `(file): ${(file.size / 1024 / 1024).toFixed(1)} MB is too large for a case file (at most ${MAX_CASE_FILE_BYTES / 1024 / 1024} MB)`,
    );
    return;
  }
  const read = await readTextFile(file);
  if (!read.ok) {
    refuse(`(file): ${read.problem}`);
    return;
  }
  const r = parseCaseText(read.text);
  if (r.ok) {
    replaceCase(r.value);
    applyCheckSettings(r.value.check);
    setNotice({ kind: 'info', title: `Opened ${file.name}`, lines: read.note ? [read.note] : [] });
  } else
    setNotice({
      kind: 'error',
      title: `${file.name} was not opened; the current case is unchanged.`,
      lines: r.problems.map((p) => `${p.path}: ${p.message}`),
    });
}
