// Keeps the type-B dose planes in step with the beam and slabs of the case on screen: each change
// asks the compute worker for the superposition and pencil-beam planes; only the newest answer is
// kept (older ones dropped, a waiting request replaced), and `updating` shows while one is out.
import { useEffect, useState } from 'react';
import { getComputeWorker } from '../../compute/computeClient';
import type { DosePlane } from '../../engine/superposition/typeBMethods';
import type { LaminaCase } from '../../io/caseSchema';
import { makeLatestOnly } from '../../state/latestOnly';

export type TypeBPlanes = Partial<Record<'superposition' | 'pencil-beam', DosePlane | string>>;

export interface PlanesState {
  planes: TypeBPlanes;
  updating: boolean;
  /** Why the newest request gave no planes (invalid case, lost worker), or null. */
  error: string | null;
}

const ENGINES = ['superposition', 'pencil-beam'] as const;

async function fetchPlanes(raw: LaminaCase): Promise<TypeBPlanes | string> {
  const api = getComputeWorker();
  const answers = await Promise.all(
    ENGINES.map((method) => api.dosePlane(raw, { method, profileDepthsCm: [] })),
  );
  const out: TypeBPlanes = {};
  for (const [k, a] of answers.entries()) {
    if (!a.ok)
      return `The case cannot be calculated as it stands: ${a.problems
        .map((p) => `${p.path}: ${p.message}`)
        .join('; ')}`;
    out[ENGINES[k] as (typeof ENGINES)[number]] = a.plane;
  }
  return out;
}

/** Planes for `raw` (recomputed when `key` changes or `retry` increments). */
export function usePlanes(raw: LaminaCase, key: string, retry: number): PlanesState {
  const [state, setState] = useState<PlanesState>({ planes: {}, updating: true, error: null });
  const [runner] = useState(() =>
    makeLatestOnly(
      fetchPlanes,
      (result, _id, superseded) => {
        setState((s) => {
          if (!result.ok) {
            const e = result.error;
            return {
              ...s,
              updating: superseded,
              error: `The dose planes could not be calculated: ${e instanceof Error ? e.message : String(e)}`,
            };
          }
          if (typeof result.value === 'string')
            return { ...s, updating: superseded, error: result.value };
          return { planes: result.value, updating: superseded, error: null };
        });
      },
      () => setState((s) => (s.updating ? s : { ...s, updating: true })),
    ),
  );
  useEffect(() => {
    runner.request(raw);
    // `raw` changes with every edit; only a change of beam or slabs (the key) needs new planes.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [key, retry, runner]);
  useEffect(() => () => runner.cancel(), [runner]);
  return state;
}
