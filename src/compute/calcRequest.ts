// The one calculation contract between the page (or the CLI) and the worker-side functions: what
// to calculate (a case or a plan), which water data (src/compute/waterSource), and for what
// purpose. The purpose fixes grid, methods and variants, so the caller only schedules and draws.
import type { Tolerances } from '../engine/check/tolerance';
import type { DoseQuantity } from '../engine/dose/doseQuantity';
import type { Prescription } from '../engine/check/planCheck';
import type { McRunOutput } from './monteCarloCalibration';
import type { WaterSourceSpec } from './waterSource';
import type { McCalcOptions } from './calculateCase';
import type { TypeAVariants } from './typeAForCase';

export type CalcPurpose = 'preview' | 'full' | 'plan' | 'monte-carlo';

/** A Monte Carlo run finished (or partial) in the page's worker pool, with the case it belongs to. */
export interface McRunAttachment {
  /** monteCarloRunKey of the case, water source and dose convention the run was started for. */
  key: string;
  run: McRunOutput;
  /** Words added to the method's label while the run is not a finished one ("running, partial"). */
  note: string | null;
}

export interface CaseCalcOptions {
  /** Method ids to compute (full only); all available when absent. */
  methods?: readonly string[];
  /** Run the Monte Carlo in this calculation (CLI). */
  mc?: McCalcOptions;
  /** Type-A variants (Batho TAR/TMR, ETAR ρ̃ entered). */
  typeA?: Pick<TypeAVariants, 'bathoTable' | 'etarRhoTilde' | 'etarScatterLengthCm'>;
  /**
   * Dose to water or dose to medium for every method; absent: the file's own setting, else water
   * (src/compute/doseConvention.ts).
   */
  doseTo?: DoseQuantity;
}

export interface PlanCalcOverrides {
  /** Overrides the plan's tolerances (e.g. edited on the page). */
  tolerances?: Tolerances;
  /** Overrides the plan's deciding method. */
  checkMethodId?: string;
  /** Overrides the plan's prescription (total dose at a point, all beams). */
  prescription?: Prescription;
}

export type CalcRequest =
  | {
      purpose: 'preview' | 'full';
      /** A case document (validated in the worker). */
      case: unknown;
      water: WaterSourceSpec;
      options?: CaseCalcOptions;
      /** The page's Monte Carlo run, merged when it belongs to this case (full only). */
      mcRun?: McRunAttachment | null;
    }
  | {
      purpose: 'plan';
      /** A plan document, or a case document (a one-beam plan). */
      plan: unknown;
      water: WaterSourceSpec;
      options?: CaseCalcOptions & PlanCalcOverrides;
      /** The page's Monte Carlo run, merged into the first beam when it belongs to it. */
      mcRun?: McRunAttachment | null;
    }
  | {
      purpose: 'monte-carlo';
      case: unknown;
      water: WaterSourceSpec;
      /** The run's dose convention: absent, the case's own setting, else water (doseConvention.ts). */
      run: { histories: number; seed: number; doseTo?: DoseQuantity };
    };

export interface Problem {
  path: string;
  message: string;
}
