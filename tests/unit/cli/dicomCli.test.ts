// `npm run calc -- --dicom DIR`: the four-field box plan written as DICOM files, imported and
// checked end to end in Node.
import { describe, expect, it } from 'vitest';
import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { BOX_BEAMS, BOX_SPACING, boxPlanFiles, writeFiles } from '../../helpers/dicomFixtures';
import { writeRtPlan } from '../../helpers/dicomPhantom';
import { validatePlan } from '../../../src/io/planFile';

function calc(args: string[]) {
  const r = spawnSync(process.execPath, ['--import', 'tsx', 'src/cli/calc.ts', ...args], {
    encoding: 'utf8',
  });
  return { code: r.status, out: r.stdout, err: r.stderr };
}

describe('npm run calc -- --dicom', () => {
  const dir = mkdtempSync(join(tmpdir(), 'lamina-dicom-'));
  writeFiles(join(dir, 'series'), boxPlanFiles());

  it('prints lamina.plancalc with --json and writes the lamina.plan', () => {
    const planPath = join(dir, 'out.plan.json');
    const r = calc([
      '--dicom',
      join(dir, 'series'),
      '--json',
      '--methods',
      'rtmr',
      '--write-plan',
      planPath,
    ]);
    expect(r.err).toBe('');
    expect(r.code).toBe(0);
    const doc = JSON.parse(r.out) as {
      format: string;
      planName: string;
      beams: { id: string; report: { points: { id: string; depthCm: number }[] } }[];
      check: {
        totals: { pointId: string }[];
        beams: { beamId: string; planningMu: number | null }[];
        doseTo: string;
      };
    };
    expect(doc.format).toBe('lamina.plancalc');
    expect(doc.planName).toBe('BOX 4F');
    expect(doc.beams).toHaveLength(4);
    doc.beams.forEach((b, i) => {
      const iso = b.report.points.find((p) => p.id === 'ISO')!;
      expect(Math.abs(iso.depthCm - BOX_BEAMS[i]!.isoDepthCm)).toBeLessThanOrEqual(
        BOX_SPACING.rowMm / 10,
      );
    });
    expect(doc.check.totals.map((t) => t.pointId)).toEqual(['ISO']);
    // Each RT Plan beam meterset is that beam's planning MU in the check.
    expect(doc.check.beams.map((b) => b.planningMu)).toEqual(BOX_BEAMS.map((b) => b.meterset));
    const raw = JSON.parse(readFileSync(planPath, 'utf8')) as unknown;
    const plan = validatePlan(raw);
    expect(plan.ok).toBe(true);
    if (!plan.ok) return;
    expect(raw).toMatchObject({ format: 'lamina.plan', version: 2 });
    expect(plan.value.beams).toHaveLength(4);
    expect(plan.value.beams.map((b) => b.case.beam.planningMu)).toEqual(
      BOX_BEAMS.map((b) => b.meterset),
    );
    // The written plan is an ordinary plan file: it checks the same way.
    const again = calc([planPath, '--json', '--methods', 'rtmr']);
    expect(again.code).toBe(0);
    expect((JSON.parse(again.out) as { check: unknown }).check).toEqual(doc.check);
  });

  it('takes the check and water-data flags of a plan file (--dose-to, --water-data, --check-method)', () => {
    const r = calc([
      '--dicom',
      join(dir, 'series'),
      '--json',
      '--methods',
      'rtmr,batho-modified',
      '--dose-to',
      'medium',
      '--water-data',
      'modelled',
      '--check-method',
      'batho-modified',
    ]);
    expect(r.err).toBe('');
    expect(r.code).toBe(0);
    const doc = JSON.parse(r.out) as {
      doseTo: string;
      check: { doseTo: string; decisiveMethodId: string; decisiveMethodReason: string };
    };
    expect(doc.check.doseTo).toBe('medium');
    expect(doc.check.decisiveMethodId).toBe('batho-modified');
    expect(doc.check.decisiveMethodReason).toBe('chosen');
    expect(calc(['--dicom', join(dir, 'series'), '--dose-to', 'bone']).err).toMatch(
      /--dose-to must be "water" or "medium"/,
    );
  });

  it('prints the import summary and the check as text', () => {
    const r = calc(['--dicom', join(dir, 'series'), '--methods', 'rtmr', '--min-slab', '1']);
    expect(r.code).toBe(0);
    expect(r.out).toMatch(/Calibration: generic, from memory — replace with your scanner's/);
    expect(r.out).toMatch(
      /beam-2 "LEFT": gantry 90°, couch 0°, HFS, SSD 84\.\d\d cm \(planning system 85\.00 cm\)/,
    );
    expect(r.out).toMatch(/Plan: BOX 4F \(4 beams\)/);
  });

  it('exits 2 naming every beam it cannot check', () => {
    const d = join(dir, 'wedged');
    writeFiles(d, [
      ...boxPlanFiles().filter((f) => f.name.startsWith('CT')),
      writeRtPlan({
        label: 'W',
        patientPosition: 'HFS',
        beams: [
          { number: 1, name: 'OPEN', energyMV: 6, gantryDeg: 0, isoMm: [0, 0, 0] },
          { number: 2, name: 'WEDGED', energyMV: 6, gantryDeg: 90, isoMm: [0, 0, 0], wedges: 1 },
        ],
      }),
    ]);
    const r = calc(['--dicom', d]);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(
      /1 of 2 beams cannot be checked\nbeam-2 "WEDGED": 1 wedge: wedge factors are not modelled/,
    );
  });

  it('exits 2 on a bad option or a missing folder', () => {
    expect(calc(['--dicom', join(dir, 'series'), '--min-slab', 'abc']).err).toMatch(
      /--min-slab: "abc" is not a number/,
    );
    const r = calc(['--dicom', join(dir, 'nothing-here')]);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/cannot read the folder/);
  });
});
