// The Monte Carlo panel's form (a slice of the page's one store, kept when switching views) and
// what the current run was started with.
import type { McCalibration } from '../../compute/monteCarloCalibration';

/** The form of the panel (kept when switching views) and what the current run was started with. */
export interface McForm {
  historiesText: string;
  seedText: string;
  doseToWater: boolean;
  /** Settings of the run in the store (null before any run). */
  run: {
    histories: number;
    seed: number;
    doseToWater: boolean;
    calibration: McCalibration;
    startedAtMs: number;
  } | null;
}

export const initialMcForm = (): McForm => ({
  historiesText: '200000',
  seedText: '1',
  doseToWater: false,
  run: null,
});
