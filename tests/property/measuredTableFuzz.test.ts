// The measured water-table import under generated input: a valid table becomes WaterData whose
// look-ups (inside and far outside the table) and a case calculation with it are finite
// everywhere; a broken table is rejected with problems, and a broken cell or row is named by its
// file line.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { buildMeasuredWaterData } from '../../src/engine/beam/measuredTable';
import { calculateCase } from '../../src/compute/calculateCase';
import { TYPE_A_METHOD_IDS } from '../../src/engine/corrections/typeAMethods';
import { validateCase } from '../../src/io/caseFile';
import { firstNonFinite } from '../helpers/allFinite';
import { validCase } from './generators/caseArbitraries';
import {
  brokenTable,
  inputOf,
  randomTableText,
  renderTable,
  validTableSpec,
} from './generators/measuredTableArbitraries';

const lookupPoint = fc.record({
  // Far outside any table on purpose: look-ups clamp, they never return NaN.
  depthCm: fc.double({ min: -5, max: 200, noNaN: true }),
  sideCm: fc.double({ min: 0.1, max: 200, noNaN: true }),
});

describe('measured water-table import under generated input', () => {
  it('a valid table gives WaterData with finite look-ups everywhere (10 000 tables)', () => {
    let pdd = 0;
    fc.assert(
      fc.property(
        validTableSpec,
        fc.array(lookupPoint, { minLength: 1, maxLength: 4 }),
        (spec, pts) => {
          const r = buildMeasuredWaterData(inputOf(spec));
          if (!r.ok) throw new Error(`valid table rejected: ${r.problems.join(' | ')}`);
          if (spec.kind === 'pdd') pdd++;
          const w = r.waterData;
          // Plain checks in this hot loop (an expect() per value would dominate the run time).
          if (!Number.isFinite(w.dMaxCm)) throw new Error(`d_max ${w.dMaxCm}`);
          for (const { depthCm, sideCm } of pts) {
            const values = [w.tmr(depthCm, sideCm), w.sp(sideCm), w.sc(sideCm), w.psf(sideCm)];
            if (!values.every(Number.isFinite))
              throw new Error(`look-ups at (${depthCm}, ${sideCm}) cm: ${values.join(', ')}`);
          }
          const bad = firstNonFinite(r.summary.tmrGrid);
          if (bad) throw new Error(`TMR grid value at ${bad} is not finite`);
        },
      ),
      { numRuns: 10_000, seed: 20261202 },
    );
    // Both kinds of table must really be exercised.
    expect(pdd).toBeGreaterThan(2000);
  });

  it('a case calculated with a generated table has no NaN/Infinity in its report (200 cases)', () => {
    fc.assert(
      fc.property(validTableSpec, validCase, (spec, raw) => {
        const r = buildMeasuredWaterData(inputOf(spec));
        if (!r.ok) throw new Error(r.problems.join(' | '));
        const c = validateCase(raw);
        if (!c.ok) throw new Error(JSON.stringify(c.problems));
        // Type-A methods only: they are the ones that read the table (type B uses its own kernels).
        const report = calculateCase(c.value, {
          waterData: r.waterData,
          methods: TYPE_A_METHOD_IDS,
          depthStepCm: 1,
        });
        expect(report.methods.length).toBe(TYPE_A_METHOD_IDS.length);
        expect(firstNonFinite(report)).toBeNull();
      }),
      { numRuns: 200, seed: 11 },
    );
  });

  it('a broken table is rejected, naming the line of the broken cell or row (10 000 tables)', () => {
    const seen = { cell: 0, ragged: 0, other: 0 };
    fc.assert(
      fc.property(brokenTable, (b) => {
        seen[b.kind]++;
        const r = buildMeasuredWaterData(inputOf(b.spec));
        if (r.ok)
          throw new Error(`broken table accepted: ${JSON.stringify(renderTable(b.spec).csv)}`);
        expect(r.problems.length).toBeGreaterThan(0);
        for (const p of r.problems) expect(p.length).toBeGreaterThan(0);
        if (b.kind !== 'other') {
          const named = r.problems.some((p) => p.includes(`row ${b.line}`));
          expect(named, `no problem names row ${b.line}: ${r.problems.join(' | ')}`).toBe(true);
        }
        if (b.kind === 'cell')
          expect(r.problems.some((p) => /row \d+, column \d+ \([A-Z]+\)/.test(p))).toBe(true);
      }),
      { numRuns: 10_000, seed: 20261203 },
    );
    expect(seen.cell).toBeGreaterThan(1000);
    expect(seen.ragged).toBeGreaterThan(500);
    expect(seen.other).toBeGreaterThan(500);
  });

  it('arbitrary text either imports with finite look-ups or is rejected with problems (10 000 texts)', () => {
    fc.assert(
      fc.property(fc.constantFrom<'tmr' | 'pdd'>('tmr', 'pdd'), randomTableText, (kind, csv) => {
        const r = buildMeasuredWaterData({ kind, fileName: 'pasted.csv', csv, ssdCm: 100 });
        if (!r.ok) {
          expect(r.problems.length).toBeGreaterThan(0);
          for (const p of r.problems) expect(p.startsWith('pasted.csv: ')).toBe(true);
          return;
        }
        for (const d of [0, r.waterData.dMaxCm, 10, 100])
          for (const s of [1, 10, 100]) expect(Number.isFinite(r.waterData.tmr(d, s))).toBe(true);
      }),
      { numRuns: 10_000, seed: 20261204 },
    );
  });
});
