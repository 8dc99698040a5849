// Opening a case file into the editor and naming a saved one. An invalid file leaves the case
// as it was and lists its problems with their field paths.
import { parseCaseText } from '../io/caseFile';
import { replaceCase, setNotice } from '../state/store';

export function fileNameFor(name: string): string {
  const slug = name
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '')
    .slice(0, 60);
  return `${slug || 'case'}.json`;
}

export async function openCaseFile(file: File): Promise<void> {
  const text = await file.text();
  const r = parseCaseText(text);
  if (r.ok) {
    replaceCase(r.value);
    setNotice({ kind: 'info', title: `Opened ${file.name}`, lines: [] });
  } else
    setNotice({
      kind: 'error',
      title: `${file.name} was not opened; the current case is unchanged.`,
      lines: r.problems.map((p) => `${p.path}: ${p.message}`),
    });
}
