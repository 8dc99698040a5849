// The worker side of the calculation contract: a purpose fixes grid and methods; the parts of a
// full calculation are reused across edits that do not change the physics (name, planning values),
// and the report is still that of the current case.
import { describe, expect, it } from 'vitest';
import { calculateCase } from '../../../src/compute/calculateCase';
import {
  calculateCaseRequest,
  calculatePlanRequest,
  FULL_DEPTH_STEP_CM,
} from '../../../src/compute/calculationService';
import { PREVIEW_DEPTH_STEP_CM, PREVIEW_METHOD_IDS } from '../../../src/compute/previewReport';
import { presetById } from '../../../src/state/presets';

const chest = () => presetById('chest')!.make();

describe('calculation service', () => {
  it('a prescription given with the request for a point no beam has is refused, naming it', () => {
    const c = chest();
    const ask = (pointId: string) =>
      calculatePlanRequest({
        purpose: 'plan',
        plan: c,
        water: { kind: 'case' },
        options: { methods: ['rtmr'], prescription: { pointId, doseCGy: 200 } },
      });
    expect(ask('NOPE')).toEqual({
      ok: false,
      problems: [{ path: 'prescription.pointId', message: 'no beam has a point "NOPE"' }],
    });
    expect(ask(c.points[0]!.id).ok).toBe(true);
  });

  it("purpose 'preview' computes the fast methods on the coarse grid, 'full' all on the fine grid", () => {
    const p = calculateCaseRequest({ purpose: 'preview', case: chest(), water: { kind: 'case' } });
    const f = calculateCaseRequest({ purpose: 'full', case: chest(), water: { kind: 'case' } });
    if (!p.ok || !f.ok) throw new Error('valid case');
    expect(p.report.methods.map((m) => m.id)).toEqual([...PREVIEW_METHOD_IDS]);
    expect(p.report.depthCm[1]).toBeCloseTo(PREVIEW_DEPTH_STEP_CM, 1);
    expect(f.report.methods.map((m) => m.id)).toContain('superposition');
    expect(f.report.depthCm[1]).toBeCloseTo(FULL_DEPTH_STEP_CM, 2);
  });

  it('an edit of the name and planning values gives the report of the edited case', () => {
    const a = chest();
    calculateCaseRequest({ purpose: 'full', case: a, water: { kind: 'case' } });
    const b = {
      ...chest(),
      name: 'renamed',
      points: a.points.map((p, i) => (i === 0 ? { ...p, planningDoseCGy: 200 } : p)),
    };
    const r = calculateCaseRequest({ purpose: 'full', case: b, water: { kind: 'case' } });
    if (!r.ok) throw new Error('valid case');
    expect(r.report).toEqual(calculateCase(b));
    const plan = calculatePlanRequest({ purpose: 'plan', plan: b, water: { kind: 'case' } });
    if (!plan.ok) throw new Error('valid plan');
    expect(plan.report.beams[0]!.report).toEqual(r.report);
    expect(plan.report.check.beams[0]!.points[0]!.planningDoseCGy).toBe(200);
  });

  it('returns problems, not a throw, for an invalid document or water table', () => {
    const bad = calculatePlanRequest({
      purpose: 'plan',
      plan: { format: 'x' },
      water: { kind: 'case' },
    });
    expect(bad.ok).toBe(false);
    const table = calculateCaseRequest({
      purpose: 'full',
      case: chest(),
      water: { kind: 'table', table: { kind: 'tmr', fileName: 't.csv', csv: 'nonsense' } },
    });
    expect(!table.ok && table.problems[0]!.path).toBe('waterTable');
  });
});
