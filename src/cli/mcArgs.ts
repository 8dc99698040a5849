// Monte Carlo flags of the calc command line: --mc-histories N [--seed S] [--mc-threads T].
import type { McCalcOptions } from '../compute/calculateCase';
import { historiesProblem, seedProblem } from '../engine/montecarlo/runLimits';
import { defaultMonteCarloThreads, threadedMonteCarlo } from './mcThreads';

/** More threads than this only costs memory (each loads the engine's tables). */
export const MAX_MC_THREADS = 64;

export const MC_USAGE = `  --mc-histories N  add the monte-carlo method with N histories, 1 000 to 50 000 000
  --seed S          Monte Carlo seed (whole number 0 to 4 294 967 295, default 1); same seed, same result
  --mc-threads T    Monte Carlo threads (1 to ${MAX_MC_THREADS}, default: the machine's cores, here ${defaultMonteCarloThreads()}); the result does not depend on T`;

/** The Monte Carlo flags (for the command line's list of known flags). */
export const MC_FLAGS = ['mc-histories', 'seed', 'mc-threads'] as const;

/**
 * What is wrong with --mc-histories, --seed and --mc-threads, against the same limits as the
 * page's run form (src/engine/montecarlo/runLimits): one line per problem, naming the flag.
 */
export function mcFlagProblems(flags: Map<string, string | true>): string[] {
  const problems: string[] = [];
  const h = flags.get('mc-histories');
  const s = flags.get('seed');
  const t = flags.get('mc-threads');
  const numberOf = (v: string | true) =>
    typeof v === 'string' && v.trim() !== '' ? Number(v) : NaN;
  if (h !== undefined) {
    const p = historiesProblem(numberOf(h));
    if (p) problems.push(`--mc-histories ${String(h)}: ${p}`);
  }
  if (s !== undefined) {
    if (h === undefined)
      problems.push('--seed: needs --mc-histories (the seed is for a Monte Carlo run)');
    const p = seedProblem(numberOf(s));
    if (p) problems.push(`--seed ${String(s)}: ${p}`);
  }
  if (t !== undefined) {
    if (h === undefined)
      problems.push('--mc-threads: needs --mc-histories (threads are for a Monte Carlo run)');
    const p = threadsProblem(t);
    if (p) problems.push(p);
  }
  return problems;
}

/** `{ mc }` when --mc-histories is given; throws on a malformed value. */
export function mcOptionsOf(flags: Map<string, string | true>): { mc?: McCalcOptions } {
  const problems = mcFlagProblems(flags);
  if (problems.length > 0) throw new Error(problems.join('\n'));
  const h = flags.get('mc-histories');
  if (h === undefined) return {};
  const seedFlag = flags.get('seed');
  return {
    mc: {
      histories: Number(h),
      seed: seedFlag === undefined ? 1 : Number(seedFlag),
      runner: threadedMonteCarlo(mcThreadsOf(flags)),
    },
  };
}

function threadsProblem(t: string | true): string | null {
  const n = typeof t === 'string' && t.trim() !== '' ? Number(t) : NaN;
  return Number.isInteger(n) && n >= 1 && n <= MAX_MC_THREADS
    ? null
    : `--mc-threads needs an integer from 1 to ${MAX_MC_THREADS} (got "${String(t)}")`;
}

/** --mc-threads T (an integer from 1 to MAX_MC_THREADS), else the machine's cores. */
export function mcThreadsOf(flags: Map<string, string | true>): number {
  const t = flags.get('mc-threads');
  if (t === undefined) return Math.min(MAX_MC_THREADS, defaultMonteCarloThreads());
  const p = threadsProblem(t);
  if (p) throw new Error(p);
  return Number(t);
}
