import { spawnSync } from 'node:child_process';
import { describe, expect, it } from 'vitest';
import { batchExitCode, formatBatch, type BatchRow } from '../../../src/cli/batch';

function calc(extra: string[]) {
  return spawnSync(
    process.execPath,
    [
      '--import',
      'tsx',
      'src/cli/calc.ts',
      'public/cases/lung-slab-6mv.json',
      '--methods',
      'monte-carlo',
      '--mc-histories',
      '1000',
      '--seed',
      '3',
      '--prescribe',
      'P1=200',
      ...extra,
    ],
    { encoding: 'utf8' },
  );
}

describe('the CLI check with a Monte Carlo run', () => {
  it('npm run calc -- case --mc-histories N prints the check MU and dose per MU as value ± σ', () => {
    const r = calc([]);
    expect(r.status).toBe(0);
    const row = r.stdout.split('\n').find((l) => /\bP1\b/.test(l) && l.includes('Monte Carlo'));
    // D/MU with 4 decimals ± its σ, MU with 1 decimal ± its σ.
    expect(row).toMatch(/\d\.\d{4} ± \d\.\d{4}/);
    expect(row).toMatch(/\d+\.\d ± \d+\.\d/);
    // The run behind the σ is named after the check: 1000 histories, seed 3.
    expect(r.stdout).toMatch(
      /Monte Carlo, beam beam-1: 1000 histories per run in \d+ of \d+ batches, seed 3/,
    );
  });

  it('npm run calc -- case --mc-histories N --json gives the check’s Monte Carlo σ', () => {
    const r = calc(['--json']);
    expect(r.status).toBe(0);
    const doc = JSON.parse(r.stdout) as {
      check: {
        beams: {
          points: {
            pointId: string;
            methods: {
              methodId: string;
              mu: number;
              dosePerMuCGy: number;
              sigma?: { mu: number; dosePerMuCGy: number };
            }[];
          }[];
        }[];
      };
    };
    const m = doc.check.beams[0]?.points
      .find((p) => p.pointId === 'P1')
      ?.methods.find((x) => x.methodId === 'monte-carlo');
    expect(m?.sigma?.dosePerMuCGy).toBeGreaterThan(0);
    // σ_MU / MU = σ_(D/MU) / (D/MU): exact arithmetic, round-off only (1e-9 after JSON).
    const a = (m?.sigma?.mu as number) / (m?.mu as number);
    const b = (m?.sigma?.dosePerMuCGy as number) / (m?.dosePerMuCGy as number);
    expect(Math.abs(a - b) / b).toBeLessThan(1e-9);
  });
});

describe('batch mode with an uncertain Monte Carlo verdict', () => {
  const row = (verdict: BatchRow['verdict']): BatchRow => ({
    file: `${verdict}.json`,
    name: verdict,
    beams: 1,
    method: 'monte-carlo',
    largestDiffPercent: 1.5,
    comparisons: 2,
    verdict,
  });

  it('batchExitCode(...) exits 1 when a check is uncertain: it was not shown within tolerance', () => {
    expect(batchExitCode([row('pass')])).toBe(0);
    expect(batchExitCode([row('pass'), row('uncertain')])).toBe(1);
    expect(batchExitCode([row('uncertain'), row('invalid')])).toBe(2);
    expect(formatBatch([row('pass'), row('uncertain')])).toMatch(
      /2 file\(s\): 0 outside tolerance, 1 uncertain \(Monte Carlo: run longer\), 0 invalid/,
    );
  });
});
