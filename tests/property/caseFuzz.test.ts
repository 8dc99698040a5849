import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { validateCase } from '../../src/io/caseFile';
import { calculateCase } from '../../src/compute/calculateCase';
import { readFileSync } from 'node:fs';
import { buildMeasuredWaterData } from '../../src/engine/beam/measuredTable';
import { TYPE_A_METHOD_IDS } from '../../src/engine/corrections/typeAMethods';
import { TYPE_B_METHOD_IDS } from '../../src/compute/typeBForCase';
import { firstNonFinite as allFinite } from '../helpers/allFinite';
import { malformedCase, validCase } from './generators/caseArbitraries';

// The demo TMR table (invented data) so the type-A methods run too, not only the kernel methods.
const demoTable = buildMeasuredWaterData({
  kind: 'tmr',
  fileName: 'demo-6mv-tmr.csv',
  csv: readFileSync('public/tables/demo-6mv-tmr.csv', 'utf8'),
  scatterFileName: 'demo-6mv-scatter.csv',
  scatterCsv: readFileSync('public/tables/demo-6mv-scatter.csv', 'utf8'),
});
if (!demoTable.ok) throw new Error(demoTable.problems.join('\n'));
const waterData = demoTable.waterData;

// Each valid case runs one method, in turn, so every method meets thousands of generated
// geometries while the suite stays fast (all methods at once cost ~0.1 s per case).
const METHOD_IDS = [...TYPE_A_METHOD_IDS, ...TYPE_B_METHOD_IDS];

describe('case pipeline under generated input (parse → engine → report)', () => {
  it('either computes a report with no NaN/Infinity or rejects with a named field (10 000 inputs)', () => {
    let valid = 0;
    let rejected = 0;
    fc.assert(
      fc.property(
        // One valid case for two malformed ones: a valid case costs ~3 ms (warnings + method).
        fc.oneof({ arbitrary: validCase, weight: 1 }, { arbitrary: malformedCase, weight: 2 }),
        (raw) => {
          const r = validateCase(raw);
          if (!r.ok) {
            rejected++;
            expect(r.problems.length).toBeGreaterThan(0);
            for (const p of r.problems) {
              expect(p.path.length).toBeGreaterThan(0);
              expect(p.message.length).toBeGreaterThan(0);
            }
            return;
          }
          const method = METHOD_IDS[valid % METHOD_IDS.length] as string;
          valid++;
          const report = calculateCase(r.value, { depthStepCm: 1, waterData, methods: [method] });
          if (report.methods.length !== 1) throw new Error(`${method} gave no result`);
          const bad = allFinite(report);
          if (bad) throw new Error(`${method}: ${bad} is not finite`);
        },
      ),
      { numRuns: 10_000, seed: 20261201 },
    );
    // Both branches must really be exercised.
    expect(valid).toBeGreaterThan(1000);
    expect(rejected).toBeGreaterThan(1000);
  });

  it('accepts every generated valid case', () => {
    fc.assert(
      fc.property(validCase, (raw) => {
        const r = validateCase(raw);
        if (!r.ok) throw new Error(JSON.stringify(r.problems));
      }),
      { numRuns: 500, seed: 7 },
    );
  });
});
