// View preferences kept between visits (theme, normalisation, hidden methods): read once on
// start-up, written when they change. Unavailable storage only means they are not remembered.
import type { StorageLike } from './autosave';
import type { AppState, Normalisation, Theme } from './store';

export const PREFS_KEY = 'lamina.prefs';

export type Prefs = Pick<AppState, 'theme' | 'normalisation' | 'hiddenMethods' | 'waterSource'>;

const THEMES: readonly Theme[] = ['auto', 'light', 'dark'];
const NORMALISATIONS: readonly Normalisation[] = [
  'dosePerMu',
  'percentWaterDmax',
  'relativeToWater',
];

/** The stored preferences that are still meaningful; anything else is ignored. */
export function readPrefs(storage: StorageLike | null): Partial<Prefs> {
  let raw: unknown;
  try {
    raw = JSON.parse(storage?.getItem(PREFS_KEY) ?? 'null');
  } catch {
    return {};
  }
  if (typeof raw !== 'object' || raw === null) return {};
  const r = raw as Record<string, unknown>;
  const out: Partial<Prefs> = {};
  if (THEMES.includes(r.theme as Theme)) out.theme = r.theme as Theme;
  if (NORMALISATIONS.includes(r.normalisation as Normalisation))
    out.normalisation = r.normalisation as Normalisation;
  // 'table' (stored before the choice became 'case' | 'modelled') meant the case's own table.
  if (r.waterSource === 'modelled') out.waterSource = 'modelled';
  else if (r.waterSource === 'case' || r.waterSource === 'table') out.waterSource = 'case';
  if (Array.isArray(r.hiddenMethods))
    out.hiddenMethods = r.hiddenMethods.filter((m): m is string => typeof m === 'string');
  return out;
}

export function writePrefs(storage: StorageLike | null, prefs: Prefs): void {
  try {
    storage?.setItem(PREFS_KEY, JSON.stringify(prefs));
  } catch {
    // Not remembered; nothing else depends on it.
  }
}
