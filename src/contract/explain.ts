// What the factor view and the sweeps get back from the worker (src/compute/explainPoint.ts,
// src/compute/cfSweep.ts), as plain serialisable data: types only, so the page and src/io read
// them without importing the calculation.
import type {
  BathoLayerTerm,
  ExplainFactor,
  ExplainQuantity,
} from '../engine/corrections/correctionExplanation';
import type { DoseQuantity } from '../engine/dose/doseQuantity';
import type { MethodClass } from '../engine/methodResult';

export type { BathoLayerTerm, ExplainFactor, ExplainQuantity };

/** Type-B dose parts at the depth (cGy/MU, native dose to medium, before any conversion). */
export interface DoseParts {
  dosePerMuCGy: number;
  waterDosePerMuCGy: number;
  primary?: { dosePerMuCGy: number; waterDosePerMuCGy: number };
  scatter?: { dosePerMuCGy: number; waterDosePerMuCGy: number };
  /** Dose per MU from the TERMA released in each layer (index from the surface). */
  byLayerOfOrigin?: number[];
}

export interface MethodExplanation {
  id: string;
  label: string;
  methodClass: MethodClass;
  /** The CF the method reports at this depth (in the request's dose convention), or null. */
  cf: number | null;
  /** Π factors: equals cf (to rounding) whenever cf is not null. */
  product: number | null;
  quantities: ExplainQuantity[];
  /** In order; the last one converts to the dose convention when that is not the native one. */
  factors: ExplainFactor[];
  bathoLayers?: BathoLayerTerm[];
  parts?: DoseParts;
  flags: string[];
}

export interface ExplainLayer {
  index: number;
  material: string;
  topCm: number;
  bottomCm: number;
  relativeElectronDensity: number;
}

export interface PointExplanation {
  depthCm: number;
  radiologicalDepthCm: number;
  /** Layer holding the depth (a depth on an interface belongs to the upstream layer). */
  layerIndex: number;
  layers: ExplainLayer[];
  doseTo: DoseQuantity;
  waterData: string;
  methods: MethodExplanation[];
  /** Methods with no written-out factors here, and why (e.g. the Monte Carlo). */
  notes: string[];
}

export type SweepVariable = 'density' | 'field' | 'energy' | 'depth';

export interface SweepSeries {
  methodId: string;
  label: string;
  /** Beam energy of the series (the x value itself for an energy sweep). */
  energy: string;
  /** CF at each x (NaN where the method gives no value: drawn as a gap, written as an empty cell). */
  cf: Float64Array;
}

export interface SweepResult {
  variable: SweepVariable;
  /** Axis title with its unit, e.g. "Density of layer 2 (lung) (g/cm³)". */
  xLabel: string;
  x: Float64Array;
  /** Energy sweep: the nominal energy of each x ("6MV"); otherwise absent. */
  xNames?: string[];
  /** The fixed conditions (point depth, field, energy or layer), in words. */
  conditions: string;
  doseTo: DoseQuantity;
  series: SweepSeries[];
  notes: string[];
}
