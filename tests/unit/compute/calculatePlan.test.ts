import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { calculatePlan } from '../../../src/compute/calculatePlan';
import { parsePlanText } from '../../../src/io/planFile';
import { expectRelClose } from '../../helpers/expectClose';

const parsed = parsePlanText(readFileSync('public/cases/opposed-pair-chest-6mv.plan.json', 'utf8'));
if (!parsed.ok) throw new Error('demo plan must be valid');
const plan = parsed.value;
const options = { methods: ['water', 'rtmr', 'batho-modified'], depthStepCm: 0.5 };

describe('calculatePlan', () => {
  it('calculatePlan(plan) sums at the isocentre exactly what the single-beam plans give', () => {
    const both = calculatePlan(plan, options);
    const singles = plan.beams.map((b) =>
      calculatePlan({ ...plan, beams: [b], prescription: undefined }, options),
    );
    expect(both.check.methods.map((m) => m.id)).toEqual(['water', 'rtmr', 'batho-modified']);
    both.check.methods.forEach((_m, k) => {
      const total = both.check.totals[0]?.methods[k]?.doseCGy as number;
      const sum = singles.reduce(
        (s, r) => s + (r.check.totals[0]?.methods[k]?.doseCGy as number),
        0,
      );
      // Same numbers added in the same order: only round-off can separate them.
      expectRelClose(total, sum, 1e-12);
    });
    // Planning doses: 100 cGy per beam.
    expect(both.check.totals[0]?.planningDoseCGy).toBe(200);
  });

  it('calculatePlan(plan) splits the prescription by weight and gives MU = share / (dose per MU)', () => {
    const r = calculatePlan(plan, options);
    for (const b of r.check.beams) {
      const p = b.points[0];
      expect(p?.prescribedDoseCGy).toBe(100); // 200 cGy, weights 1 : 1
      const rtmr = p?.methods.find((m) => m.methodId === 'rtmr');
      expectRelClose(rtmr?.mu as number, 100 / (rtmr?.dosePerMuCGy as number), 1e-12);
    }
  });

  it('calculatePlan(plan) gives water factor chains that reproduce the water method', () => {
    const r = calculatePlan(plan, options);
    for (const b of r.beams) {
      const chain = b.waterChains.iso;
      const water = b.report.methods
        .find((m) => m.id === 'water')
        ?.points.find((p) => p.id === 'iso');
      expect(chain?.formula).toMatch(/D\/MU = /);
      // The water method and the chain evaluate the same formula: only round-off apart.
      expectRelClose(chain?.dosePerMuCGy as number, water?.dosePerMuCGy as number, 1e-12);
    }
  });

  it('calculatePlan(plan, {tolerances}) applies edited tolerances', () => {
    const tight = calculatePlan(plan, {
      ...options,
      tolerances: { homogeneousPercent: 0.1, heterogeneousPercent: 0.1 },
    });
    expect(tight.check.tolerances.heterogeneousPercent).toBe(0.1);
    expect(tight.check.verdict).toBe('fail'); // the demo planning values sit about 1 % away
    expect(calculatePlan(plan, options).check.verdict).toBe('pass');
  });
});
