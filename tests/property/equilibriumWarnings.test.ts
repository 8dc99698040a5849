// Property: for any valid slab phantom, beam and points, every warning lies inside the phantom,
// names at least one method, and has a stable unique id.
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { BEAM_ENERGIES } from '../../src/engine/beam/energies';
import { equilibriumWarnings, METHOD_IDS } from '../../src/engine/equilibrium';
import { MATERIAL_IDS } from '../../src/engine/materials/materialLibrary';
import { makeSlabPhantom } from '../../src/engine/phantom/slabPhantom';

const layerArb = fc.record({
  materialId: fc.constantFrom(...MATERIAL_IDS),
  thicknessCm: fc.double({ min: 0.1, max: 15, noNaN: true }),
  densityGPerCm3: fc.option(fc.double({ min: 0.001, max: 3, noNaN: true }), { nil: undefined }),
});

const caseArb = fc.record({
  layers: fc.array(layerArb, { minLength: 1, maxLength: 6 }),
  energy: fc.constantFrom(...BEAM_ENERGIES),
  ssdCm: fc.double({ min: 60, max: 120, noNaN: true }),
  fieldXCm: fc.double({ min: 1, max: 40, noNaN: true }),
  fieldYCm: fc.double({ min: 1, max: 40, noNaN: true }),
  pointFractions: fc.array(fc.double({ min: 0, max: 1, noNaN: true }), { maxLength: 4 }),
  extrapolationFractions: fc.array(fc.double({ min: 0, max: 1, noNaN: true }), { maxLength: 3 }),
});

describe('equilibriumWarnings properties', () => {
  it('equilibriumWarnings keeps every depth range inside the phantom and names at least one method', () => {
    fc.assert(
      fc.property(caseArb, (c) => {
        const phantom = makeSlabPhantom(c.layers);
        const total = phantom.totalThicknessCm;
        const ws = equilibriumWarnings({
          phantom,
          beam: { energy: c.energy, ssdCm: c.ssdCm, fieldXCm: c.fieldXCm, fieldYCm: c.fieldYCm },
          points: c.pointFractions.map((f, i) => ({ id: `P${i}`, depthCm: f * total })),
          extrapolations: c.extrapolationFractions.map((f) => ({
            methodId: 'rtmr',
            depthCm: f * total,
            quantity: 'depth' as const,
            requested: 45,
            clampedTo: 40,
          })),
        });
        for (const w of ws) {
          expect(w.depthRangeCm.fromCm).toBeGreaterThanOrEqual(0);
          expect(w.depthRangeCm.toCm).toBeLessThanOrEqual(total);
          expect(w.depthRangeCm.fromCm).toBeLessThanOrEqual(w.depthRangeCm.toCm);
          expect(w.methods.concerned.length).toBeGreaterThan(0);
          for (const id of [...w.methods.concerned, ...w.methods.approximate])
            expect(METHOD_IDS as readonly string[]).toContain(id);
          expect(w.numbers.length).toBeGreaterThan(0);
        }
        expect(new Set(ws.map((w) => w.id)).size).toBe(ws.length);
      }),
      { numRuns: 300, seed: 20261201 },
    );
  });
});
