// The command line refuses flags it does not know, empty values and numbers outside the ranges the
// case file and the page use, before it calculates anything (exit code 2, one line per problem
// naming the flag); it prints the table notes the page shows under a checked table.
import { spawnSync } from 'node:child_process';
import { describe, expect, it } from 'vitest';
import { parseArgs } from '../../../src/cli/args';
import { commandLineProblems, flagProblemsForDocument } from '../../../src/cli/flagRules';
import { loadDocument } from '../../../src/cli/checkCommand';
import { mcFlagProblems } from '../../../src/cli/mcArgs';
import { waterTableFromFlags } from '../../../src/cli/waterTableArgs';
import { HISTORY_LIMITS, SEED_LIMITS } from '../../../src/engine/montecarlo/runLimits';
import { parseHistories, parseSeed } from '../../../src/ui/montecarlo/mcRunModel';
import { checkWaterDraft, EMPTY_WATER_DRAFT } from '../../../src/state/waterDraft';
import { readFileSync } from 'node:fs';

function calc(args: string[]) {
  const r = spawnSync(process.execPath, ['--import', 'tsx', 'src/cli/calc.ts', ...args], {
    encoding: 'utf8',
  });
  return { code: r.status, out: r.stdout, err: r.stderr };
}

const CASE = 'public/cases/lung-slab-6mv.json';
const PDD = 'public/tables/demo-6mv-pdd-ssd100.csv';
const TMR = 'public/tables/demo-6mv-tmr.csv';
const problemsOf = (argv: string[]) => commandLineProblems(parseArgs(argv));
const tableProblems = (argv: string[]) => {
  const t = waterTableFromFlags(parseArgs(argv).flags);
  return t && !t.ok ? t.problems : [];
};

describe('water-data flags use the case file’s ranges', () => {
  it('--ssd 5 with a PDD table is refused (it used to give 3.38 cGy/MU at 15 cm, exit 0)', () => {
    const r = calc([CASE, '--pdd', PDD, '--ssd', '5', '--methods', 'rtmr']);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/^--ssd 5: must be ≥ 50 cm$/m);
    expect(r.out).toBe('');
  });

  it('--ssd 1e308 is refused instead of giving null doses', () => {
    expect(tableProblems([CASE, '--pdd', PDD, '--ssd', '1e308'])).toEqual([
      '--ssd 1e308: must be ≤ 150 cm',
    ]);
  });

  it('--dmax and --ref-dose outside (0, 10) cm and (0, 10] cGy/MU are refused, naming the flag', () => {
    expect(tableProblems([CASE, '--tmr', TMR, '--dmax', '10'])).toEqual([
      '--dmax 10: must be < 10 cm',
    ]);
    expect(tableProblems([CASE, '--tmr', TMR, '--dmax', '0'])).toEqual([
      '--dmax 0: must be > 0 cm',
    ]);
    expect(tableProblems([CASE, '--tmr', TMR, '--ref-dose', '11'])).toEqual([
      '--ref-dose 11: must be ≤ 10 cGy/MU',
    ]);
    expect(tableProblems([CASE, '--tmr', TMR, '--ref-dose', '-1'])).toEqual([
      '--ref-dose -1: must be > 0 cGy/MU',
    ]);
  });

  it('the page’s water-table fields refuse the same values with the same rule', () => {
    const csv = readFileSync(PDD, 'utf8');
    const draft = { ...EMPTY_WATER_DRAFT, kind: 'pdd' as const, csv, fileName: 'p.csv' };
    const problems = (patch: Partial<typeof draft>) => {
      const r = checkWaterDraft({ ...draft, ...patch });
      return r.ok ? [] : r.problems;
    };
    expect(problems({ ssdText: '5' })).toEqual(['Table SSD (cm): must be ≥ 50 cm']);
    expect(problems({ ssdText: '1e308' })).toEqual(['Table SSD (cm): must be ≤ 150 cm']);
    expect(problems({ ssdText: '100', dMaxText: '10' })).toEqual(['d_max (cm): must be < 10 cm']);
    expect(problems({ ssdText: '100', referenceText: '11' })).toEqual([
      'Reference dose rate (cGy/MU): must be ≤ 10 cGy/MU',
    ]);
  });

  it('--ssd with a TMR table is refused: a TMR table has no SSD', () => {
    expect(tableProblems([CASE, '--tmr', TMR, '--ssd', '100'])[0]).toMatch(/^--ssd: only a PDD/);
  });

  it('prints the table notes the page shows (d_max inferred, PDD converted) on standard error', () => {
    const r = calc([CASE, '--pdd', PDD, '--ssd', '100', '--methods', 'rtmr']);
    expect(r.code).toBe(0);
    expect(r.err).toMatch(/^note: demo-6mv-pdd-ssd100\.csv: d_max not supplied: taken as 1\.5 cm/m);
    expect(r.err).toMatch(/^note: demo-6mv-pdd-ssd100\.csv: PDD at SSD 100 cm converted to TMR/m);
  });
});

