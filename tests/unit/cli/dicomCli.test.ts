// `npm run calc -- --dicom DIR`: the four-field box plan written as DICOM files, imported and
// checked end to end in Node.
import { describe, expect, it } from 'vitest';
import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { BOX_BEAMS, BOX_SPACING, boxPlanFiles, writeFiles } from '../../helpers/dicomFixtures';
import { writeRtPlan } from '../../helpers/dicomPhantom';

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
      check: { totals: { pointId: string }[] };
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
    const plan = JSON.parse(readFileSync(planPath, 'utf8')) as { format: string; beams: unknown[] };
    expect(plan.format).toBe('lamina.plan');
    expect(plan.beams).toHaveLength(4);
    // The written plan is an ordinary plan file: it checks the same way.
    const again = calc([planPath, '--json', '--methods', 'rtmr']);
    expect(again.code).toBe(0);
    expect((JSON.parse(again.out) as { check: unknown }).check).toEqual(doc.check);
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
