import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { validateCase } from '../../../src/io/caseFile';
import { CASE_VERSION } from '../../../src/io/caseSchema';

const v1 = (points: unknown[]) => ({
  format: 'lamina.case',
  version: 1,
  name: 'v1',
  beam: { energy: '6MV', setup: { kind: 'SSD', ssdCm: 100 }, fieldXCm: 10, fieldYCm: 10 },
  layers: [{ materialId: 'water', thicknessCm: 20 }],
  points,
});

describe('case migration 1 → 2 (planning MU moves to the beam)', () => {
  it('validateCase(v1) moves one planning MU from its point to beam.planningMu and keeps the dose', () => {
    const r = validateCase(v1([{ id: 'P', depthCm: 10, planningMu: 212, planningDoseCGy: 200 }]));
    if (!r.ok) throw new Error(JSON.stringify(r.problems));
    expect(r.value.version).toBe(CASE_VERSION);
    expect(r.value.beam.planningMu).toBe(212);
    expect(r.value.points).toEqual([{ id: 'P', depthCm: 10, planningDoseCGy: 200 }]);
  });

  it('validateCase(v1) takes equal MU on several points as the beam’s, points without MU untouched', () => {
    const r = validateCase(
      v1([
        { id: 'A', depthCm: 5, planningMu: 150 },
        { id: 'B', depthCm: 8 },
        { id: 'C', depthCm: 12, planningMu: 150, planningDoseCGy: 90 },
      ]),
    );
    if (!r.ok) throw new Error(JSON.stringify(r.problems));
    expect(r.value.beam.planningMu).toBe(150);
    expect(r.value.points.map((p) => Object.keys(p).sort())).toEqual([
      ['depthCm', 'id'],
      ['depthCm', 'id'],
      ['depthCm', 'id', 'planningDoseCGy'],
    ]);
  });

  it('validateCase(v1) refuses differing MU, naming every field and value, and changes nothing', () => {
    const doc = v1([
      { id: 'A', depthCm: 5, planningMu: 150 },
      { id: 'B', depthCm: 8, planningMu: 160 },
    ]);
    const before = structuredClone(doc);
    const r = validateCase(doc);
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.problems).toHaveLength(1);
    expect(r.problems[0]?.path).toBe('points[0].planningMu, points[1].planningMu');
    expect(r.problems[0]?.message).toMatch(/150, 160/);
    expect(r.problems[0]?.message).toMatch(/beam\.planningMu/);
    expect(doc).toEqual(before);
  });

  it('validateCase(v1) without planning MU needs no change beyond the version', () => {
    const r = validateCase(v1([{ id: 'P', depthCm: 10 }]));
    expect(r.ok && r.value.beam.planningMu).toBe(undefined);
    expect(r.ok).toBe(true);
  });

  it('the shipped demo cases are version 2 with the planning MU on the beam', () => {
    for (const f of ['rib-and-bone-6mv.json', 'air-gap-6mv-small-field.json']) {
      const raw = JSON.parse(readFileSync(`public/cases/${f}`, 'utf8')) as {
        version: number;
        beam: { planningMu?: number };
      };
      expect(raw.version).toBe(2);
      expect(raw.beam.planningMu).toBeGreaterThan(0);
    }
  });
});

describe('the case check block', () => {
  const v2 = (check: unknown) => ({
    ...v1([{ id: 'P', depthCm: 10 }]),
    version: 2,
    check,
  });

  it('validateCase(...) reads the prescription, tolerances, deciding method and dose convention', () => {
    const check = {
      prescription: { pointId: 'P', doseCGy: 200 },
      tolerances: { homogeneousPercent: 3, heterogeneousPercent: 6 },
      checkMethodId: 'superposition',
      doseTo: 'medium',
    };
    const r = validateCase(v2(check));
    expect(r.ok && r.value.check).toEqual(check);
  });

  it('validateCase(...) names the field of a bad check setting', () => {
    const r = validateCase(v2({ prescription: { pointId: 'Q', doseCGy: 200 }, doseTo: 'tissue' }));
    expect(r.ok).toBe(false);
    if (r.ok) return;
    const lines = r.problems.map((p) => `${p.path}: ${p.message}`);
    expect(lines).toContain('check.doseTo: dose convention must be one of "water", "medium"');
    const r2 = validateCase(v2({ prescription: { pointId: 'Q', doseCGy: 200 } }));
    expect(r2.ok ? [] : r2.problems.map((p) => `${p.path}: ${p.message}`)).toContain(
      'check.prescription.pointId: no point "Q" in this case',
    );
  });
});
