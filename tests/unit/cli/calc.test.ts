import { describe, expect, it } from 'vitest';
import { spawnSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

function calc(args: string[]) {
  const r = spawnSync(process.execPath, ['--import', 'tsx', 'src/cli/calc.ts', ...args], {
    encoding: 'utf8',
  });
  return { code: r.status, out: r.stdout, err: r.stderr };
}

describe('npm run calc', () => {
  it('prints layers and radiological depth at each point', () => {
    const r = calc(['public/cases/lung-slab-6mv.json']);
    expect(r.code).toBe(0);
    expect(r.out).toMatch(/Lung \(inflated\)/);
    expect(r.out).toMatch(/P1\s+15\.00\s+9\.414/);
  });

  it('prints one JSON document with --json', () => {
    const r = calc(['public/cases/lung-slab-6mv.json', '--json']);
    expect(r.code).toBe(0);
    const doc = JSON.parse(r.out) as {
      format: string;
      points: { id: string }[];
      methods: unknown[];
    };
    expect(doc.format).toBe('lamina.calc');
    expect(doc.points.map((p) => p.id)).toContain('P1');
    expect(Array.isArray(doc.methods)).toBe(true);
  });

  it('rejects an invalid case with the field path and exit code 2', () => {
    const dir = mkdtempSync(join(tmpdir(), 'lamina-'));
    const f = join(dir, 'bad.json');
    writeFileSync(
      f,
      JSON.stringify({
        format: 'lamina.case',
        version: 1,
        name: 'bad',
        beam: { energy: '6MV', setup: { kind: 'SSD', ssdCm: 100 }, fieldXCm: 10, fieldYCm: 10 },
        layers: [{ materialId: 'water', thicknessCm: -1 }],
        points: [],
      }),
    );
    const r = calc([f]);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/layers\[0\]\.thicknessCm: thickness must be > 0 cm/);
  });
});
