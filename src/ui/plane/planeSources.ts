// Which dose planes the page can show for the case on screen: the type-B planes from the compute
// worker and the Monte Carlo plane of the last run, the latter only while the run belongs to the
// same beam and slabs (names and points of interest do not change a plane).
import type { DosePlane } from '../../engine/superposition/typeBMethods';
import type { McPlane } from '../../engine/montecarlo/monteCarloResult';
import type { LaminaCase } from '../../io/caseSchema';
import { isDrawable, type PlaneGrid } from '../../plots/planeGrid';

export type PlaneMethodId = 'superposition' | 'pencil-beam' | 'monte-carlo';

export const PLANE_METHODS: readonly { id: PlaneMethodId; label: string }[] = [
  { id: 'superposition', label: 'Superposition' },
  { id: 'pencil-beam', label: 'Pencil beam' },
  { id: 'monte-carlo', label: 'Monte Carlo' },
];

export interface PlaneSource {
  id: PlaneMethodId;
  label: string;
  /** The plane, or null with the reason it is not there. */
  grid: PlaneGrid | null;
  reason: string | null;
}

/** What a dose plane depends on: the beam and the slabs, in a stable order. */
export function planeKeyOf(c: Pick<LaminaCase, 'beam' | 'layers'>): string {
  return JSON.stringify({
    beam: c.beam,
    layers: c.layers.map((l) => [l.materialId, l.thicknessCm, l.densityGPerCm3 ?? null]),
  });
}

/** True when a run started for `caseKey` (the serialised case) has the beam and slabs of `c`. */
export function runMatchesCase(caseKey: string | null, c: LaminaCase): boolean {
  if (caseKey === null) return false;
  try {
    const parsed = JSON.parse(caseKey) as Partial<LaminaCase> | null;
    if (!parsed || !parsed.beam || !Array.isArray(parsed.layers)) return false;
    return planeKeyOf(parsed as LaminaCase) === planeKeyOf(c);
  } catch {
    return false;
  }
}

export function gridOfTypeB(p: DosePlane): PlaneGrid {
  return { xCm: p.lateralCm, depthCm: p.depthCm, values: p.dosePerMuCGy };
}

export function gridOfMc(p: McPlane): PlaneGrid {
  return { xCm: p.xCm, depthCm: p.depthCm, values: p.dosePerMuCGy };
}

/** The three planes with a plain reason for each one that is missing or cannot be drawn. */
export function planeSources(input: {
  typeB: Partial<Record<'superposition' | 'pencil-beam', DosePlane | string>>;
  mc: { plane: McPlane | null; matches: boolean; running: boolean };
}): PlaneSource[] {
  return PLANE_METHODS.map(({ id, label: name }) => {
    let label = name;
    let grid: PlaneGrid | null = null;
    let reason: string | null = null;
    if (id === 'monte-carlo') {
      if (!input.mc.plane) reason = 'No Monte Carlo run yet for this case (Monte Carlo run tab).';
      else if (!input.mc.matches)
        reason = 'The last Monte Carlo run was for another beam or slab stack; run it again.';
      else grid = gridOfMc(input.mc.plane);
      if (grid && input.mc.running) label = 'Monte Carlo (run in progress)';
    } else {
      const p = input.typeB[id];
      if (p === undefined) reason = 'Not calculated yet.';
      else if (typeof p === 'string') reason = p;
      else grid = gridOfTypeB(p);
    }
    if (grid && !isDrawable(grid)) {
      grid = null;
      reason = 'This plane has missing or non-finite values and is not drawn.';
    }
    return { id, label, grid, reason };
  });
}
