// Profiles to slabs. Check values are derived from the stated profiles (exact step positions and
// levels); the invariant that merging keeps ρe·thickness (so the radiological depth at every slab
// boundary equals the profile's) is checked by fast-check.
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { DEFAULT_SEGMENTATION, segmentProfile } from '../../../src/dicom/segmentation';

/** A profile sampled every 0.05 cm from a function of depth. */
function sampled(totalCm: number, f: (z: number) => number) {
  const n = Math.round(totalCm / 0.05);
  const edges = Float64Array.from({ length: n + 1 }, (_, i) => i * 0.05);
  const rho = Float64Array.from({ length: n }, (_, i) => f((i + 0.5) * 0.05));
  return { edges, rho };
}

const steps = (layers: [number, number][]) => (z: number) => {
  let top = 0;
  for (const [t, r] of layers) {
    if (z < top + t) return r;
    top += t;
  }
  return layers[layers.length - 1]![1];
};

describe('segmentProfile', () => {
  it('finds the slabs of a sharp step profile exactly', () => {
    const { edges, rho } = sampled(
      15,
      steps([
        [3, 1],
        [6, 0.26],
        [6, 1.7],
      ]),
    );
    const runs = segmentProfile(edges, rho, DEFAULT_SEGMENTATION);
    expect(runs.map((r) => Number(r.thicknessCm.toFixed(6)))).toEqual([3, 6, 6]);
    expect(runs.map((r) => Number(r.rhoE.toFixed(6)))).toEqual([1, 0.26, 1.7]);
  });

  it('puts a blurred interface (linear ramp over 0.4 cm) at its middle', () => {
    const f = (z: number) => (z < 4.8 ? 1 : z > 5.2 ? 0.3 : 1 - ((z - 4.8) / 0.4) * 0.7);
    const { edges, rho } = sampled(10, f);
    const runs = segmentProfile(edges, rho, DEFAULT_SEGMENTATION);
    expect(runs).toHaveLength(2);
    expect(Math.abs(runs[0]!.thicknessCm - 5)).toBeLessThan(0.03);
  });

  it('merges a run thinner than the minimum into the neighbour closest in ρe', () => {
    const { edges, rho } = sampled(
      10,
      steps([
        [4, 1],
        [0.2, 1.8],
        [1, 0.3],
        [4.8, 0.3],
      ]),
    );
    const runs = segmentProfile(edges, rho, { ...DEFAULT_SEGMENTATION, minThicknessCm: 0.5 });
    expect(runs).toHaveLength(2);
    const minZero = segmentProfile(edges, rho, { ...DEFAULT_SEGMENTATION, minThicknessCm: 0.1 });
    expect(minZero).toHaveLength(3);
  });

  it('never gives more slabs than the maximum', () => {
    const { edges, rho } = sampled(20, (z) => (Math.floor(z) % 2 === 0 ? 1 : 0.3));
    expect(
      segmentProfile(edges, rho, { ...DEFAULT_SEGMENTATION, maxSlabs: 5 }).length,
    ).toBeLessThanOrEqual(5);
  });

  it('keeps the total radiological depth and the total thickness (any profile)', () => {
    fc.assert(
      fc.property(
        fc.array(
          fc.tuple(
            fc.double({ min: 0.05, max: 5, noNaN: true }),
            fc.double({ min: 0, max: 2, noNaN: true }),
          ),
          {
            minLength: 1,
            maxLength: 12,
          },
        ),
        fc.double({ min: 0, max: 0.3, noNaN: true }),
        fc.double({ min: 0, max: 2, noNaN: true }),
        (layers, similarity, minThickness) => {
          const total = layers.reduce((s, l) => s + l[0], 0);
          const { edges, rho } = sampled(
            Math.max(0.05, Math.round(total / 0.05) * 0.05),
            steps(layers),
          );
          const runs = segmentProfile(edges, rho, {
            similarityRhoE: similarity,
            minThicknessCm: minThickness,
            maxSlabs: 50,
          });
          let mass = 0;
          for (let i = 0; i < rho.length; i++) mass += rho[i]! * 0.05;
          const t = runs.reduce((s, r) => s + r.thicknessCm, 0);
          const m = runs.reduce((s, r) => s + r.thicknessCm * r.rhoE, 0);
          return (
            Math.abs(t - edges[edges.length - 1]!) < 1e-9 &&
            Math.abs(m - mass) < 1e-9 &&
            runs.every((r) => r.thicknessCm > 0)
          );
        },
      ),
    );
  });
});
