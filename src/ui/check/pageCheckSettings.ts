// The page's check settings as a file carries them, both ways: the prescription, tolerances and
// deciding method of the check panel and the page-wide dose convention, written into a saved
// case's `check` block (Save, share link) and restored from a case or plan when it is opened.
// A file without a setting opens with its default, as on the command line.
import { DEFAULT_TOLERANCES } from '../../engine/check/tolerance';
import { DEFAULT_DOSE_QUANTITY } from '../../engine/dose/doseQuantity';
import { isMethodId } from '../../engine/methodRegistry';
import type { LaminaCase } from '../../io/caseSchema';
import type { CaseCheckSettings } from '../../io/checkSettingsSchema';
import { caseWithCheckSettings } from '../../io/planFile';
import { patchCheck, useCheckStore } from './checkStore';

/** The page's settings for a case with these point ids (a prescription at a missing point is left out). */
export function pageCheckSettings(pointIds: readonly string[]): CaseCheckSettings {
  const s = useCheckStore.getState();
  const out: CaseCheckSettings = {
    tolerances: { ...s.tolerances },
    doseTo: s.doseTo,
  };
  if (s.prescriptionDoseCGy !== null && pointIds.includes(s.prescriptionPointId))
    out.prescription = { pointId: s.prescriptionPointId, doseCGy: s.prescriptionDoseCGy };
  if (isMethodId(s.checkMethodId)) out.checkMethodId = s.checkMethodId;
  return out;
}

/** A case file with the page's check settings in its `check` block. */
export function caseWithPageCheck(c: LaminaCase): LaminaCase {
  return caseWithCheckSettings(c, pageCheckSettings(c.points.map((p) => p.id)));
}

/** Restore a file's settings on the page (defaults for what it leaves out). */
export function applyCheckSettings(s: CaseCheckSettings | undefined): void {
  patchCheck({
    prescriptionPointId: s?.prescription?.pointId ?? '',
    prescriptionDoseCGy: s?.prescription?.doseCGy ?? null,
    tolerances: { ...(s?.tolerances ?? DEFAULT_TOLERANCES) },
    checkMethodId: s?.checkMethodId ?? '',
    doseTo: s?.doseTo ?? DEFAULT_DOSE_QUANTITY,
  });
}
