// The key a Monte Carlo run is tied to: what its result depends on (beam, layers, points and the
// water data its dose per MU is calibrated with). The case name, notes and layer labels do not
// change the result, so editing them does not make a run stale. Used by the worker (is a run
// merged into this case's report?) and by the page (is the shown run current?).
import type { LaminaCase } from '../io/caseSchema';
import { canonicalJson } from './canonicalJson';
import { waterKeyOf, type WaterSourceSpec } from './waterSource';

export function monteCarloRunKey(c: LaminaCase, water: WaterSourceSpec): string {
  return canonicalJson({
    beam: c.beam,
    layers: c.layers.map((l) => [l.materialId, l.thicknessCm, l.densityGPerCm3 ?? null]),
    points: c.points.map((p) => [p.id, p.depthCm]),
    water: waterKeyOf(c, water),
  });
}
