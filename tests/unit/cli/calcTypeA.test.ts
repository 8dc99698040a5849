// The calc command line with measured water data: every type-A method printed for the demo case
// with the invented demo table; invalid tables exit with code 2 and name row and column.
import { spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';

function calc(args: string[]) {
  const r = spawnSync(process.execPath, ['--import', 'tsx', 'src/cli/calc.ts', ...args], {
    encoding: 'utf8',
  });
  return { code: r.status, out: r.stdout, err: r.stderr };
}

const CASE = 'public/cases/lung-slab-6mv.json';
const TYPE_A = ['water', 'rtmr', 'epl-pdd', 'batho', 'batho-modified', 'etar'];

describe('npm run calc with water data', () => {
  it('prints every type-A method with its variant and the table hash for the demo case', () => {
    const r = calc([
      CASE,
      '--tmr',
      'public/tables/demo-6mv-tmr.csv',
      '--scatter',
      'public/tables/demo-6mv-scatter.csv',
      '--dmax',
      '1.5',
    ]);
    expect(r.err).toBe('');
    expect(r.code).toBe(0);
    for (const id of TYPE_A)
      expect(r.out).toMatch(
        new RegExp(
          `^Method ${id}: .*\\[.+\\].*measured table: demo-6mv-tmr\\.csv \\(sha-256 [0-9a-f]{12}\\)`,
          'm',
        ),
      );
    // beyond 8 cm of lung every correction raises the dose at P1 (CF column > 1)
    const sections = r.out
      .split(/^Method /m)
      .slice(1)
      .filter((sec) => TYPE_A.some((id) => sec.startsWith(`${id}:`)));
    const p1 = sections.map((sec) => sec.split('\n').find((l) => l.startsWith('P1 ')) ?? '');
    expect(p1.length).toBe(6);
    const cfs = p1.map((l) => Number(l.trim().split(/\s+/)[2]));
    expect(cfs[0]).toBe(1);
    for (const cf of cfs.slice(1)) expect(cf).toBeGreaterThan(1.1);
  });

  it('converts a PDD table given with --pdd and --ssd', () => {
    const r = calc([
      CASE,
      '--pdd',
      'public/tables/demo-6mv-pdd-ssd100.csv',
      '--ssd',
      '100',
      '--json',
    ]);
    expect(r.code).toBe(0);
    const doc = JSON.parse(r.out) as { methods: { id: string; waterData: string }[] };
    expect(doc.methods.map((m) => m.id).filter((id) => TYPE_A.includes(id))).toEqual([
      'water',
      'rtmr',
      'epl-pdd',
      'batho',
      'batho-modified',
      'etar',
    ]);
    expect(doc.methods[0]?.waterData).toMatch(
      /demo-6mv-pdd-ssd100\.csv.*S_p not supplied: taken as 1/,
    );
  });

  it('uses the modelled beam for the type-A methods when no table is given, and says so', () => {
    const r = calc([CASE, '--methods', 'rtmr,batho']);
    expect(r.code).toBe(0);
    expect(r.out).toMatch(/Method rtmr: .*water data: modelled beam \(6MV/);
    expect(r.out).not.toMatch(/needs water data/);
  });

  it('exits with code 2 and names row and column of a bad table', () => {
    const dir = mkdtempSync(join(tmpdir(), 'lamina-'));
    const f = join(dir, 'bad.csv');
    writeFileSync(f, 'depth,5,10\n0,0.5,0.5\n1.5,1,one\n3,0.95\n');
    const r = calc([CASE, '--tmr', f]);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/bad\.csv: row 3, column 3 \(C\): "one" is not a number/);
    expect(r.err).toMatch(/bad\.csv: row 4: has 2 cells, the header has 3 \(ragged row\)/);
  });

  it('a PDD table without --ssd exits with code 2', () => {
    const r = calc([CASE, '--pdd', 'public/tables/demo-6mv-pdd-ssd100.csv']);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/needs its SSD/);
  });
});
