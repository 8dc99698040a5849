// The reports a calculation hands back, as plain serialisable data: one case (CalcReport, the
// CLI's "lamina.calc" document) and one plan with its point check (PlanReport). Types only, so
// src/io, src/ui and src/cli read them without importing the calculation (src/compute).
import type { DosePerMuFactors } from '../engine/check/dosePerMu';
import type { PlanCheck } from '../engine/check/planCheck';
import type { Warning } from '../engine/equilibrium/warning';
import type { MethodResult } from '../engine/methodResult';
import type { DoseQuantity } from '../engine/dose/doseQuantity';

export const CALC_FORMAT = 'lamina.calc';
export const CALC_VERSION = 1;
export const PLAN_CALC_FORMAT = 'lamina.plancalc';

export interface CalcReport {
  format: typeof CALC_FORMAT;
  version: typeof CALC_VERSION;
  caseName: string;
  beam: {
    energy: string;
    setup: string;
    ssdCm: number;
    fieldXCm: number;
    fieldYCm: number;
    equivalentSquareAtSurfaceCm: number;
  };
  layers: {
    index: number;
    materialId: string;
    material: string;
    thicknessCm: number;
    topCm: number;
    bottomCm: number;
    densityGPerCm3: number;
    relativeElectronDensity: number;
  }[];
  points: { id: string; depthCm: number; radiologicalDepthCm: number; layerIndex: number }[];
  /** Depth grid shared by all curves (cm). */
  depthCm: number[];
  /** Radiological depth on that grid (cm). */
  radiologicalDepthCm: number[];
  methods: MethodResult[];
  /** Method ids that were asked for but are not available, with the reason. */
  unavailable: { id: string; reason: string }[];
  /** Equilibrium and validity warnings (src/engine/equilibrium), sorted by depth. */
  warnings: Warning[];
  cautions: string[];
  /** The dose convention of every method's dose (each method's `dose` says how it got there). */
  doseTo: DoseQuantity;
}

export interface PlanBeamReport {
  id: string;
  label: string;
  weight: number;
  report: CalcReport;
  /** Water dose-per-MU factor chain (CF = 1) at each point, when the beam has water data. */
  waterChains: Record<string, DosePerMuFactors>;
}

export interface PlanReport {
  format: typeof PLAN_CALC_FORMAT;
  version: 1;
  planName: string;
  beams: PlanBeamReport[];
  check: PlanCheck;
}

/** Cautions carried with every result (README, Cautions). */
export const CAUTIONS: readonly string[] = [
  'Lamina is a teaching and independent-check aid, not a treatment-planning or MU-verification system.',
  'A modelled beam is not a commissioned beam: results depend on the beam data entered or modelled.',
  'Clinical decisions follow the local protocol and a licensed medical physicist’s judgement.',
  'Slab phantoms are idealised: laterally infinite flat layers, central axis only, no patient contour or motion.',
];

/** Reason given for a type-A method that has no water data to work from (the page tests for it). */
export const NEEDS_WATER_DATA = 'needs water data: load a measured TMR/PDD table';