describe('flags the command line does not accept', () => {
  it('an unknown flag is refused (it used to be ignored)', () => {
    expect(problemsOf([CASE, '--bogus', '1'])).toEqual(['--bogus: unknown option']);
    const r = calc([CASE, '--histories', '5000']);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/^--histories: unknown option$/m);
  });

  it('an empty value (--dmax=) and a value given to a flag that takes none are refused', () => {
    expect(problemsOf([CASE, '--tmr', TMR, '--dmax='])).toEqual([
      '--dmax: needs a value (given empty)',
    ]);
    expect(problemsOf([CASE, '--json=yes'])).toEqual(['--json: takes no value']);
  });

  it('--seed without --mc-histories is refused', () => {
    expect(problemsOf([CASE, '--seed', '3'])).toEqual([
      '--seed: needs --mc-histories (the seed is for a Monte Carlo run)',
    ]);
  });

  it('--check-method must name a method, one that is computed', () => {
    expect(problemsOf([CASE, '--check-method', 'nonsense'])[0]).toMatch(
      /^--check-method nonsense: unknown method \(expected one of water, rtmr, /,
    );
    expect(problemsOf([CASE, '--methods', 'rtmr', '--check-method', 'batho'])).toEqual([
      '--check-method batho: not among the methods asked for (--methods rtmr)',
    ]);
    expect(problemsOf([CASE, '--check-method', 'monte-carlo'])).toEqual([
      '--check-method monte-carlo: needs --mc-histories (no Monte Carlo run otherwise)',
    ]);
    expect(problemsOf([CASE, '--check-method', 'etar'])).toEqual([]);
  });

  it('--prescribe for a point the file does not have is refused (it used to be ignored)', () => {
    const doc = loadDocument(readFileSync(CASE, 'utf8'));
    expect(flagProblemsForDocument(doc, { pointId: 'NOPE', doseCGy: 200 })).toEqual([
      '--prescribe NOPE=200: no beam has a point "NOPE"',
    ]);
    expect(flagProblemsForDocument(doc, { pointId: 'P1', doseCGy: 200 })).toEqual([]);
    const r = calc([CASE, '--prescribe', 'NOPE=200', '--methods', 'rtmr']);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/--prescribe NOPE=200: no beam has a point "NOPE"/);
  });

  it('batch mode marks a file without the prescription point invalid', () => {
    const r = calc(['--batch', CASE, '--prescribe', 'NOPE=200', '--methods', 'rtmr']);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/no beam has a point "NOPE"/);
  });
});

describe('Monte Carlo histories and seed: the page’s limits on the command line', () => {
  it('--mc-histories 1e12 is refused before any memory is taken (it used to abort, exit 134)', () => {
    const r = calc([CASE, '--mc-histories', '1e12']);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/^--mc-histories 1e12: must be between 1 000 and 50 000 000$/m);
  });

  it('the command line and the page accept and refuse the same histories and seeds', () => {
    const cases = [
      '10',
      String(HISTORY_LIMITS.min - 1),
      String(HISTORY_LIMITS.min),
      '2e5',
      String(HISTORY_LIMITS.max),
      String(HISTORY_LIMITS.max + 1),
      '2500.5',
      '-5000',
    ];
    for (const h of cases) {
      const cli = mcFlagProblems(new Map([['mc-histories', h]]));
      const page = parseHistories(h);
      expect(cli.length === 0).toBe(page.ok);
      if (!page.ok)
        expect(cli[0]?.replace(/^--mc-histories \S+: /, '')).toBe(
          page.message.replace(/^Histories: /, ''),
        );
    }
    for (const s of ['0', String(SEED_LIMITS.max), String(SEED_LIMITS.max + 1), '-1', '1.5']) {
      const cli = mcFlagProblems(
        new Map([
          ['mc-histories', '5000'],
          ['seed', s],
        ]),
      );
      expect(cli.length === 0).toBe(parseSeed(s).ok);
    }
  });
});
