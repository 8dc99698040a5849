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

type LayerLike = { materialId: string; thicknessCm: number; densityGPerCm3?: number } | unknown[];

/** A layer as [material, thickness, density or null] (the form run keys already use). */
function layerTuple(l: LayerLike): unknown[] {
  if (Array.isArray(l)) return [l[0], l[1], l[2] ?? null];
  return [l.materialId, l.thicknessCm, l.densityGPerCm3 ?? null];
}

/** A copy with object keys sorted, so key order does not matter in a comparison. */
function sortedKeys(v: unknown): unknown {
  if (Array.isArray(v)) return v.map(sortedKeys);
  if (v === null || typeof v !== 'object') return v;
  const o = v as Record<string, unknown>;
  return Object.fromEntries(
    Object.keys(o)
      .sort()
      .map((k) => [k, sortedKeys(o[k])]),
  );
}

/**
 * What a dose plane depends on: the beam (not its planning MU, a value to compare with) and the
 * slabs, in a stable order; `doseTo` for the page's planes (a Monte Carlo run key has its own).
 */
export function planeKeyOf(
  c: { beam: unknown; layers: readonly LayerLike[] },
  doseTo?: string,
): string {
  const beam =
    typeof c.beam === 'object' && c.beam !== null
      ? Object.fromEntries(Object.entries(c.beam).filter(([k]) => k !== 'planningMu'))
      : c.beam;
  return JSON.stringify({
    beam: sortedKeys(beam),
    layers: c.layers.map(layerTuple),
    ...(doseTo ? { doseTo } : {}),
  });
}

/**
 * True when a run started for `caseKey` (a JSON key holding at least the beam and the layers,
 * as objects or as [material, thickness, density] tuples) has the beam and slabs of `c`. Points,
 * names and notes do not change a plane.
 */
export function runMatchesCase(caseKey: string | null, c: LaminaCase, doseTo?: string): boolean {
  if (caseKey === null) return false;
  try {
    const parsed = JSON.parse(caseKey) as {
      beam?: unknown;
      layers?: unknown;
      doseTo?: unknown;
    } | null;
    if (!parsed || !parsed.beam || !Array.isArray(parsed.layers)) return false;
    // A run in the other dose convention is not drawn beside planes in this one.
    if (doseTo !== undefined && parsed.doseTo !== undefined && parsed.doseTo !== doseTo)
      return false;
    const layers = parsed.layers as LayerLike[];
    return planeKeyOf({ beam: parsed.beam, layers }) === planeKeyOf(c);
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
  /** True while the compute worker is working on the planes. */
  pending?: boolean;
  mc: { plane: McPlane | null; matches: boolean; running: boolean };
}): PlaneSource[] {
  return PLANE_METHODS.map(({ id, label: name }) => {
    let label = name;
    let grid: PlaneGrid | null = null;
    let reason: string | null = null;
    if (id === 'monte-carlo') {
      if (!input.mc.plane) reason = 'no Monte Carlo run yet for this case (Monte Carlo run tab).';
      else if (!input.mc.matches)
        reason = 'the last Monte Carlo run was for another beam or slab stack; run it again.';
      else grid = gridOfMc(input.mc.plane);
      if (grid && input.mc.running) label = 'Monte Carlo (run in progress)';
    } else {
      const p = input.typeB[id];
      if (p === undefined)
        reason = input.pending ? 'being calculated…' : 'not calculated (see the message above).';
      else if (typeof p === 'string') reason = p;
      else grid = gridOfTypeB(p);
    }
    if (grid && !isDrawable(grid)) {
      grid = null;
      reason = 'this plane has missing or non-finite values and is not drawn.';
    }
    return { id, label, grid, reason };
  });
}
