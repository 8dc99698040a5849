// Type-B engines in water: against the Monte Carlo depth dose of the same beam, against each
// other, O'Connor's density-scaling theorem, and the dose-per-MU normalisation.
import { describe, expect, it } from 'vitest';
import mcReference from '../fixtures/mcWaterDepthDose.json';
import { waterPhantom, makeSlabPhantom } from '../../src/engine/phantom/slabPhantom';
import {
  referencePoint,
  typeBDosePerMu,
  typeBPhotonDose,
  typeBRawDose,
} from '../../src/engine/superposition/typeBDose';
import { beamSpectrum } from '../../src/engine/kernels/spectrum';
import type { BeamEnergy } from '../../src/engine/beam/energies';
import { expectRelClose } from '../helpers/expectClose';

interface McCurve {
  edgesCm: number[];
  dose: number[];
  sigma: number[];
}
const MC = mcReference as unknown as {
  seed: number;
  histories: number;
  curves: Record<string, McCurve>;
};
const SSD100_10x10 = { ssdCm: 100, fieldXCm: 10, fieldYCm: 10 };

describe('superposition against the Monte Carlo water depth dose (10 × 10, SSD 100)', () => {
  // Reference: tests/fixtures/mcWaterDepthDose.json, written by scripts/generateMcReference.ts
  // with the project's Monte Carlo engine (seed and histories recorded in the file); both
  // include the beam's contaminant electrons (as particles in the Monte Carlo).
  it.each(['6MV', '18MV'] as BeamEnergy[])(
    '%s: depth dose relative to 10 cm agrees within 2 % beyond d_max',
    (energy) => {
      expect(MC.histories).toBeGreaterThanOrEqual(1_000_000);
      const c = MC.curves[energy]!;
      const centres = c.edgesCm
        .slice(0, -1)
        .map((a, i) => 0.5 * (a + (c.edgesCm[i + 1] as number)));
      const sup = typeBRawDose(
        'superposition',
        energy,
        waterPhantom(30),
        SSD100_10x10,
        centres,
        [0],
      );
      const dMax = referencePoint('superposition', energy).dMaxCm;
      // Normalise both at 10 cm (MC: mean of the 3 bins around 10 cm, σ ≈ 0.25 %).
      const i10 = centres.findIndex((z) => z > 10);
      const mean3 = (a: ArrayLike<number>) =>
        ((a[i10 - 1] as number) + (a[i10] as number) + (a[i10 + 1] as number)) / 3;
      const supAt10 = mean3(sup);
      const mcAt10 = mean3(c.dose);
      let compared = 0;
      for (let i = 0; i < centres.length; i++) {
        const z = centres[i] as number;
        if (z < dMax + 0.5 || z > 25) continue;
        const relSigma = (c.sigma[i] as number) / (c.dose[i] as number);
        // 2 %: the commissioning criterion for kernel engines in water (beyond d_max); the MC
        // bins have σ ≤ 0.7 %, so 2 % is ≥ 2.8σ of MC noise plus the kernels' own noise.
        expect(relSigma).toBeLessThan(0.007);
        expectRelClose((sup[i] as number) / supAt10, (c.dose[i] as number) / mcAt10, 0.02);
        compared++;
      }
      expect(compared).toBeGreaterThan(70);
    },
  );

  it('6 MV: absolute dose per photon fluence agrees within 2 % at 5–25 cm', () => {
    // Superposition gives dose per unit energy fluence; × mean photon energy (1.90 MeV for the
    // Mohan 6 MV bins, derived) × 1.602176634e-10 Gy per MeV/g gives Gy·cm² per photon.
    const c = MC.curves['6MV']!;
    const s = beamSpectrum('6MV');
    const meanMeV = s.energyMeV.reduce((a, e, i) => a + e * (s.photonFraction[i] as number), 0);
    const centres = c.edgesCm.slice(0, -1).map((a, i) => 0.5 * (a + (c.edgesCm[i + 1] as number)));
    const sup = typeBRawDose('superposition', '6MV', waterPhantom(30), SSD100_10x10, centres, [0]);
    for (let i = 0; i < centres.length; i++) {
      const z = centres[i] as number;
      if (z < 5 || z > 25) continue;
      // 2 %: same criterion, absolute; no normalisation at all.
      expectRelClose((sup[i] as number) * meanMeV * 1.602176634e-10, c.dose[i] as number, 0.02);
    }
  });
});

