// The contaminant-electron term of the modelled beams: its form, scaling and stored fit.
import { describe, expect, it } from 'vitest';
import {
  CONTAMINANT_ELECTRONS,
  contaminantElectronDose,
  contaminantElectronModel,
  contaminantFieldFactor,
} from '../../../src/engine/beam/contaminantElectrons';
import { BEAM_ENERGIES } from '../../../src/engine/beam/energies';
import { makeSlabPhantom, waterPhantom } from '../../../src/engine/phantom/slabPhantom';
import { maximumOnGrid } from '../../../src/engine/superposition/typeBDose';
import { expectAbsClose, expectRelClose } from '../../helpers/expectClose';

const model = { surfaceFraction10: 0.1, depthCoefficientCm2PerG: 0.5, fieldLengthCm: 40 };
const beam = { ssdCm: 100, fieldXCm: 10, fieldYCm: 10 };

describe('contaminantElectronDose', () => {
  it('is R·c₁₀·g(s)·exp(−κd)·(100/(SSD + d))² on the axis of a water phantom', () => {
    // Derived: the form stated in contaminantElectrons.ts.
    const d = contaminantElectronDose(model, waterPhantom(20), beam, 10, 2, [0, 4], [0]);
    expectRelClose(d[0] as number, 2 * 0.1, 1e-12);
    expectRelClose(d[1] as number, 2 * 0.1 * Math.exp(-2) * (100 / 104) ** 2, 1e-12);
  });

  it('runs on radiological depth: behind 8 cm of ρ 0.25 it equals 2 cm of water', () => {
    const lung = makeSlabPhantom([
      { materialId: 'water', thicknessCm: 8, densityGPerCm3: 0.25 },
      { materialId: 'water', thicknessCm: 10 },
    ]);
    const behind = contaminantElectronDose(model, lung, beam, 10, 1, [8 + 1e-6], [0])[0] as number;
    const water = contaminantElectronDose(
      model,
      waterPhantom(20),
      beam,
      10,
      1,
      [2],
      [0],
    )[0] as number;
    // Only the inverse square differs (108 vs 102 cm from the source).
    expectRelClose(behind, water * (102 / 108) ** 2, 1e-6);
  });

  it('is 1 × the axis value inside a wide field and falls to half at its edge', () => {
    const d = contaminantElectronDose(
      model,
      waterPhantom(20),
      { ...beam, ssdCm: Infinity },
      10,
      1,
      [1],
      [0, 2, 5, 8],
    );
    expectRelClose(d[1] as number, d[0] as number, 1e-6);
    expectRelClose(d[2] as number, 0.5 * (d[0] as number), 1e-3);
    expect(d[3] as number).toBeLessThan(1e-6 * (d[0] as number));
  });

  it('g(s) is 1 at 10 × 10 and rises with field side', () => {
    expectAbsClose(contaminantFieldFactor(model, 10), 1, 1e-12);
    expect(contaminantFieldFactor(model, 5)).toBeLessThan(1);
    expect(contaminantFieldFactor(model, 20)).toBeGreaterThan(1);
  });
});

describe('the stored contaminant-electron fit', () => {
  it('has a positive surface fraction for every beam and a range that grows with energy', () => {
    let lastK = Infinity;
    for (const e of BEAM_ENERGIES) {
      const m = contaminantElectronModel(e);
      expect(m.surfaceFraction10).toBeGreaterThan(0);
      expect(m.depthCoefficientCm2PerG).toBeLessThan(lastK);
      lastK = m.depthCoefficientCm2PerG;
      expect(CONTAMINANT_ELECTRONS.beams[e].photonReferenceDoseCm2PerG).toBeGreaterThan(0);
    }
  });
});

describe('maximumOnGrid', () => {
  it('finds the vertex of a flat maximum under a ripple of 0.02 % in the slope', () => {
    // Derived: y = 1 − 0.003·(x − 3.17)² (flat to 0.3 % over ±1 cm, as at 15–18 MV) plus a
    // 0.2 cm sawtooth of ±1e-4 (the source-cell ripple); the largest sample sits on a ripple
    // tooth 0.02 cm away, where the three-point parabola of the largest sample lands.
    const xs = Array.from({ length: 201 }, (_, i) => i * 0.04);
    const ys = xs.map((x) => 1 - 0.003 * (x - 3.17) ** 2 + 2e-4 * (((x / 0.2) % 1) - 0.5));
    const m = maximumOnGrid(xs, ys);
    expectAbsClose(m.dMaxCm, 3.17, 0.01);
    expectAbsClose(m.rawDose, 1, 1e-4);
  });
});
