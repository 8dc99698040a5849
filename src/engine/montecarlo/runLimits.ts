// Bounds of a Monte Carlo run's histories and seed, shared by the page's run form and the command
// line (`--mc-histories`, `--seed`), with the one wording of their messages.

/**
 * Histories per run: at least ten batches of 100 (enough for a batch uncertainty at the dose
 * maximum), at most what a long afternoon computes; far more would not fit in memory either.
 */
export const HISTORY_LIMITS = { min: 1_000, max: 50_000_000 } as const;

/** Seeds are unsigned 32-bit integers (the generator's state). */
export const SEED_LIMITS = { min: 0, max: 0xffffffff } as const;

/** "1 000 000": digits grouped by plain spaces (readable and copyable). */
function grouped(n: number): string {
  return Math.round(n)
    .toString()
    .replace(/\B(?=(\d{3})+(?!\d))/g, ' ');
}

/** What is wrong with a number of histories ("must be a whole number"), or null. */
export function historiesProblem(n: number): string | null {
  if (!Number.isFinite(n)) return 'must be a number';
  if (!Number.isInteger(n)) return 'must be a whole number';
  if (n < HISTORY_LIMITS.min || n > HISTORY_LIMITS.max)
    return `must be between ${grouped(HISTORY_LIMITS.min)} and ${grouped(HISTORY_LIMITS.max)}`;
  return null;
}

/** What is wrong with a seed, or null. */
export function seedProblem(n: number): string | null {
  if (!Number.isFinite(n) || !Number.isInteger(n)) return 'must be a whole number';
  if (n < SEED_LIMITS.min || n > SEED_LIMITS.max)
    return `must be between ${grouped(SEED_LIMITS.min)} and ${grouped(SEED_LIMITS.max)}`;
  return null;
}
