import { describe, expect, it } from 'vitest';
import { spawnSync } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { calculateCase } from '../../../src/compute/calculateCase';
import { parseCaseText } from '../../../src/io/caseFile';
import { mcOptionsOf } from '../../../src/cli/mcArgs';

function demoCase() {
  const parsed = parseCaseText(readFileSync('public/cases/lung-slab-6mv.json', 'utf8'));
  if (!parsed.ok) throw new Error('demo case does not parse');
  return parsed.value;
}

describe('Monte Carlo in the case calculation and the CLI', () => {
  it('calculateCase(...) with mc options adds a type C monte-carlo method with σ at the points', () => {
    const report = calculateCase(demoCase(), {
      methods: ['monte-carlo'],
      mc: { histories: 2000, seed: 4 },
    });
    const mc = report.methods.find((m) => m.id === 'monte-carlo');
    expect(mc?.methodClass).toBe('type C');
    expect(mc?.curve.depthCm).toEqual(report.depthCm);
    expect(mc?.points.map((p) => p.id)).toEqual(['P1', 'in-lung']);
    expect(mc?.points[0]?.sigmaDosePerMuCGy).toBeGreaterThan(0);
    expect(report.unavailable).toEqual([]);
  });

  it('calculateCase(...) asked for monte-carlo without histories reports it unavailable', () => {
    const report = calculateCase(demoCase(), { methods: ['monte-carlo'] });
    expect(report.methods).toEqual([]);
    expect(report.unavailable[0]?.reason).toMatch(/histories/);
  });

  it('mcOptionsOf(...) reads --mc-histories and --seed and rejects bad values', () => {
    expect(mcOptionsOf(new Map())).toEqual({});
    expect(mcOptionsOf(new Map([['mc-histories', '5000']]))).toEqual({
      mc: { histories: 5000, seed: 1, runner: expect.any(Function) },
    });
    expect(
      mcOptionsOf(
        new Map([
          ['mc-histories', '5000'],
          ['seed', '9'],
        ]),
      ),
    ).toEqual({ mc: { histories: 5000, seed: 9, runner: expect.any(Function) } });
    expect(() => mcOptionsOf(new Map([['mc-histories', 'many']]))).toThrow(
      '--mc-histories many: must be a number',
    );
  });

  it('npm run calc -- case --mc-histories N --seed S --json includes monte-carlo, reproducibly', () => {
    const run = () =>
      spawnSync(
        process.execPath,
        [
          '--import',
          'tsx',
          'src/cli/calc.ts',
          'public/cases/lung-slab-6mv.json',
          '--json',
          '--methods',
          'monte-carlo',
          '--mc-histories',
          '1000',
          '--seed',
          '2',
        ],
        { encoding: 'utf8' },
      );
    const a = run();
    expect(a.status).toBe(0);
    const doc = JSON.parse(a.stdout) as {
      methods: { id: string; points: { dosePerMuCGy: number }[] }[];
    };
    const mc = doc.methods.find((m) => m.id === 'monte-carlo');
    expect(mc?.points[0]?.dosePerMuCGy).toBeGreaterThan(0);
    expect(JSON.parse(run().stdout)).toEqual(doc);
  });
});
