// Share links: the case packed into the page address's hash (never sent to a server), and
// opening such a link on start-up. A damaged link leaves the current case and lists problems.
import { decodeShareHash, isShareHash, shareUrlOf } from '../io/shareLink';
import { toCaseFile } from '../state/editorCase';
import { replaceCase, setNotice, useAppStore } from '../state/store';
import { applyCheckSettings, caseWithPageCheck } from './check/pageCheckSettings';

export async function copyShareLink(): Promise<void> {
  const c = caseWithPageCheck(toCaseFile(useAppStore.getState().history.present));
  let url: string;
  try {
    url = await shareUrlOf(window.location.href, { kind: 'case', value: c });
  } catch (e) {
    setNotice({
      kind: 'error',
      title: 'The share link could not be made',
      lines: [(e as Error).message],
    });
    return;
  }
  const copied = await navigator.clipboard.writeText(url).then(
    () => true,
    () => false,
  );
  setNotice({
    kind: 'info',
    title: copied
      ? `Link copied (${url.length} characters). It carries the whole case in the address; nothing is uploaded.`
      : 'Copy this link (it carries the whole case in the address; nothing is uploaded):',
    lines: copied ? [] : [url],
  });
}

/** Open a case carried in the page address (#case=…), then drop the hash from the address. */
export async function openShareLinkFromAddress(): Promise<void> {
  const hash = window.location.hash;
  if (!isShareHash(hash)) return;
  const r = await decodeShareHash(hash);
  if (!r.ok) {
    setNotice({
      kind: 'error',
      title: 'The link could not be opened; the current case is unchanged.',
      lines: r.problems.map((p) => `${p.path}: ${p.message}`),
    });
    return;
  }
  if (r.doc.kind !== 'case') {
    setNotice({
      kind: 'info',
      title: 'This link carries a multi-beam plan: open it from “Point check & report”.',
      lines: [],
    });
    return;
  }
  replaceCase(r.doc.value);
  applyCheckSettings(r.doc.value.check);
  setNotice({
    kind: 'info',
    title: `Opened the case “${r.doc.value.name}” from the link.`,
    lines: [],
  });
  window.history.replaceState(null, '', window.location.pathname + window.location.search);
}
