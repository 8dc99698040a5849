import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { calculateCase } from '../../../src/compute/calculateCase';
import { calculatePlan, checkInputOf } from '../../../src/compute/calculatePlan';
import { parseCaseText } from '../../../src/io/caseFile';
import { PLAN_FORMAT, PLAN_VERSION } from '../../../src/io/planSchema';
import { expectRelClose } from '../../helpers/expectClose';

function demoCase() {
  const parsed = parseCaseText(readFileSync('public/cases/lung-slab-6mv.json', 'utf8'));
  if (!parsed.ok) throw new Error('demo case does not parse');
  // Planning values so the check compares: 200 cGy at P1 with 260 MU (invented numbers).
  return {
    ...parsed.value,
    beam: { ...parsed.value.beam, planningMu: 260 },
    points: parsed.value.points.map((p) => (p.id === 'P1' ? { ...p, planningDoseCGy: 200 } : p)),
  };
}

// A short fixed-seed run: the σ only has to be carried, not small.
const mc = { histories: 2000, seed: 4 };

describe('the check input of a report with a Monte Carlo result', () => {
  it('checkInputOf(...) carries the Monte Carlo σ of dose per MU and none for other methods', () => {
    const c = demoCase();
    const report = calculateCase(c, { methods: ['water', 'monte-carlo'], mc });
    const input = checkInputOf({ id: 'b1', label: 'b1', weight: 1 }, c, report);
    const mcIn = input.methods.find((m) => m.id === 'monte-carlo');
    const mcOut = report.methods.find((m) => m.id === 'monte-carlo');
    expect(mcIn?.points.map((p) => p.sigmaDosePerMuCGy)).toEqual(
      mcOut?.points.map((p) => p.sigmaDosePerMuCGy),
    );
    expect(mcIn?.points[0]?.sigmaDosePerMuCGy).toBeGreaterThan(0);
    const water = input.methods.find((m) => m.id === 'water');
    expect(water?.points.every((p) => !('sigmaDosePerMuCGy' in p))).toBe(true);
  });

  it('calculatePlan(...) with a Monte Carlo run gives its check σ_MU / MU = σ_(D/MU) / (D/MU)', () => {
    const c = demoCase();
    const r = calculatePlan(
      {
        format: PLAN_FORMAT,
        version: PLAN_VERSION,
        name: 'one beam',
        beams: [{ id: 'b1', weight: 1, case: c }],
        prescription: { pointId: 'P1', doseCGy: 200 },
      },
      { methods: ['monte-carlo'], mc },
    );
    const m = r.check.beams[0]?.points.find((p) => p.pointId === 'P1')?.methods[0];
    expect(m?.methodId).toBe('monte-carlo');
    const rel = (m?.sigma?.dosePerMuCGy as number) / (m?.dosePerMuCGy as number);
    // First-order propagation is exact arithmetic here: round-off only.
    expectRelClose((m?.sigma?.mu as number) / (m?.mu as number), rel, 1e-12);
    expectRelClose(m?.sigma?.doseCGy as number, 260 * (m?.sigma?.dosePerMuCGy as number), 1e-12);
    expect(['pass', 'fail', 'uncertain']).toContain(m?.verdict);
  });
});
