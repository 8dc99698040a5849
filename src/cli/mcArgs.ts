// Monte Carlo flags of the calc command line: --mc-histories N [--seed S].
import type { McCalcOptions } from '../compute/calculateCase';

export const MC_USAGE = `  --mc-histories N  add the monte-carlo method with N histories (single-threaded here)
  --seed S          Monte Carlo seed (integer, default 1); same seed, same result`;

/** `{ mc }` when --mc-histories is given; throws on a malformed value. */
export function mcOptionsOf(flags: Map<string, string | true>): { mc?: McCalcOptions } {
  const h = flags.get('mc-histories');
  if (h === undefined) return {};
  const histories = Number(h);
  const seedFlag = flags.get('seed');
  const seed = seedFlag === undefined ? 1 : Number(seedFlag);
  if (!Number.isInteger(histories) || histories < 10)
    throw new Error('--mc-histories needs an integer ≥ 10');
  if (!Number.isInteger(seed)) throw new Error('--seed needs an integer');
  return { mc: { histories, seed } };
}
