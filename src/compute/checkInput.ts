// The check's view of one calculated beam: plain mapping of a report onto the check's input, in a
// module of its own so the page's check can use it without loading the engine.
import type { CalcReport } from './calculateCase';
import type { CheckBeamInput } from '../engine/check/planCheck';
import type { LaminaPlan } from '../io/planFile';

/** The check's view of one calculated beam. */
export function checkInputOf(
  beam: { id: string; label: string; weight: number },
  c: LaminaPlan['beams'][number]['case'],
  report: CalcReport,
): CheckBeamInput {
  return {
    id: beam.id,
    label: beam.label,
    weight: beam.weight,
    layers: report.layers,
    points: c.points,
    methods: report.methods.map((m) => ({
      id: m.id,
      label: m.label,
      // The Monte Carlo's statistical 1σ travels with its dose per MU (deterministic methods have none).
      points: m.points.map((p) =>
        p.sigmaDosePerMuCGy === undefined
          ? { id: p.id, dosePerMuCGy: p.dosePerMuCGy }
          : { id: p.id, dosePerMuCGy: p.dosePerMuCGy, sigmaDosePerMuCGy: p.sigmaDosePerMuCGy },
      ),
    })),
  };
}
