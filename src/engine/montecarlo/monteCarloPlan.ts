// What a Monte Carlo run of a case simulates: the case itself, water with the same set-up (for
// the correction factor CF = D_het/D_water) and the calibration condition (water, 10 × 10 cm² at
// 100 cm, SSD 100) that ties dose per fluence to dose per MU. All three use the same seed, so
// their photons are the same (correlated sampling: the ratios are less noisy than either dose).
// Identical scenarios are simulated once.
import type { BeamEnergy } from '../beam/energies';
import { ssdCmOf, type Setup } from '../beam/geometry';
import type { LayerSpec } from '../phantom/slabPhantom';
import type { DoseQuantity } from '../dose/doseQuantity';
import type { TransportOptions } from './transport';
import { DEFAULT_BINNING, type McBinning, type McScenario } from './scenario';
import {
  calibrationZoneCm,
  pointZonesCm,
  varianceReductionOf,
  type VarianceReduction,
} from './importanceZones';

/** The parts of a case file the Monte Carlo needs (a LaminaCase fits). */
export interface McCaseInput {
  beam: { energy: BeamEnergy; setup: Setup; fieldXCm: number; fieldYCm: number };
  layers: readonly LayerSpec[];
  points: readonly { id: string; depthCm: number }[];
}

export interface McOptions {
  histories: number;
  seed: number;
  /** Number of batches (≥ 10); default max(10, histories / 20 000). */
  batches?: number;
  /** Nominal depth-bin width (cm); default 0.25. */
  depthBinCm?: number;
  /** Dose to medium (scored, the default) or dose to water (converted by dose/doseConversion.ts). */
  doseTo?: DoseQuantity;
  /** cGy per MU at d_max for 10 × 10 cm², SSD 100 (default 1). */
  referenceDosePerMuCGy?: number;
  /**
   * Nominal d_max of the beam's water data for 10 × 10 cm², SSD 100 (cm): the calibration run's
   * maximum is then fitted over depth bins fixed around it (no selection bias). Absent: the run's
   * own maximum is used.
   */
  referenceDMaxCm?: number;
  /** Collimator-scatter factor S_c of the field (the MC models the phantom only; default 1). */
  collimatorScatterFactor?: number;
  transport?: TransportOptions;
  /**
   * Analogue transport: no variance reduction. By default the incident photons' first
   * interactions are forced into the depths feeding those read (points of interest, calibration
   * window) and charged particles that cannot reach them meet a Russian roulette
   * (importanceZones.ts); the results stay unbiased.
   */
  analogue?: boolean;
}

export type McRole = 'case' | 'water' | 'reference';

export interface McPlan {
  seed: number;
  batches: number;
  historiesPerBatch: number;
  binning: McBinning;
  scenarios: McScenario[];
  roles: Record<McRole, number>;
  /** Variance reduction of each scenario (undefined: analogue transport). */
  variance: (VarianceReduction | undefined)[];
  options: McOptions;
  points: { id: string; depthCm: number }[];
}

/** Depth of the calibration phantom (cm). */
export const REFERENCE_PHANTOM_DEPTH_CM = 30;

export function planMonteCarlo(c: McCaseInput, options: McOptions): McPlan {
  if (!Number.isInteger(options.histories) || options.histories < 10)
    throw new RangeError('histories: must be an integer ≥ 10');
  if (!Number.isInteger(options.seed)) throw new RangeError('seed: must be an integer');
  const batches = Math.max(10, options.batches ?? Math.ceil(options.histories / 20000));
  const historiesPerBatch = Math.ceil(options.histories / batches);
  const binning = {
    ...DEFAULT_BINNING,
    depthBinCm: options.depthBinCm ?? DEFAULT_BINNING.depthBinCm,
  };
  const ssdCm = ssdCmOf(c.beam.setup);
  const beam = {
    energy: c.beam.energy,
    ssdCm,
    fieldXCm: c.beam.fieldXCm,
    fieldYCm: c.beam.fieldYCm,
  };
  const layers = c.layers.map((l) => ({
    materialId: l.materialId,
    thicknessCm: l.thicknessCm,
    densityGPerCm3: l.densityGPerCm3,
  }));
  const total = layers.reduce((s, l) => s + l.thicknessCm, 0);
  const wanted: Record<McRole, McScenario> = {
    case: { ...beam, layers },
    water: { ...beam, layers: [{ materialId: 'water', thicknessCm: total, densityGPerCm3: 1 }] },
    reference: {
      energy: c.beam.energy,
      ssdCm: 100,
      fieldXCm: 10,
      fieldYCm: 10,
      layers: [{ materialId: 'water', thicknessCm: REFERENCE_PHANTOM_DEPTH_CM, densityGPerCm3: 1 }],
    },
  };
  const scenarios: McScenario[] = [];
  const keys: string[] = [];
  const roles = {} as Record<McRole, number>;
  for (const role of ['case', 'water', 'reference'] as const) {
    const s = wanted[role];
    const key = JSON.stringify(normalised(s));
    let i = keys.indexOf(key);
    if (i < 0) {
      i = scenarios.length;
      scenarios.push(s);
      keys.push(key);
    }
    roles[role] = i;
  }
  const pointDepths = c.points.map((p) => p.depthCm);
  const variance = options.analogue
    ? scenarios.map(() => undefined)
    : varianceReductionOf(scenarios, [
        { scenario: roles.case, zonesCm: pointZonesCm(wanted.case, binning, pointDepths) },
        { scenario: roles.water, zonesCm: pointZonesCm(wanted.water, binning, pointDepths) },
        {
          scenario: roles.reference,
          zonesCm: calibrationZoneCm(wanted.reference, binning, options.referenceDMaxCm),
        },
      ]);
  return {
    seed: options.seed,
    batches,
    historiesPerBatch,
    binning,
    scenarios,
    roles,
    variance,
    options,
    points: c.points.map((p) => ({ id: p.id, depthCm: p.depthCm })),
  };
}

/** Water at density 1 and an omitted density compare equal; so do adjacent identical layers. */
function normalised(s: McScenario): unknown {
  const layers: { m: string; rho: number; t: number }[] = [];
  for (const l of s.layers) {
    const m = l.materialId === 'custom' ? 'water' : l.materialId;
    const rho = l.densityGPerCm3 ?? (m === 'water' ? 1 : -1);
    const last = layers[layers.length - 1];
    if (last && last.m === m && last.rho === rho) last.t += l.thicknessCm;
    else layers.push({ m, rho, t: l.thicknessCm });
  }
  return { ...s, layers: layers.map((l) => ({ ...l, t: Math.round(l.t * 1e9) / 1e9 })) };
}
