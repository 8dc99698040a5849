// Opening plans and beams for the check: from a file (whole plan, or beams added to it) or from
// a plan link in the page address. Invalid input changes nothing and lists its problems.
import type { ChangeEvent } from 'react';
import { checkSettingsOfPlan, parsePlanText, type LaminaPlan } from '../../io/planFile';
import { applyCheckSettings } from './pageCheckSettings';
import { decodeShareHash } from '../../io/shareLink';
import { replaceCase, setNotice } from '../../state/store';
import {
  addExtraBeam,
  clearExtraBeams,
  patchCheck,
  patchFirstBeam,
  useCheckStore,
} from './checkStore';
import { readTextFile } from '../readTextFile';

/** Make a plan the check's beams: its first beam goes to the editor, the rest are extra beams. */
export function loadPlan(plan: LaminaPlan): void {
  const [first, ...rest] = plan.beams;
  if (!first) return;
  // Every beam reads its own measured table when it carries one (the default water source).
  replaceCase(first.case);
  patchFirstBeam({ id: first.id, label: first.label ?? '', weight: first.weight });
  clearExtraBeams();
  for (const b of rest)
    addExtraBeam({ id: b.id, label: b.label ?? '', weight: b.weight, case: b.case });
  patchCheck({ planName: plan.beams.length > 1 ? plan.name : '' });
  applyCheckSettings(checkSettingsOfPlan(plan));
}

/** Open a plan carried in the page address (#plan=…), then drop the hash. */
export async function openPlanFromAddress(): Promise<void> {
  if (!window.location.hash.startsWith('#plan=')) return;
  const r = await decodeShareHash(window.location.hash);
  if (!r.ok) {
    setNotice({
      kind: 'error',
      title: 'The plan link could not be opened; nothing changed.',
      lines: r.problems.map((p) => `${p.path}: ${p.message}`),
    });
    return;
  }
  if (r.doc.kind !== 'plan') return;
  loadPlan(r.doc.value);
  setNotice({
    kind: 'info',
    title: `Opened the plan “${r.doc.value.name}” from the link.`,
    lines: [],
  });
  window.history.replaceState(null, '', window.location.pathname + window.location.search);
}

function problemsNotice(fileName: string, lines: string[]): void {
  setNotice({ kind: 'error', title: `${fileName} was not opened; nothing changed.`, lines });
}

export async function addBeamsFromFile(
  e: ChangeEvent<HTMLInputElement>,
  replaceAll: boolean,
): Promise<void> {
  const file = e.target.files?.[0];
  e.target.value = '';
  if (!file) return;
  const read = await readTextFile(file);
  if (!read.ok) {
    problemsNotice(file.name, [`(file): ${read.problem}`]);
    return;
  }
  const r = parsePlanText(read.text);
  if (!r.ok) {
    problemsNotice(
      file.name,
      r.problems.map((p) => `${p.path}: ${p.message}`),
    );
    return;
  }
  const plan = r.value;
  if (replaceAll) {
    loadPlan(plan);
  } else {
    const taken = new Set([
      useCheckStore.getState().firstBeam.id,
      ...useCheckStore.getState().extraBeams.map((b) => b.id),
    ]);
    for (const b of plan.beams) {
      let id = b.id;
      for (let k = 2; taken.has(id); k++) id = `${b.id}-${k}`;
      taken.add(id);
      addExtraBeam({ id, label: b.label ?? b.case.name, weight: b.weight, case: b.case });
    }
  }
  setNotice({ kind: 'info', title: `Opened ${file.name}`, lines: read.note ? [read.note] : [] });
}