describe('pencil beam against superposition in water', () => {
  it.each([
    ['6MV', 10],
    ['18MV', 10],
    ['6MV', 5],
    ['18MV', 20],
  ] as [BeamEnergy, number][])(
    '%s, square field of %i cm at SSD 100: dose per MU agrees within 1 % beyond d_max',
    (energy, side) => {
      const depths = Array.from({ length: 50 }, (_, i) => 0.5 + i * 0.5);
      const beam = { ssdCm: 100, fieldXCm: side, fieldYCm: side };
      const sup = typeBDosePerMu('superposition', energy, waterPhantom(30), beam, depths, [0]);
      const pb = typeBDosePerMu('pencil-beam', energy, waterPhantom(30), beam, depths, [0]);
      const dMax = referencePoint('superposition', energy).dMaxCm;
      depths.forEach((z, i) => {
        // 1 %: both derive from the same point kernel; what differs is interpolation and the
        // pencil kernel's fixed SSD-100 divergence (exact here).
        if (z >= dMax && z <= 22) expectRelClose(pb[i] as number, sup[i] as number, 0.01);
      });
    },
  );
});

describe("superposition obeys O'Connor's theorem", () => {
  it('water at ρ = 0.25 with field and depths ×4 equals water (parallel beam), within 1 %', () => {
    // O'Connor (1957): scaling all lengths by 1/ρ leaves the dose unchanged for the same fluence.
    // Photon dose: the contaminant-electron term comes from the head, whose field factor does not
    // scale with the phantom's density.
    const water = waterPhantom(30);
    const thin = makeSlabPhantom([{ materialId: 'water', thicknessCm: 120, densityGPerCm3: 0.25 }]);
    const depths = [0.5, 1, 1.5, 2, 3, 5, 8, 10, 15, 20];
    const dWater = typeBPhotonDose(
      'superposition',
      '10MV',
      water,
      { ssdCm: Infinity, fieldXCm: 5, fieldYCm: 5 },
      depths,
      [0],
    );
    const dThin = typeBPhotonDose(
      'superposition',
      '10MV',
      thin,
      { ssdCm: Infinity, fieldXCm: 20, fieldYCm: 20 },
      depths.map((d) => 4 * d),
      [0],
    );
    // 1 %: the theorem is exact for this kernel model; what remains is the source-cell size
    // (0.2 cm geometric = 0.05 cm radiological in the thin medium vs 0.2 cm in water).
    depths.forEach((_, i) => expectRelClose(dThin[i] as number, dWater[i] as number, 0.01));
  });
});

describe('dose per MU normalisation', () => {
  it.each(['Co-60', '6MV', '18MV'] as BeamEnergy[])(
    '%s: water, 10 × 10, SSD 100 gives 1 cGy/MU at d_max for both engines',
    (energy) => {
      for (const engine of ['superposition', 'pencil-beam'] as const) {
        const dMax = referencePoint(engine, energy).dMaxCm;
        const d = typeBDosePerMu(engine, energy, waterPhantom(40), SSD100_10x10, [dMax], [0]);
        // The reference is defined this way (1 cGy/MU, S_c(10) = 1); 2e-3 for the parabolic
        // estimate of the maximum (Co-60's is in a steep build-up, 0.4 cm deep).
        expectRelClose(d[0] as number, 1, 2e-3);
      }
    },
  );
});
