// The key a Monte Carlo run is tied to: what its result depends on (beam, layers, points, the
// water data its dose per MU is calibrated with and the dose convention it reports). The case
// name, notes, layer labels, the beam's planning MU and the points' planning doses do not change
// the result, so editing them does not make a run stale. Used by the worker (is a run merged into
// this case's report?) and by the page (is the shown run current?).
import type { DoseQuantity } from '../engine/dose/doseQuantity';
import type { LaminaCase } from '../io/caseSchema';
import { canonicalJson } from './canonicalJson';
import { waterKeyOf, type WaterSourceSpec } from './waterSource';

/** The beam as far as the physics goes (the planning MU is a value to compare with). */
export function physicsBeamOf(beam: LaminaCase['beam']): Omit<LaminaCase['beam'], 'planningMu'> {
  const rest = { ...beam };
  delete rest.planningMu;
  return rest;
}

export function monteCarloRunKey(
  c: LaminaCase,
  water: WaterSourceSpec,
  doseTo: DoseQuantity,
): string {
  return canonicalJson({
    beam: physicsBeamOf(c.beam),
    layers: c.layers.map((l) => [l.materialId, l.thicknessCm, l.densityGPerCm3 ?? null]),
    points: c.points.map((p) => [p.id, p.depthCm]),
    water: waterKeyOf(c, water),
    doseTo,
  });
}
