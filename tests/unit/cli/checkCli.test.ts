import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it, vi } from 'vitest';
import { batchExitCode, batchRows, formatBatch } from '../../../src/cli/batch';
import {
  calculateDocument,
  jsonOf,
  loadDocument,
  planOptionsOf,
  textOf,
} from '../../../src/cli/checkCommand';

/** The check needs only the water and effective-depth methods here; kernel methods would only slow the run. */
const METHODS = ['--methods', 'water,rtmr'];

function calc(args: string[]) {
  const r = spawnSync(
    process.execPath,
    ['--import', 'tsx', 'src/cli/calc.ts', ...args, ...METHODS],
    {
      encoding: 'utf8',
    },
  );
  return { code: r.status, out: r.stdout, err: r.stderr };
}

const CASE_WATER = { kind: 'case' } as const;

function run(file: string, flags: string[] = []) {
  const doc = loadDocument(readFileSync(file, 'utf8'));
  const options = planOptionsOf(new Map(Object.entries(flagMap([...flags, ...METHODS]))));
  const answer = calculateDocument(doc, { water: CASE_WATER, options });
  if (!answer.ok) throw new Error(`${file} must be valid`);
  return { doc: { isPlan: answer.isPlan }, result: answer.report };
}

function flagMap(args: string[]): Record<string, string> {
  const out: Record<string, string> = {};
  for (let i = 0; i < args.length; i += 2)
    out[(args[i] as string).slice(2)] = args[i + 1] as string;
  return out;
}

const WATER = 'public/cases/water-reference-6mv.json'; // planning value 0.8 % from RTMR: passes 2 %
const PLAN = 'public/cases/opposed-pair-chest-6mv.plan.json'; // ≈ 1 % per beam: passes 5 %
const AIR = 'public/cases/air-gap-6mv-small-field.json'; // 7 % apart: fails 5 %
const options = {
  water: CASE_WATER,
  options: planOptionsOf(new Map(Object.entries(flagMap(METHODS)))),
};

