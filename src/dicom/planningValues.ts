// Where the planning system's MU and dose for a beam go in a Lamina case (version 2): the RT
// Plan's beam meterset is the beam's planning MU (beam.planningMu, one value per beam), and the
// beam dose from the fraction group is the planning dose at the point it was specified at
// (points[].planningDoseCGy of the isocentre point).
import type { LaminaCase } from '../io/caseSchema';

export function withPlanningValues(
  c: LaminaCase,
  pointId: string,
  planning: { mu: number | null; doseCGy: number | null },
): LaminaCase {
  return {
    ...c,
    beam: { ...c.beam, ...(planning.mu !== null ? { planningMu: planning.mu } : {}) },
    points: c.points.map((p) =>
      p.id !== pointId || planning.doseCGy === null
        ? p
        : { ...p, planningDoseCGy: planning.doseCGy },
    ),
  };
}
