import { describe, expect, it } from 'vitest';
import { calculateCase } from '../../../src/compute/calculateCase';
import { knotDepthsCm, knotInterpolatedWeights } from '../../../src/compute/etarKnotWeights';
import {
  PREVIEW_DEPTH_STEP_CM,
  PREVIEW_ETAR_KNOT_STEP_CM,
} from '../../../src/compute/previewReport';
import { validateCase } from '../../../src/io/caseFile';
import { makeSlabPhantom } from '../../../src/engine/phantom/slabPhantom';
import { PRESETS } from '../../../src/state/presets';
import { expectRelClose } from '../../helpers/expectClose';
import { modelledWaterData } from '../../../src/engine/beam/modelledBeam';

describe('knotDepthsCm', () => {
  it('holds the surface, every interface and the bottom, with no gap wider than the step', () => {
    const phantom = makeSlabPhantom([
      { materialId: 'softTissue', thicknessCm: 3 },
      { materialId: 'lung', thicknessCm: 8 },
      { materialId: 'softTissue', thicknessCm: 9 },
    ]);
    const d = knotDepthsCm(phantom, 2);
    for (const b of [0, 3, 11, 20]) expect(d.some((z) => Math.abs(z - b) < 1e-12)).toBe(true);
    for (let i = 1; i < d.length; i++) {
      expect(d[i]! - d[i - 1]!).toBeGreaterThan(0);
      expect(d[i]! - d[i - 1]!).toBeLessThanOrEqual(2 + 1e-12);
    }
  });
});

describe('knotInterpolatedWeights', () => {
  const phantom = makeSlabPhantom([
    { materialId: 'softTissue', thicknessCm: 4 },
    { materialId: 'lung', thicknessCm: 6 },
  ]);
  // A stand-in weight function, linear in depth and side, so interpolation must reproduce it.
  const calls: number[] = [];
  const linear = (_p: unknown, z: number, side: number) => {
    calls.push(z);
    return Float64Array.from([0.1 * z + 0.01 * side, 1 - 0.1 * z - 0.01 * side]);
  };

  it('reproduces weights linear in depth between knots and evaluates each knot once', () => {
    const ssdCm = 100;
    const w = knotInterpolatedWeights(linear, ssdCm, 2);
    for (const z of [0.5, 3.3, 4, 7.7, 10]) {
      const side = (10 * (ssdCm + z)) / 100;
      const got = w(phantom, z, side);
      // side is linear in z too, so the knot interpolation is exact up to rounding.
      expectRelClose(got[0]!, 0.1 * z + 0.01 * side, 1e-12);
    }
    expect(new Set(calls).size).toBe(calls.length);
  });
});

describe('ETAR with knot-interpolated weights (drag preview)', () => {
  it('stays within 0.5 % of the exact-weight CF on every preset (1 % in the build-up)', () => {
    const dMaxCm = modelledWaterData('6MV').dMaxCm; // every preset is 6 MV
    for (const preset of PRESETS) {
      const v = validateCase(preset.make());
      if (!v.ok) throw new Error(`preset ${preset.id} does not validate`);
      const opts = { methods: ['etar'], depthStepCm: PREVIEW_DEPTH_STEP_CM };
      const exact = calculateCase(v.value, opts).methods[0]!;
      const approx = calculateCase(v.value, {
        ...opts,
        typeA: { etarKnotStepCm: PREVIEW_ETAR_KNOT_STEP_CM },
      }).methods[0]!;
      expect(approx.variant).toContain('interpolated (preview)');
      exact.curve.cf.forEach((e, i) => {
        const a = approx.curve.cf[i];
        if (e === null || a === null || a === undefined) {
          expect(a ?? null).toBe(e);
          return;
        }
        // Preview only: beyond d_max measured worst 0.32 % (rib); 0.5 % keeps it below a pixel
        // on the chart. In the build-up the modelled TMR carries the contaminant electrons' field
        // dependence (surface dose 9 % at 5 × 5, 27 % at 20 × 20, 6 MV), so an error in ρ̃ counts
        // more there: worst 0.81 % (sinus, 0.2 cm); 1 % there.
        expectRelClose(a, e, exact.curve.depthCm[i]! < dMaxCm ? 1e-2 : 5e-3);
      });
    }
  });
});
