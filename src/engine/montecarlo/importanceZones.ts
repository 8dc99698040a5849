// Where each scenario of a Monte Carlo run is read, and so where its variance reduction spends the
// effort: in the case and water runs the depth bins each point of interest is sampled from (its
// bin and the neighbour it is interpolated with: within two bins of the point), in the
// calibration run the window of its d_max fit. A scenario serving several roles gets the union;
// one whose whole curve is read (no points; a calibration without a nominal d_max, whose maximum
// is searched over the whole curve) runs analogue.
// Two unbiased techniques use these zones:
// - the incident photon's first interaction is forced into the depths that feed a zone: from one
//   electron range upstream of it (CSDA range at the spectrum's mean photon energy, in the
//   phantom's own media) to its bottom (forcedInteraction.ts);
// - electrons and positrons that cannot reach a zone meet a Russian roulette (chargedRoulette.ts).
import { calibrationWindowBins } from './calibrationMaximum';
import type { DepthZone, ZoneRouletteSpec } from './chargedRoulette';
import { electronGridPosition, electronTablesOf } from './electronTables';
import { atGrid } from './photonCrossSections';
import { getMaterial } from '../materials/materialLibrary';
import { makeSpectrumSampler } from './spectrumSampler';
import { scoringGrid, type McBinning, type McScenario } from './scenario';

/** What a batch of one scenario does to reduce its variance (plain data, sent to workers). */
export interface VarianceReduction extends ZoneRouletteSpec {
  /** Depths (cm) where the incident photon's first interaction is forced. */
  forcedCm: DepthZone[];
}

/**
 * Survival probability of a charged particle that cannot reach a zone. On the mid-lung case
 * (18 MV 5 × 5, point mid-lung, forced interactions on) 1/4, 1/8, 1/16 and 1/32 reach 1 % at the
 * point in the same CPU time within 15 %: the forced electrons dominate the work. The largest of
 * them keeps the curve away from the points least noisy (electron part of its variance ×4 per
 * history).
 */
export const ROULETTE_SURVIVAL = 1 / 4;

export interface RoleZones {
  scenario: number;
  /** Depths read (cm); null: the whole curve. */
  zonesCm: DepthZone[] | null;
}

/** Zones around points of interest (cm) on a scenario's grid. */
export function pointZonesCm(
  scenario: McScenario,
  binning: McBinning,
  pointDepthsCm: readonly number[],
): DepthZone[] | null {
  if (pointDepthsCm.length === 0) return null;
  const bin = scoringGrid(scenario, binning).depthBinCm;
  return pointDepthsCm.map((d) => ({ fromCm: d - 2 * bin, toCm: d + 2 * bin }));
}

/** The calibration fit's window (cm), or null when the maximum is searched over the curve. */
export function calibrationZoneCm(
  scenario: McScenario,
  binning: McBinning,
  nominalDMaxCm: number | undefined,
): DepthZone[] | null {
  if (nominalDMaxCm === undefined) return null;
  const grid = scoringGrid(scenario, binning);
  const dz = grid.depthBinCm;
  const centres = Array.from({ length: grid.nDepth }, (_, i) => (i + 0.5) * dz);
  const [lo, hi] = calibrationWindowBins(centres, nominalDMaxCm);
  return [{ fromCm: lo * dz, toCm: (hi + 1) * dz }];
}

/** Depth (cm) `massGPerCm2` of the scenario's layers above `depthCm` (0 at the most). */
function depthAboveCm(scenario: McScenario, depthCm: number, massGPerCm2: number): number {
  let top = 0;
  const tops = scenario.layers.map((l) => {
    const t = top;
    top += l.thicknessCm;
    return t;
  });
  let z = depthCm;
  let left = massGPerCm2;
  for (let i = scenario.layers.length - 1; i >= 0 && left > 0; i--) {
    const t = tops[i] as number;
    if (t >= z) continue;
    const layer = scenario.layers[i]!;
    const rho = layer.densityGPerCm3 ?? getMaterial(layer.materialId).defaultDensityGPerCm3;
    const span = (z - t) * rho;
    if (span >= left) return z - left / rho;
    left -= span;
    z = t;
  }
  return 0;
}

/** Depths feeding each zone: one electron range (mean photon energy) above it, down to its bottom. */
export function forcingZonesCm(scenario: McScenario, zonesCm: readonly DepthZone[]): DepthZone[] {
  const energy = makeSpectrumSampler(scenario.energy).meanEnergyMeV;
  const pos = electronGridPosition(energy);
  const rangeG = Math.max(
    ...scenario.layers.map((l) => atGrid(electronTablesOf(l.materialId).csdaRangeGPerCm2, pos)),
  );
  const total = scenario.layers.reduce((s, l) => s + l.thicknessCm, 0);
  return zonesCm.map((zone) => ({
    fromCm: depthAboveCm(scenario, Math.max(0, zone.fromCm), rangeG),
    toCm: Math.min(total, zone.toCm),
  }));
}

/** The variance reduction of each scenario (undefined: analogue) from the zones its roles read. */
export function varianceReductionOf(
  scenarios: readonly McScenario[],
  roles: readonly RoleZones[],
  survival: number = ROULETTE_SURVIVAL,
): (VarianceReduction | undefined)[] {
  return scenarios.map((scenario, i) => {
    const mine = roles.filter((r) => r.scenario === i);
    if (mine.length === 0 || mine.some((r) => r.zonesCm === null)) return undefined;
    const zonesCm = mine.flatMap((r) => r.zonesCm ?? []);
    return { zonesCm, survival, forcedCm: forcingZonesCm(scenario, zonesCm) };
  });
}
