// The multi-beam plan file under generated input: every document either reads as a plan that
// saves and re-reads unchanged and calculates with no NaN/Infinity, or is rejected with problems
// naming a field path (embedded case problems under "beams[i].case…").
import { readFileSync } from 'node:fs';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { calculatePlan } from '../../src/compute/calculatePlan';
import { buildMeasuredWaterData } from '../../src/engine/beam/measuredTable';
import { parsePlanText, serializePlan, validatePlan } from '../../src/io/planFile';
import { firstNonFinite } from '../helpers/allFinite';
import { malformedPlan, validPlan } from './generators/planArbitraries';

const table = {
  kind: 'tmr' as const,
  fileName: 'demo-6mv-tmr.csv',
  csv: readFileSync('public/tables/demo-6mv-tmr.csv', 'utf8'),
  scatterFileName: 'demo-6mv-scatter.csv',
  scatterCsv: readFileSync('public/tables/demo-6mv-scatter.csv', 'utf8'),
};
const demoTable = buildMeasuredWaterData(table);
if (!demoTable.ok) throw new Error(demoTable.problems.join('\n'));

describe('plan files under generated input (read → check → report)', () => {
  it('reads or rejects every document with named fields, and calculates what it reads (10 000 documents)', () => {
    const seen = { valid: 0, rejected: 0, calculated: 0 };
    fc.assert(
      fc.property(
        fc.oneof({ arbitrary: validPlan, weight: 1 }, { arbitrary: malformedPlan, weight: 2 }),
        (raw) => {
          const r = validatePlan(raw);
          if (!r.ok) {
            seen.rejected++;
            if (r.problems.length === 0) throw new Error('rejected with no problem');
            for (const p of r.problems)
              if (!p.path || !p.message) throw new Error(`unnamed problem ${JSON.stringify(p)}`);
            return;
          }
          seen.valid++;
          const again = parsePlanText(serializePlan(r.value));
          if (!again.ok) throw new Error(`saved plan does not re-read: ${JSON.stringify(again)}`);
          expect(again.value).toEqual(r.value);
          // Every 16th plan goes through the calculation and the point check (type-A Batho with
          // the demo table: the check's MU and differences read its dose per MU).
          if (seen.valid % 16 === 0) {
            seen.calculated++;
            const report = calculatePlan(r.value, {
              water: { kind: 'table', table },
              methods: ['water', 'batho'],
              depthStepCm: 2,
            });
            const bad = firstNonFinite(report);
            if (bad) throw new Error(`plan report value at ${bad} is not finite`);
          }
        },
      ),
      { numRuns: 10_000, seed: 20261206 },
    );
    expect(seen.valid).toBeGreaterThan(1500);
    expect(seen.rejected).toBeGreaterThan(3000);
    expect(seen.calculated).toBeGreaterThan(100);
  });

  it('names the embedded case field when a beam carries a broken case', () => {
    fc.assert(
      fc.property(validPlan, fc.constantFrom(-1, 0, NaN, 'x'), (plan, bad) => {
        const copy = structuredClone(plan);
        (
          copy.beams[0] as { case: { layers: { thicknessCm: unknown }[] } }
        ).case.layers[0]!.thicknessCm = bad;
        const r = validatePlan(copy);
        expect(r.ok).toBe(false);
        if (!r.ok)
          expect(r.problems.map((p) => p.path)).toContain('beams[0].case.layers[0].thicknessCm');
      }),
      { numRuns: 300, seed: 5 },
    );
  });
});
