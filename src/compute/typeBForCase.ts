// The type-B block of a case calculation: pencil-beam and superposition results on the report's
// depth grid, from the modelled kernels (no water data needed).
import { ssdCmOf } from '../engine/beam/geometry';
import type { MethodResult } from '../engine/methodResult';
import type { SlabPhantom } from '../engine/phantom/slabPhantom';
import { typeBMethodResult } from '../engine/superposition/typeBMethods';
import type { TypeBEngine } from '../engine/superposition/typeBDose';
import type { LaminaCase } from '../io/caseSchema';

export const TYPE_B_METHOD_IDS: readonly TypeBEngine[] = ['pencil-beam', 'superposition'];

export function isTypeBMethodId(id: string): id is TypeBEngine {
  return (TYPE_B_METHOD_IDS as readonly string[]).includes(id);
}

/** Type-B results for a case; `requested` = method ids asked for (undefined: both). */
export function typeBForCase(
  c: LaminaCase,
  phantom: SlabPhantom,
  depthCm: readonly number[],
  requested: readonly string[] | undefined,
): MethodResult[] {
  const ids = requested
    ? TYPE_B_METHOD_IDS.filter((id) => requested.includes(id))
    : TYPE_B_METHOD_IDS;
  const input = {
    energy: c.beam.energy,
    phantom,
    beam: { ssdCm: ssdCmOf(c.beam.setup), fieldXCm: c.beam.fieldXCm, fieldYCm: c.beam.fieldYCm },
    depthCm,
    points: c.points,
  };
  return ids.map((id) => typeBMethodResult(id, input));
}
