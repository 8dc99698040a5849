// Keeps the type-B dose planes in step with the beam and slabs of the case on screen: each change
// asks the compute worker for the superposition and pencil-beam planes; only the newest answer is
// kept (older ones dropped, a waiting request replaced), and `updating` shows while one is out.
// The last planes are remembered for their key, so coming back to the tab shows them at once.
import { useEffect, useRef, useState } from 'react';
import { getComputeWorker } from '../../compute/computeClient';
import type { DosePlane } from '../../engine/superposition/typeBMethods';
import type { LaminaCase } from '../../io/caseSchema';
import { makeLatestOnly } from '../../state/latestOnly';
import { useAppStore } from '../../state/store';

export type TypeBPlanes = Partial<Record<'superposition' | 'pencil-beam', DosePlane | string>>;

export interface PlanesState {
  planes: TypeBPlanes;
  updating: boolean;
  /** Why the newest request gave no planes (invalid case, lost worker), or null. */
  error: string | null;
}

const ENGINES = ['superposition', 'pencil-beam'] as const;

let remembered: { key: string; planes: TypeBPlanes } | null = null;

async function fetchPlanes(input: {
  raw: LaminaCase;
  key: string;
}): Promise<{ key: string; planes: TypeBPlanes } | string> {
  const api = getComputeWorker();
  const answers = await Promise.all(
    ENGINES.map((method) =>
      api.dosePlane(input.raw, {
        method,
        profileDepthsCm: [],
        doseTo: useAppStore.getState().check.doseTo,
      }),
    ),
  );
  const planes: TypeBPlanes = {};
  for (const [k, a] of answers.entries()) {
    if (!a.ok)
      return `The case cannot be calculated as it stands: ${a.problems
        .map((p) => `${p.path}: ${p.message}`)
        .join('; ')}`;
    planes[ENGINES[k] as (typeof ENGINES)[number]] = a.plane;
  }
  return { key: input.key, planes };
}

/** Planes for `raw` (recomputed when `key` changes or `retry` increments). */
export function usePlanes(raw: LaminaCase, key: string, retry: number): PlanesState {
  const [state, setState] = useState<PlanesState>(() =>
    remembered?.key === key
      ? { planes: remembered.planes, updating: false, error: null }
      : { planes: {}, updating: true, error: null },
  );
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
          remembered = result.value;
          return { planes: result.value.planes, updating: superseded, error: null };
        });
      },
      () => setState((s) => (s.updating ? s : { ...s, updating: true })),
    ),
  );
  const mounted = useRef(false);
  useEffect(() => {
    const first = !mounted.current;
    mounted.current = true;
    // On arrival, planes remembered for this very key need no new request.
    if (first && remembered?.key === key) return;
    runner.request({ raw, key });
    // `raw` changes with every edit; only a change of beam or slabs (the key) needs new planes.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [key, retry, runner]);
  useEffect(() => () => runner.cancel(), [runner]);
  return state;
}
