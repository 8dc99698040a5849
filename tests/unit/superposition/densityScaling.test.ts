import { describe, expect, it } from 'vitest';
import {
  densityScaledKernel,
  meanDensityBetween,
} from '../../../src/engine/superposition/densityScaling';
import { makeSlabPhantom, radiologicalDepthCm } from '../../../src/engine/phantom/slabPhantom';
import { expectRelClose } from '../../helpers/expectClose';

// An analytic water kernel used only as a fixture (two exponentials over r², forward-peaked).
const fixtureKernel = (r: number, theta: number) =>
  ((1 + Math.cos(theta)) * Math.exp(-3 * r) + 0.05 * Math.exp(-0.1 * r)) / (r * r);

describe('densityScaledKernel', () => {
  it('returns ρ³·h_w(ρ|x|) in a uniform medium of density ρ (O’Connor scaling)', () => {
    for (const rho of [0.25, 1, 1.8]) {
      for (const [R, theta] of [
        [0.3, 0.1],
        [2, 1.2],
        [10, 2.9],
      ] as const) {
        const scaled = densityScaledKernel(fixtureKernel, rho, rho * R, R, theta);
        expectRelClose(scaled, rho ** 3 * fixtureKernel(rho * R, theta), 1e-12);
      }
    }
  });

  it('returns the water kernel itself for ρ ≡ 1', () => {
    expectRelClose(densityScaledKernel(fixtureKernel, 1, 2, 2, 0.4), fixtureKernel(2, 0.4), 1e-15);
  });
});

describe('meanDensityBetween', () => {
  it('is the radiological over the geometric separation across slabs', () => {
    const p = makeSlabPhantom([
      { materialId: 'water', thicknessCm: 5 },
      { materialId: 'water', thicknessCm: 10, densityGPerCm3: 0.25 },
      { materialId: 'water', thicknessCm: 5 },
    ]);
    // From 2 cm (water) to 12 cm (inside the ρ = 0.25 slab): 3 cm water + 7 cm at 0.25 = 4.75 cm.
    const rho = meanDensityBetween(radiologicalDepthCm(p, 12), radiologicalDepthCm(p, 2), 12, 2, 1);
    expectRelClose(rho, 4.75 / 10, 1e-12);
    expect(meanDensityBetween(3, 3, 7, 7, 0.25)).toBe(0.25);
  });
});
