import { describe, expect, it } from 'vitest';
import {
  cumulativeMassThicknessGPerCm2,
  layerIndexAtDepth,
  makeSlabPhantom,
  radiologicalDepthCm,
  radiologicalDistanceCm,
  type LayerSpec,
} from '../../../src/engine/phantom';
import { expectAbsClose } from '../../helpers/expectClose';

// "custom" layers have water composition, so their relative electron density equals the density
// entered; this reproduces the relative densities of the test phantoms exactly.
const slab = (thicknessCm: number, densityGPerCm3: number): LayerSpec => ({
  materialId: 'custom',
  thicknessCm,
  densityGPerCm3,
});

// Derived test phantoms (slab geometry, radiological depth d′ = Σ ρ_m ℓ_m):
// L = water 0–5 | lung ρ 0.25, 5–15 | water 15–30; B = water 0–3 | bone 1.8, 3–6 | water 6–20;
// G4 = water 0–3 | bone 1.8, 3–5 | lung 0.25, 5–12 | water 12–25.
const L = makeSlabPhantom([slab(5, 1), slab(10, 0.25), slab(15, 1)]);
const B = makeSlabPhantom([slab(3, 1), slab(3, 1.8), slab(14, 1)]);
const G4 = makeSlabPhantom([slab(3, 1), slab(2, 1.8), slab(7, 0.25), slab(13, 1)]);

describe('radiologicalDepthCm', () => {
  it.each([
    [5.5, 5.125],
    [6, 5.25],
    [10, 6.25],
    [14, 7.25],
    [15.2, 7.7],
    [16, 8.5],
    [20, 12.5],
    [25, 17.5],
  ])('gives d′ of phantom L at %s cm = %s cm', (d, expected) => {
    expectAbsClose(radiologicalDepthCm(L, d), expected, 1e-12);
  });

  it('gives d′ = 12.4 cm 4 cm beyond the bone of phantom B', () => {
    expectAbsClose(radiologicalDepthCm(B, 10), 12.4, 1e-12);
  });

  it('gives d′ = 12.35 cm at 16 cm in phantom G4', () => {
    expectAbsClose(radiologicalDepthCm(G4, 16), 12.35, 1e-12);
  });

  it('equals the geometric depth in water', () => {
    const w = makeSlabPhantom([{ materialId: 'water', thicknessCm: 30 }]);
    for (const d of [0, 0.3, 7.77, 30]) expect(radiologicalDepthCm(w, d)).toBeCloseTo(d, 12);
  });

  it('throws for depths outside the phantom', () => {
    expect(() => radiologicalDepthCm(L, -0.1)).toThrow(/outside the phantom/);
    expect(() => radiologicalDepthCm(L, 30.5)).toThrow(/outside the phantom/);
  });
});

describe('layerIndexAtDepth', () => {
  it('puts a point on an interface in the upstream layer', () => {
    expect(layerIndexAtDepth(L, 5)).toBe(0);
    expect(layerIndexAtDepth(L, 5 + 1e-6)).toBe(1);
    expect(layerIndexAtDepth(L, 15)).toBe(1);
    expect(layerIndexAtDepth(L, 0)).toBe(0);
    expect(layerIndexAtDepth(L, 30)).toBe(2);
  });
});

describe('cumulativeMassThicknessGPerCm2', () => {
  it('sums density × thickness', () => {
    // 3 g/cm² water + 1.8 × 3 bone + 4 g/cm² water = 12.4 g/cm² at 10 cm in B
    expectAbsClose(cumulativeMassThicknessGPerCm2(B, 10), 12.4, 1e-12);
  });
});

describe('radiologicalDistanceCm', () => {
  it('scales the straight-line length by the mean density along z', () => {
    // From 4 cm to 16 cm in L: Δz = 12, Δd′ = 8.5 − 4 = 4.5; lateral 5 cm → |r| = 13 → ℓ = 13·4.5/12
    expectAbsClose(radiologicalDistanceCm(L, 4, 16, 5), (13 * 4.5) / 12, 1e-12);
  });

  it('uses the layer density for a lateral line at one depth', () => {
    expectAbsClose(radiologicalDistanceCm(L, 10, 10, 4), 1, 1e-12);
  });

  it('is symmetric', () => {
    expectAbsClose(
      radiologicalDistanceCm(G4, 2, 20, 3),
      radiologicalDistanceCm(G4, 20, 2, 3),
      1e-12,
    );
  });
});

describe('makeSlabPhantom', () => {
  it('rejects non-positive thickness and density with the field named', () => {
    expect(() => makeSlabPhantom([slab(0, 1)])).toThrow(/layers\[0\]\.thicknessCm/);
    expect(() => makeSlabPhantom([slab(1, 1), slab(2, -1)])).toThrow(/layers\[1\]\.densityGPerCm3/);
    expect(() => makeSlabPhantom([])).toThrow(/at least one layer/);
  });
});
