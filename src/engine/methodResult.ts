// The shape every dose method returns, so the CLI, the worker API and the page treat all
// methods alike. Curves are sampled on the same depth grid for every method of a case.
import type { MethodId } from './methodRegistry';
import type { DoseNote } from './dose/doseConversion';

export type MethodClass = 'none' | 'type A' | 'type B' | 'type C';

export interface MethodCurve {
  depthCm: number[];
  /** Dose per monitor unit (cGy/MU) at each depth, or null where the method cannot give one. */
  dosePerMuCGy: (number | null)[];
  /** Correction factor D_het/D_water at each depth (1 for the water method). */
  cf: (number | null)[];
  /** One standard deviation of dosePerMuCGy (Monte Carlo only). */
  sigmaDosePerMuCGy?: number[];
  /** One standard deviation of cf (Monte Carlo only). */
  sigmaCf?: number[];
}

export interface MethodPoint {
  id: string;
  depthCm: number;
  cf: number | null;
  dosePerMuCGy: number | null;
  sigmaDosePerMuCGy?: number;
  /** Short flags raised for this method at this point (e.g. "extrapolated"). */
  flags: string[];
}

export interface MethodResult {
  /** Stable id from the method registry (src/engine/methodRegistry.ts). */
  id: MethodId;
  label: string;
  /** The variant used, printed with every result (e.g. "TMR, no shift, μ₀ ≡ water"). */
  variant: string;
  methodClass: MethodClass;
  /** "modelled beam" or "measured table: <file name>". */
  waterData: string;
  curve: MethodCurve;
  points: MethodPoint[];
  /** Dose to water or to medium, and how it was converted (set by dose/doseConversion.ts). */
  dose?: DoseNote;
  /**
   * Type A only: geometric depth (cm) from which the method gives no value because it would need
   * TMR beyond the deepest depth of its water data (absent when the table covers the phantom).
   */
  beyondWaterDataFromCm?: number;
}
