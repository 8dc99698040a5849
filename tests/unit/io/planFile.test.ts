import { readdirSync, readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parsePlanText, serializePlan, validatePlan, planOfCase } from '../../../src/io/planFile';
import { parseCaseText } from '../../../src/io/caseFile';

const demoCaseText = readFileSync('public/cases/lung-slab-6mv.json', 'utf8');

function caseDoc(depthCm: number, thicknessCm = 20) {
  return {
    format: 'lamina.case',
    version: 1,
    name: 'beam',
    beam: {
      energy: '6MV',
      setup: { kind: 'SAD', sadCm: 100, isocentreDepthCm: depthCm },
      fieldXCm: 10,
      fieldYCm: 10,
    },
    layers: [{ materialId: 'water', thicknessCm }],
    points: [{ id: 'iso', depthCm }],
  };
}

const planDoc = {
  format: 'lamina.plan',
  version: 1,
  name: 'AP/PA',
  beams: [
    { id: 'AP', weight: 1, case: caseDoc(8) },
    { id: 'PA', weight: 1, case: caseDoc(12) },
  ],
  prescription: { pointId: 'iso', doseCGy: 200 },
  tolerances: { homogeneousPercent: 2, heterogeneousPercent: 5 },
};

describe('plan files', () => {
  it('validatePlan(...) opens a version-1 single-beam case file as a one-beam plan', () => {
    const r = parsePlanText(demoCaseText);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.value.beams).toHaveLength(1);
    expect(r.value.beams[0]?.weight).toBe(1);
    const c = parseCaseText(demoCaseText);
    expect(c.ok && r.value.beams[0]?.case).toEqual(c.ok ? c.value : null);
  });

  it('serializePlan then parsePlanText returns the same plan', () => {
    const r = validatePlan(planDoc);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    const again = parsePlanText(serializePlan(r.value));
    expect(again).toEqual(r);
    const lifted = planOfCase(r.value.beams[0]!.case);
    expect(parsePlanText(serializePlan(lifted))).toEqual({ ok: true, value: lifted });
  });

  it('validatePlan(...) reports a bad embedded case by its full field path', () => {
    const bad = structuredClone(planDoc);
    bad.beams[1]!.case.layers[0]!.thicknessCm = -1;
    const r = validatePlan(bad);
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.problems).toContainEqual({
      path: 'beams[1].case.layers[0].thicknessCm',
      message: 'thickness must be > 0 cm',
    });
  });

  it('validatePlan(...) rejects duplicate beam ids, zero total weight and an unknown prescription point', () => {
    const dup = { ...planDoc, beams: [planDoc.beams[0], planDoc.beams[0]] };
    const r1 = validatePlan(dup);
    expect(!r1.ok && r1.problems.map((p) => p.path)).toContain('beams[1].id');
    const zero = { ...planDoc, beams: planDoc.beams.map((b) => ({ ...b, weight: 0 })) };
    const r2 = validatePlan(zero);
    expect(!r2.ok && r2.problems.map((p) => p.path)).toContain('beams');
    const rx = { ...planDoc, prescription: { pointId: 'nowhere', doseCGy: 200 } };
    const r3 = validatePlan(rx);
    expect(!r3.ok && r3.problems.map((p) => p.path)).toEqual(['prescription.pointId']);
    const fmt = validatePlan({ ...planDoc, format: 'other' });
    expect(!fmt.ok && fmt.problems.map((p) => p.path)).toContain('format');
  });

  it('validatePlan(...) rejects an unknown check method, as the command line does (it fell back silently)', () => {
    const r = validatePlan({ ...planDoc, checkMethodId: 'nonsense' });
    expect(!r.ok && r.problems[0]).toEqual({
      path: 'checkMethodId',
      message:
        'unknown method (expected one of water, rtmr, epl-pdd, batho, batho-modified, etar, pencil-beam, superposition, monte-carlo)',
    });
    expect(validatePlan({ ...planDoc, checkMethodId: 'etar' }).ok).toBe(true);
  });

  it('every demo in public/cases/ is listed in its index and opens as a valid case or plan', () => {
    const index = JSON.parse(readFileSync('public/cases/index.json', 'utf8')) as {
      demos: { file: string; kind: 'case' | 'plan' }[];
    };
    const files = readdirSync('public/cases').filter(
      (f) => f.endsWith('.json') && f !== 'index.json',
    );
    expect(index.demos.map((d) => d.file).sort()).toEqual(files.sort());
    for (const d of index.demos) {
      const raw = JSON.parse(readFileSync(`public/cases/${d.file}`, 'utf8')) as { format: string };
      expect(raw.format, d.file).toBe(`lamina.${d.kind}`);
      const r = validatePlan(raw);
      expect(r.ok ? [] : r.problems, d.file).toEqual([]);
    }
  });
});
