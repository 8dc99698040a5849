// Where the planning system's MU and dose for a beam go in a Lamina case. Today's case schema
// keeps them per point (points[].planningMu, points[].planningDoseCGy): both go on the isocentre
// point. When the schema moves planning MU to the beam, change only this function.
import type { LaminaCase } from '../io/caseSchema';

export function withPlanningValues(
  c: LaminaCase,
  pointId: string,
  planning: { mu: number | null; doseCGy: number | null },
): LaminaCase {
  return {
    ...c,
    points: c.points.map((p) =>
      p.id !== pointId
        ? p
        : {
            ...p,
            ...(planning.mu !== null ? { planningMu: planning.mu } : {}),
            ...(planning.doseCGy !== null ? { planningDoseCGy: planning.doseCGy } : {}),
          },
    ),
  };
}
