// The point check's own inputs (a slice of the page's one store, src/state/store.ts): the extra
// beams of a multi-beam plan, the check's settings (prescription, tolerances, deciding method and
// the page-wide dose convention, saved with files, links and the autosave), and the worker's
// latest plan calculation. Beam 1 is always the case in the editor.
import type { PlanReport } from '../../contract/reports';
import { DEFAULT_TOLERANCES, type Tolerances } from '../../engine/check/tolerance';
import { DEFAULT_DOSE_QUANTITY, type DoseQuantity } from '../../engine/dose/doseQuantity';
import type { CaseProblem } from '../../io/caseFile';
import type { LaminaCase } from '../../io/caseSchema';

export interface ExtraBeam {
  key: string;
  id: string;
  label: string;
  weight: number;
  case: LaminaCase;
}

export interface CheckState {
  /** Name of a plan opened from a file or link ('' = the editor's case name). */
  planName: string;
  firstBeam: { id: string; label: string; weight: number };
  extraBeams: ExtraBeam[];
  prescriptionPointId: string;
  /** Total prescribed dose at the point (cGy), or null for none. */
  prescriptionDoseCGy: number | null;
  tolerances: Tolerances;
  /** The deciding method chosen ('' = the default for the path, decided in the worker). */
  checkMethodId: string;
  /** Dose to water or to medium for every method on the page (one choice, page-wide). */
  doseTo: DoseQuantity;
  /** The worker's latest plan calculation (src/ui/check/useCheck.ts) and the input it is for. */
  planReport: PlanReport | null;
  planProblems: CaseProblem[];
  planKey: string | null;
  /** The input last asked for: while it differs from planKey a newer calculation is coming. */
  wantedKey: string | null;
}

export const initialCheckState = (): CheckState => ({
  planName: '',
  firstBeam: { id: 'beam-1', label: '', weight: 1 },
  extraBeams: [],
  prescriptionPointId: '',
  prescriptionDoseCGy: null,
  tolerances: { ...DEFAULT_TOLERANCES },
  checkMethodId: '',
  doseTo: DEFAULT_DOSE_QUANTITY,
  planReport: null,
  planProblems: [],
  planKey: null,
  wantedKey: null,
});
