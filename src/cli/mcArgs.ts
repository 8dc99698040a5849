// Monte Carlo flags of the calc command line: --mc-histories N [--seed S] [--mc-threads T].
import type { McCalcOptions } from '../compute/calculateCase';
import { defaultMonteCarloThreads, threadedMonteCarlo } from './mcThreads';

/** More threads than this only costs memory (each loads the engine's tables). */
export const MAX_MC_THREADS = 64;

export const MC_USAGE = `  --mc-histories N  add the monte-carlo method with N histories
  --seed S          Monte Carlo seed (integer, default 1); same seed, same result
  --mc-threads T    Monte Carlo threads (1 to ${MAX_MC_THREADS}, default: the machine's cores, here ${defaultMonteCarloThreads()}); the result does not depend on T`;

/** `{ mc }` when --mc-histories is given; throws on a malformed value. */
export function mcOptionsOf(flags: Map<string, string | true>): { mc?: McCalcOptions } {
  const threads = mcThreadsOf(flags);
  const h = flags.get('mc-histories');
  if (h === undefined) {
    if (flags.has('mc-threads')) throw new Error('--mc-threads needs --mc-histories');
    return {};
  }
  const histories = Number(h);
  const seedFlag = flags.get('seed');
  const seed = seedFlag === undefined ? 1 : Number(seedFlag);
  if (!Number.isInteger(histories) || histories < 10)
    throw new Error('--mc-histories needs an integer ≥ 10');
  if (!Number.isInteger(seed)) throw new Error('--seed needs an integer');
  return { mc: { histories, seed, runner: threadedMonteCarlo(threads) } };
}

/** --mc-threads T (an integer from 1 to MAX_MC_THREADS), else the machine's cores. */
export function mcThreadsOf(flags: Map<string, string | true>): number {
  const t = flags.get('mc-threads');
  if (t === undefined) return Math.min(MAX_MC_THREADS, defaultMonteCarloThreads());
  const n = Number(t);
  if (!Number.isInteger(n) || n < 1 || n > MAX_MC_THREADS)
    throw new Error(`--mc-threads needs an integer from 1 to ${MAX_MC_THREADS} (got "${t}")`);
  return n;
}
