// Pure helpers of the page's Monte Carlo run: the typed histories and seed checked with a message,
// whether a run is the current case's (its key: src/compute/monteCarloRunKey), and the wording of
// progress and uncertainty.
import { historiesProblem, seedProblem } from '../../engine/montecarlo/runLimits';

/** Histories per scenario offered as presets (case, water and calibration runs each get these). */
export const HISTORY_PRESETS: readonly { histories: number; label: string }[] = [
  { histories: 50_000, label: '5 × 10⁴ (quick look)' },
  { histories: 200_000, label: '2 × 10⁵' },
  { histories: 1_000_000, label: '1 × 10⁶' },
  { histories: 5_000_000, label: '5 × 10⁶' },
];

export { HISTORY_LIMITS, SEED_LIMITS } from '../../engine/montecarlo/runLimits';

export type Parsed<T> = { ok: true; value: T } | { ok: false; message: string };

function numberOfText(text: string): number {
  // Spaces, thin spaces and underscores group digits ("1 000 000", "1_000_000"); "2e5" is allowed.
  const t = text.trim().replace(/[\s\u2009\u202f_]/g, '');
  if (t === '') return Number.NaN;
  return Number(t);
}

export function parseHistories(text: string): Parsed<number> {
  const v = numberOfText(text);
  if (!Number.isFinite(v)) return { ok: false, message: `Histories: "${text}" is not a number` };
  const problem = historiesProblem(v);
  return problem ? { ok: false, message: `Histories: ${problem}` } : { ok: true, value: v };
}

export function parseSeed(text: string): Parsed<number> {
  const v = numberOfText(text);
  if (!Number.isFinite(v) || !Number.isInteger(v))
    return { ok: false, message: `Seed: "${text}" is not a whole number` };
  const problem = seedProblem(v);
  return problem ? { ok: false, message: `Seed: ${problem}` } : { ok: true, value: v };
}

/** "1 000 000" (thin-space-free, plain spaces: readable and copyable). */
export function groupDigits(n: number): string {
  const s = Math.round(Math.abs(n)).toString();
  const grouped = s.replace(/\B(?=(\d{3})+(?!\d))/g, ' ');
  return n < 0 ? `−${grouped}` : grouped;
}

/** A run's result is shown only while the case it was started for is the current one. */
export function isRunCurrent(runKey: string | null, currentKey: string): boolean {
  return runKey !== null && runKey === currentKey;
}

/** Words added to the MC label in legends and tables while its result is not a finished run. */
export function partialRunNote(status: string): string | null {
  if (status === 'running') return 'running, partial';
  if (status === 'cancelled') return 'cancelled, partial';
  return null;
}

/** "0.782 ± 0.004 cGy/MU" and "0.51 %" for a dose and its 1σ. */
export function formatDoseSigma(
  dosePerMuCGy: number | null,
  sigmaDosePerMuCGy: number,
): { absolute: string; relative: string } {
  if (dosePerMuCGy === null || !Number.isFinite(dosePerMuCGy) || dosePerMuCGy <= 0)
    return { absolute: '—', relative: '—' };
  const rel = sigmaDosePerMuCGy / dosePerMuCGy;
  return {
    absolute: `${dosePerMuCGy.toFixed(3)} ± ${sigmaDosePerMuCGy.toFixed(3)} cGy/MU`,
    relative: `${(100 * rel).toFixed(rel < 0.1 ? 2 : 1)} %`,
  };
}

/** "4.2 s", "1 min 05 s". */
export function formatElapsed(ms: number): string {
  if (!Number.isFinite(ms) || ms < 0) return '—';
  const s = ms / 1000;
  if (s < 60) return `${s.toFixed(1)} s`;
  const m = Math.floor(s / 60);
  const rest = Math.floor(s - 60 * m);
  return `${m} min ${rest.toString().padStart(2, '0')} s`;
}

/** Fraction of the run done (batches handed back over batches planned), 0–1. */
export function fractionDone(tasksDone: number, totalTasks: number): number {
  if (!(totalTasks > 0)) return 0;
  return Math.min(1, Math.max(0, tasksDone / totalTasks));
}

/** Time still needed at the rate so far (ms), or null before any batch is back. */
export function remainingMs(elapsedMs: number, fraction: number): number | null {
  if (!(fraction > 0) || !Number.isFinite(elapsedMs)) return null;
  return (elapsedMs * (1 - Math.min(1, fraction))) / fraction;
}

/**
 * The relative 1σ the finished run should reach: statistical uncertainty falls as 1/√N, so
 * σ_end = σ_now · √(N_now / N_planned).
 */
export function projectedRelativeSigma(
  relativeSigma: number,
  historiesDone: number,
  historiesPlanned: number,
): number | null {
  if (!(historiesDone > 0) || !(historiesPlanned > 0) || !Number.isFinite(relativeSigma))
    return null;
  return relativeSigma * Math.sqrt(Math.min(historiesDone, historiesPlanned) / historiesPlanned);
}
