import { spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';

function calc(args: string[]) {
  const r = spawnSync(process.execPath, ['--import', 'tsx', 'src/cli/calc.ts', ...args], {
    encoding: 'utf8',
  });
  return { code: r.status, out: r.stdout, err: r.stderr };
}

const WATER = 'public/cases/water-reference-6mv.json'; // planning value 0.8 % from RTMR: passes 2 %
const PLAN = 'public/cases/opposed-pair-chest-6mv.plan.json'; // ≈ 1 % per beam: passes 5 %
const AIR = 'public/cases/air-gap-6mv-small-field.json'; // 7 % apart: fails 5 %

describe('npm run calc: point check', () => {
  it('prints the point table and the verdict for a case file', () => {
    const r = calc([WATER]);
    expect(r.code).toBe(0);
    expect(r.out).toMatch(/Point check/);
    expect(r.out).toMatch(/ref\s+10\.00\s+Ratio of TMR \(effective depth\)/);
    expect(r.out).toMatch(/Check verdict \(rtmr\): within tolerance/);
  });

  it('adds a check section to --json for a case file', () => {
    const r = calc([AIR, '--json']);
    expect(r.code).toBe(0);
    const doc = JSON.parse(r.out) as {
      format: string;
      check: {
        verdict: string;
        decisiveMethodId: string;
        beams: { points: { pointId: string }[] }[];
      };
    };
    expect(doc.format).toBe('lamina.calc');
    expect(doc.check.decisiveMethodId).toBe('rtmr');
    expect(doc.check.verdict).toBe('fail');
    expect(doc.check.beams[0]?.points.map((p) => p.pointId)).toEqual(['iso', 'behind-gap']);
  });

  it('prints per-beam and total tables for a plan file', () => {
    const r = calc([PLAN]);
    expect(r.code).toBe(0);
    expect(r.out).toMatch(/=== Beam AP — anterior ===/);
    expect(r.out).toMatch(/Total over beams/);
    expect(r.out).toMatch(/Prescription: 200 cGy at iso/);
  });

  it('--batch exits 0 when every check passes and 1 when any fails', () => {
    const ok = calc(['--batch', WATER, PLAN]);
    expect(ok.code).toBe(0);
    expect(ok.out).toMatch(/2 file\(s\): 0 outside tolerance, 0 invalid/);
    const bad = calc(['--batch', WATER, AIR, PLAN]);
    expect(bad.code).toBe(1);
    expect(bad.out).toMatch(/air-gap-6mv-small-field\.json.*rtmr\s+\+7\.5\d\s+2\s+fail/); // MU: 1/0.93 − 1 ≈ +7.5 %
    // Several files without --batch run the same batch.
    expect(calc([WATER, AIR]).code).toBe(1);
  });

  it('--tolerances widens the action levels', () => {
    expect(calc(['--batch', AIR, '--tolerances', '8,8']).code).toBe(0);
    const r = calc([AIR, '--tolerances', 'x']);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/--tolerances needs two positive percentages/);
  });

  it('--batch exits 2 for an invalid file and names the field', () => {
    const dir = mkdtempSync(join(tmpdir(), 'lamina-batch-'));
    const bad = join(dir, 'bad.json');
    const doc = JSON.parse(readFileSync(WATER, 'utf8')) as { points: { depthCm: number }[] };
    doc.points[0]!.depthCm = 99;
    writeFileSync(bad, JSON.stringify(doc));
    const r = calc(['--batch', WATER, bad]);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/points\[0\]\.depthCm: depth 99 cm is outside the phantom/);
    expect(r.out).toMatch(/invalid/);
  });

  it('--batch --json prints one row object per file', () => {
    const r = calc(['--batch', '--json', WATER, AIR]);
    expect(r.code).toBe(1);
    const rows = JSON.parse(r.out) as { file: string; verdict: string }[];
    expect(rows.map((x) => x.verdict)).toEqual(['pass', 'fail']);
  });
});
