// Monte Carlo flags of the calc command line: --mc-histories N [--seed S].
import type { McCalcOptions } from '../compute/calculateCase';
import { historiesProblem, seedProblem } from '../engine/montecarlo/runLimits';

export const MC_USAGE = `  --mc-histories N  add the monte-carlo method with N histories, 1 000 to 50 000 000 (single-threaded here)
  --seed S          Monte Carlo seed (whole number 0 to 4 294 967 295, default 1); same seed, same result`;

/** The Monte Carlo flags (for the command line's list of known flags). */
export const MC_FLAGS = ['mc-histories', 'seed'] as const;

/**
 * What is wrong with --mc-histories and --seed, against the same limits as the page's run form
 * (src/engine/montecarlo/runLimits): one line per problem, naming the flag.
 */
export function mcFlagProblems(flags: Map<string, string | true>): string[] {
  const problems: string[] = [];
  const h = flags.get('mc-histories');
  const s = flags.get('seed');
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
  return problems;
}

/** `{ mc }` when --mc-histories is given; throws on a malformed value. */
export function mcOptionsOf(flags: Map<string, string | true>): { mc?: McCalcOptions } {
  const problems = mcFlagProblems(flags);
  if (problems.length > 0) throw new Error(problems.join('\n'));
  const h = flags.get('mc-histories');
  if (h === undefined) return {};
  const seedFlag = flags.get('seed');
  return { mc: { histories: Number(h), seed: seedFlag === undefined ? 1 : Number(seedFlag) } };
}
