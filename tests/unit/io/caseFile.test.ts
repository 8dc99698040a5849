import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { parseCaseText, serializeCase, validateCase } from '../../../src/io/caseFile';

const demoText = readFileSync(
  new URL('../../../public/cases/lung-slab-6mv.json', import.meta.url),
  'utf8',
);
const demo = JSON.parse(demoText) as Record<string, unknown>;

function problemsOf(raw: unknown): string[] {
  const r = validateCase(raw);
  if (r.ok) throw new Error('expected the case to be rejected');
  return r.problems.map((p) => `${p.path}: ${p.message}`);
}

function edit(mutate: (c: Record<string, any>) => void): unknown {
  const c = structuredClone(demo) as Record<string, any>;
  mutate(c);
  return c;
}

describe('parseCaseText', () => {
  it('accepts the demo case', () => {
    const r = parseCaseText(demoText);
    expect(r.ok).toBe(true);
  });

  it('round-trips a case through JSON unchanged', () => {
    const r = parseCaseText(demoText);
    if (!r.ok) throw new Error('demo rejected');
    const again = parseCaseText(serializeCase(r.value));
    expect(again).toEqual(r);
  });

  it('rejects text that is not JSON, naming the file', () => {
    expect(problemsOf(undefined).length).toBeGreaterThan(0);
    const r = parseCaseText('{ not json');
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.problems[0]?.path).toBe('(file)');
  });
});

describe('validateCase rejections name the field and the rule', () => {
  it('negative thickness', () => {
    expect(problemsOf(edit((c) => (c.layers[1].thicknessCm = -2)))).toContain(
      'layers[1].thicknessCm: thickness must be > 0 cm',
    );
  });

  it('density below air (0.001 g/cm³) or > 3 g/cm³', () => {
    expect(problemsOf(edit((c) => (c.layers[0].densityGPerCm3 = 0)))).toContain(
      'layers[0].densityGPerCm3: density must be ≥ 0.001 g/cm³',
    );
    // The smallest positive double is not a physical density: refused with the same rule.
    expect(problemsOf(edit((c) => (c.layers[0].densityGPerCm3 = 5e-324)))).toContain(
      'layers[0].densityGPerCm3: density must be ≥ 0.001 g/cm³',
    );
    // Dry air near sea level, 1.205e-3 g/cm³ (NIST SRD 126, Table 2), is accepted.
    expect(validateCase(edit((c) => (c.layers[0].densityGPerCm3 = 0.001205))).ok).toBe(true);
    expect(problemsOf(edit((c) => (c.layers[2].densityGPerCm3 = 3.5)))).toContain(
      'layers[2].densityGPerCm3: density must be ≤ 3 g/cm³',
    );
    // A denormal density (found by the case fuzz: an infinite lateral electron range) is refused;
    // air (0.0012 g/cm³, NIST) is not.
    expect(problemsOf(edit((c) => (c.layers[0].densityGPerCm3 = 5e-324)))).toEqual([
      'layers[0].densityGPerCm3: density must be ≥ 0.001 g/cm³',
    ]);
    expect(validateCase(edit((c) => (c.layers[0].densityGPerCm3 = 0.0012))).ok).toBe(true);
  });

  it('density below 0.001 g/cm³ (a denormal 5e-324 gave an infinite lateral range)', () => {
    expect(problemsOf(edit((c) => (c.layers[0].densityGPerCm3 = 5e-324)))).toContain(
      'layers[0].densityGPerCm3: density must be ≥ 0.001 g/cm³',
    );
    // Air at its own density (0.0012 g/cm³, NIST) stays valid.
    expect(validateCase(edit((c) => (c.layers[0].densityGPerCm3 = 0.0012))).ok).toBe(true);
  });

  it('depth outside the phantom', () => {
    const p = problemsOf(edit((c) => (c.points[0].depthCm = 25)));
    expect(
      p.some((s) => s.startsWith('points[0].depthCm:') && s.includes('outside the phantom')),
    ).toBe(true);
  });

  it('unknown energy', () => {
    const p = problemsOf(edit((c) => (c.beam.energy = '7MV')));
    expect(p.some((s) => s.startsWith('beam.energy: unknown energy'))).toBe(true);
  });

  it('unknown version and wrong format', () => {
    expect(problemsOf(edit((c) => (c.version = 99)))[0]).toMatch(/^version: unknown version 99/);
    expect(problemsOf(edit((c) => (c.format = 'other')))[0]).toMatch(/^format: format must be/);
  });

  it('unknown material', () => {
    const p = problemsOf(edit((c) => (c.layers[1].materialId = 'cork')));
    expect(p.some((s) => s.startsWith('layers[1].materialId: unknown material'))).toBe(true);
  });

  it('text where a number belongs is not coerced', () => {
    const p = problemsOf(edit((c) => (c.layers[0].thicknessCm = '3')));
    expect(p.some((s) => s.startsWith('layers[0].thicknessCm:'))).toBe(true);
  });

  it('unknown fields are reported rather than dropped', () => {
    const p = problemsOf(edit((c) => (c.beam.wedge = 30)));
    expect(p.some((s) => s.startsWith('beam'))).toBe(true);
  });

  it('duplicate point ids', () => {
    const p = problemsOf(edit((c) => (c.points[1].id = c.points[0].id)));
    expect(p.some((s) => s.startsWith('points[1].id: duplicate point id'))).toBe(true);
  });

  it('SAD set-up whose isocentre lies below the phantom', () => {
    const p = problemsOf(
      edit((c) => (c.beam.setup = { kind: 'SAD', sadCm: 100, isocentreDepthCm: 40 })),
    );
    expect(p.some((s) => s.startsWith('beam.setup.isocentreDepthCm:'))).toBe(true);
  });
});