describe('calc CLI: point check', () => {
  it('textOf(...) prints the point table and the verdict for a case file', () => {
    const { doc, result } = run(WATER);
    const text = textOf(result, doc.isPlan);
    expect(text).toMatch(/Point check/);
    expect(text).toMatch(/ref\s+10\.00\s+Ratio of TMR \(effective depth\)/);
    // Water-like path: the ratio of TMR decides by default, and the verdict names its difference.
    expect(text).toMatch(
      /Deciding method: Ratio of TMR \(effective depth\), default for water-like paths/,
    );
    expect(text).toMatch(
      /Check verdict: pass — Ratio of TMR \(effective depth\): ΔMU \+0\.\d\d % within ±2 % \(beam beam-1, point ref\)/,
    );
    expect(text).toMatch(/Dose reported as: dose to water/);
  });

  it('jsonOf(...) keeps the calc document of a case and adds its check section', () => {
    const { doc, result } = run(AIR);
    const json = jsonOf(result, doc.isPlan) as {
      format: string;
      check: {
        verdict: string;
        decisiveMethodId: string;
        beams: { points: { pointId: string }[] }[];
      };
    };
    expect(json.format).toBe('lamina.calc');
    expect(json.check.decisiveMethodId).toBe('rtmr');
    expect(json.check.verdict).toBe('fail');
    expect(json.check.beams[0]?.points.map((p) => p.pointId)).toEqual(['iso', 'behind-gap']);
  });

  it('textOf(...) prints per-beam and total tables for a plan file', () => {
    const { doc, result } = run(PLAN);
    expect(doc.isPlan).toBe(true);
    const text = textOf(result, doc.isPlan);
    expect(text).toMatch(/=== Beam AP — anterior ===/);
    expect(text).toMatch(/Total over beams/);
    expect(text).toMatch(/Prescription: 200 cGy at iso/);
    // Per-beam verdicts: the uncorrected water calculation is about 10 % off through lung.
    expect(text).toMatch(/beam\s+water\s+rtmr/);
    expect(text).toMatch(/AP\s+fail\s+pass/);
    expect(text).toMatch(/all \(with totals\)\s+fail\s+pass/);
  });

  it('batchRows(...) gives one row per file and batchExitCode 0 / 1 for pass / any fail', () => {
    const ok = batchRows([WATER, PLAN], options);
    expect(ok.map((r) => r.verdict)).toEqual(['pass', 'pass']);
    expect(batchExitCode(ok)).toBe(0);
    expect(formatBatch(ok)).toMatch(/2 file\(s\): 0 outside tolerance, 0 invalid/);
    const bad = batchRows([WATER, AIR, PLAN], options);
    expect(batchExitCode(bad)).toBe(1);
    // MU: 1/0.93 − 1 ≈ +7.5 % for the invented 7 % dose offset.
    expect(formatBatch(bad)).toMatch(/air-gap-6mv-small-field\.json.*rtmr\s+\+7\.5\d\s+2\s+fail/);
  });

  it('planOptionsOf(--tolerances) widens the action levels and rejects malformed values', () => {
    const wide = planOptionsOf(new Map([['tolerances', '8,8']]));
    expect(
      batchExitCode(batchRows([AIR], { ...options, options: { ...options.options, ...wide } })),
    ).toBe(0);
    expect(() => planOptionsOf(new Map([['tolerances', 'x']]))).toThrow(/two positive percentages/);
  });

  it('batchRows(...) marks an invalid file (exit 2) and names the field', () => {
    const dir = mkdtempSync(join(tmpdir(), 'lamina-batch-'));
    const bad = join(dir, 'bad.json');
    const doc = JSON.parse(readFileSync(WATER, 'utf8')) as { points: { depthCm: number }[] };
    doc.points[0]!.depthCm = 99;
    writeFileSync(bad, JSON.stringify(doc));
    const err = vi.spyOn(console, 'error').mockImplementation(() => undefined);
    const rows = batchRows([WATER, bad], options);
    expect(rows[1]?.verdict).toBe('invalid');
    expect(batchExitCode(rows)).toBe(2);
    expect(String(err.mock.calls[0]?.[0])).toMatch(
      /points\[0\]\.depthCm: depth 99 cm is outside the phantom/,
    );
    err.mockRestore();
  });

  it('npm run calc exits 1 for a failing batch, prints JSON rows with --json, and 0 for one case', () => {
    const single = calc([WATER]);
    expect(single.code).toBe(0);
    expect(single.out).toMatch(/Check verdict: pass — Ratio of TMR/);
    const batch = calc(['--batch', '--json', WATER, AIR]);
    expect(batch.code).toBe(1);
    const rows = JSON.parse(batch.out) as { verdict: string }[];
    expect(rows.map((x) => x.verdict)).toEqual(['pass', 'fail']);
    // Several files without --batch run the same batch.
    expect(calc([WATER, PLAN]).code).toBe(0);
  });

  it('planOptionsOf(--prescribe P=D) gives the MU for the prescribed dose at the point', () => {
    const rx = planOptionsOf(new Map([['prescribe', 'ref=180']]));
    expect(rx.prescription).toEqual({ pointId: 'ref', doseCGy: 180 });
    const { result } = run(WATER, ['--prescribe', 'ref=180']);
    const m = result.check.beams[0]?.points[0]?.methods.find((x) => x.methodId === 'rtmr');
    expect(result.check.beams[0]?.points[0]?.prescribedDoseCGy).toBe(180);
    // MU = D / (dose per MU), exact division.
    expect(m?.mu).toBe(180 / (m?.dosePerMuCGy as number));
    expect(() => planOptionsOf(new Map([['prescribe', 'P1']]))).toThrow(/POINT=DOSE/);
    expect(() => planOptionsOf(new Map([['prescribe', 'P1=-5']]))).toThrow(/POINT=DOSE/);
  });
});
