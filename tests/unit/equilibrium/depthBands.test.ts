import { describe, expect, it } from 'vitest';
import {
  bandsWhere,
  clipToPhantom,
  depthAfterWaterEquivalentCm,
  depthAtRadiologicalDepthCm,
  pointIdsInBand,
} from '../../../src/engine/equilibrium/depthBands';
import { makeSlabPhantom, radiologicalDepthCm } from '../../../src/engine/phantom/slabPhantom';
import { expectAbsClose } from '../../helpers/expectClose';

// Lung at ρ_e exactly 0.25: mass density 0.25·(Z/A)_water/(Z/A)_lung with NIST SRD 126 Z/A values.
const LUNG_025 = (0.25 * 0.55508) / 0.55048;
const phantomL = makeSlabPhantom([
  { materialId: 'water', thicknessCm: 5 },
  { materialId: 'lung', thicknessCm: 10, densityGPerCm3: LUNG_025 },
  { materialId: 'water', thicknessCm: 15 },
]);

describe('depthAtRadiologicalDepthCm', () => {
  it('depthAtRadiologicalDepthCm inverts radiologicalDepthCm in every layer', () => {
    for (const z of [0, 1, 5, 5.5, 9, 15, 15.2, 29.9]) {
      // Tolerance: round-off only.
      expectAbsClose(
        depthAtRadiologicalDepthCm(phantomL, radiologicalDepthCm(phantomL, z)),
        z,
        1e-9,
      );
    }
  });

  it('depthAtRadiologicalDepthCm returns 0 at or above the surface and the bottom beyond it', () => {
    expect(depthAtRadiologicalDepthCm(phantomL, -1)).toBe(0);
    expect(depthAtRadiologicalDepthCm(phantomL, 100)).toBe(30);
  });

  it('depthAfterWaterEquivalentCm crosses 1.5 cm water-equivalent in 6 cm of ρ 0.25 lung', () => {
    // Derived: 1.5 cm / 0.25 = 6 cm.
    expectAbsClose(depthAfterWaterEquivalentCm(phantomL, 5, 1.5), 11, 1e-9);
  });
});

describe('bandsWhere', () => {
  it('bandsWhere finds the interval where a condition holds to 1e-6 cm', () => {
    const bands = bandsWhere(phantomL, (z) => z > 2.345 && z < 7.891);
    expect(bands).toHaveLength(1);
    // Tolerance: bisection stops at 1e-7 cm.
    expectAbsClose(bands[0]?.fromCm ?? NaN, 2.345, 1e-6);
    expectAbsClose(bands[0]?.toCm ?? NaN, 7.891, 1e-6);
  });

  it('bandsWhere returns two bands for two separate intervals and none for a false condition', () => {
    expect(bandsWhere(phantomL, (z) => z < 1 || z > 29)).toHaveLength(2);
    expect(bandsWhere(phantomL, () => false)).toHaveLength(0);
  });

  it('bandsWhere snaps an edge that falls on an interface onto the interface', () => {
    const bands = bandsWhere(phantomL, (z) => z > 5 && z <= 15);
    expect(bands[0]?.fromCm).toBe(5);
    expect(bands[0]?.toCm).toBe(15);
  });
});

describe('clipToPhantom and pointIdsInBand', () => {
  it('clipToPhantom keeps a band inside the phantom and drops one outside', () => {
    expect(clipToPhantom(phantomL, { fromCm: -2, toCm: 40 })).toEqual({ fromCm: 0, toCm: 30 });
    expect(clipToPhantom(phantomL, { fromCm: 31, toCm: 40 })).toBeNull();
  });

  it('pointIdsInBand lists the points inside the band, ends included', () => {
    const pts = [
      { id: 'a', depthCm: 5 },
      { id: 'b', depthCm: 8 },
      { id: 'c', depthCm: 12 },
    ];
    expect(pointIdsInBand(pts, { fromCm: 5, toCm: 8 })).toEqual(['a', 'b']);
  });
});
