// Which method's verdict decides the check. The user's choice when it was computed for every
// beam; otherwise a default by the path: where a beam's path to a checked point crosses a
// heterogeneity, the engine that transports scatter through the slabs — the Monte Carlo when a
// current run exists for every beam, else the point-kernel superposition — because the
// ratio-of-TMR family ignores where the inhomogeneity lies, scatter changes and electron
// transport (AAPM TG-65, Papanikolaou et al. 2004, prefers type-B methods in lung; from memory).
// Along a water-like path every water-data method reduces to the measured water data themselves,
// so the ratio of TMR (the measured table at the point) decides there. The order of preference
// is registry data (src/engine/methodRegistry.ts, decidingRank). Called once, by the plan check
// in the worker-side plan assembly (src/compute/calculatePlan.ts).
import { decidingPreference } from '../methodRegistry';

export type DecidingReason =
  /** The user (page, file or --check-method) chose it. */
  | 'chosen'
  /** Default for a path that crosses a heterogeneity. */
  | 'default-heterogeneous'
  /** Default for water-like paths. */
  | 'default-homogeneous';

export interface DecidingMethod {
  id: string | null;
  reason: DecidingReason;
  /** A requested method that was not computed for every beam (then the default decides). */
  requestedUnavailable: string | null;
}

/** Preference along a heterogeneous path: transport of scatter and electrons first (registry). */
export const HETEROGENEOUS_PREFERENCE: readonly string[] = decidingPreference('heterogeneous');

/** Preference along a water-like path: the measured (or modelled) water data at the point (registry). */
export const HOMOGENEOUS_PREFERENCE: readonly string[] = decidingPreference('homogeneous');

/**
 * `computedByBeam[i]` = ids of the methods that gave a dose per MU at some point of beam i;
 * `heterogeneous` = some checked point's path crosses a heterogeneity.
 */
export function decidingMethodOf(
  computedByBeam: readonly (readonly string[])[],
  heterogeneous: boolean,
  requested?: string,
): DecidingMethod {
  const everywhere = (id: string) =>
    computedByBeam.length > 0 && computedByBeam.every((ids) => ids.includes(id));
  if (requested && everywhere(requested))
    return { id: requested, reason: 'chosen', requestedUnavailable: null };
  const order = heterogeneous ? HETEROGENEOUS_PREFERENCE : HOMOGENEOUS_PREFERENCE;
  const anyMethod = computedByBeam.find((ids) => ids.length > 0)?.[0] ?? null;
  return {
    id: order.find(everywhere) ?? anyMethod,
    reason: heterogeneous ? 'default-heterogeneous' : 'default-homogeneous',
    requestedUnavailable: requested ? requested : null,
  };
}
