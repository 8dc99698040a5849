// The wording of validation messages under generated input: whatever is broken in a case, a plan
// or a water table, each message reads cleanly. It never repeats its own field as a prefix
// ("layers: layers: …"), never shows a range built from an invalid value ("(0–-5.00 cm)",
// "(0–0.00 cm)"), and never shows NaN, Infinity, undefined or an object's default text.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { buildMeasuredWaterData } from '../../src/engine/beam/measuredTable';
import { validateCase } from '../../src/io/caseFile';
import { validatePlan } from '../../src/io/planFile';
import { malformedCase, validCase } from './generators/caseArbitraries';
import { brokenTable, inputOf } from './generators/measuredTableArbitraries';
import { malformedPlan } from './generators/planArbitraries';

/** What is wrong with the wording of one message at one field path, or null. */
export function wordingProblem(path: string, message: string): string | null {
  const last =
    path
      .replace(/\[\d+\]/g, '')
      .split('.')
      .pop() ?? '';
  if (message.trim() === '') return 'empty';
  if (message !== message.trim()) return 'leading or trailing space';
  // What the user typed is quoted as typed ("-Infinity" is not a number): only our own words count.
  const ours = message.replace(/"[^"]*"/g, '""');
  if (/\bNaN\b|Infinity|undefined|\[object Object\]/.test(ours)) return 'non-number text';
  if (/–-|\(0–0(\.0+)? cm\)/.test(message)) return 'range built from an invalid value';
  if (last && message.startsWith(`${last}:`)) return `repeats its field "${last}:"`;
  if (message.startsWith(`${path}:`)) return 'repeats its path';
  if (/: :|\s{2}/.test(ours)) return 'doubled separator or space';
  return null;
}

/** Several rules of a valid case broken at once (layers emptied, thicknesses negative, …). */
const manyBreaks = fc
  .tuple(
    validCase,
    fc.array(fc.integer({ min: 0, max: 6 }), { minLength: 1, maxLength: 3 }),
    fc.oneof(fc.double({ min: -50, max: 200 }), fc.constantFrom(0, -0, -5, 1e308, 5e-324)),
  )
  .map(([c, ks, v]) => {
    const copy = structuredClone(c) as any;
    for (const k of ks) {
      if (k === 0) copy.layers = [];
      if (k === 1) for (const l of copy.layers) l.thicknessCm = v;
      if (k === 2)
        copy.points = [
          { id: 'P', depthCm: v },
          { id: 'P', depthCm: 1 },
        ];
      if (k === 3) copy.beam.setup = { kind: 'SAD', sadCm: 100, isocentreDepthCm: v };
      if (k === 4)
        copy.layers = Array.from({ length: 60 }, () => ({ materialId: 'water', thicknessCm: v }));
      if (k === 5) copy.layers[0] = { materialId: 'lung', thicknessCm: v, densityGPerCm3: v };
      if (k === 6) copy.points = 'P1';
    }
    return copy as unknown;
  });

describe('validation messages read cleanly', () => {
  it('wordingProblem(...) catches the patterns it is for', () => {
    expect(wordingProblem('layers', 'layers: at least one layer is needed')).toMatch(/repeats/);
    expect(
      wordingProblem('points[0].depthCm', 'depth 10 cm is outside the phantom (0–-5.00 cm)'),
    ).toMatch(/range/);
    expect(
      wordingProblem('points[0].depthCm', 'depth 10 cm is outside the phantom (0–0.00 cm)'),
    ).toMatch(/range/);
    expect(wordingProblem('layers[0].thicknessCm', 'thickness must be > 0 cm')).toBeNull();
  });

  it('case files: every message of 5 000 broken cases', () => {
    fc.assert(
      fc.property(fc.oneof(malformedCase, manyBreaks), (raw) => {
        const r = validateCase(raw);
        if (r.ok) return;
        for (const p of r.problems)
          expect(wordingProblem(p.path, p.message), `${p.path}: ${p.message}`).toBeNull();
      }),
      { numRuns: 5000, seed: 15 },
    );
  });

  it('plan files: every message of 2 000 broken plans', () => {
    fc.assert(
      fc.property(malformedPlan, (raw) => {
        const r = validatePlan(raw);
        if (r.ok) return;
        for (const p of r.problems)
          expect(wordingProblem(p.path, p.message), `${p.path}: ${p.message}`).toBeNull();
      }),
      { numRuns: 2000, seed: 15 },
    );
  });

  it('water tables: every message of 2 000 broken tables', () => {
    fc.assert(
      fc.property(brokenTable, (b) => {
        const r = buildMeasuredWaterData(inputOf(b.spec));
        if (r.ok) return;
        for (const m of r.problems) expect(wordingProblem('csv', m), m).toBeNull();
      }),
      { numRuns: 2000, seed: 15 },
    );
  });
});
