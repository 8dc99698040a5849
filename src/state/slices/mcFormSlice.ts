// The Monte Carlo panel's form (a slice of the page's one store, kept when switching views) and
// what the current run was started with.
import type { McCalibration } from '../../compute/monteCarloCalibration';
import type { DoseQuantity } from '../../engine/dose/doseQuantity';

/** The form of the panel (kept when switching views) and what the current run was started with. */
export interface McForm {
  historiesText: string;
  seedText: string;
  /** Settings of the run in the store (null before any run). */
  run: {
    histories: number;
    seed: number;
    /** The dose convention the run reports (the page's when it was started). */
    doseTo: DoseQuantity;
    calibration: McCalibration;
    startedAtMs: number;
  } | null;
}

export const initialMcForm = (): McForm => ({
  historiesText: '200000',
  seedText: '1',
  run: null,
});
