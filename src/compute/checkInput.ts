// The check's view of one calculated beam: plain mapping of a report onto the check's input, in a
// module of its own (one idea per file; the plan calculation and the record's tests use it).
import type { CalcReport } from '../contract/reports';
import type { CheckBeamInput } from '../engine/check/planCheck';
import type { LaminaCase } from '../io/caseSchema';

/** The check's view of one calculated beam. */
export function checkInputOf(
  beam: { id: string; label: string; weight: number },
  c: LaminaCase,
  report: CalcReport,
): CheckBeamInput {
  return {
    id: beam.id,
    label: beam.label,
    weight: beam.weight,
    planningMu: c.beam.planningMu,
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
