import { describe, expect, it } from 'vitest';
import { termaAlongRay } from '../../../src/engine/kernels/terma';
import { beamSpectrum, monoenergeticSpectrum } from '../../../src/engine/kernels/spectrum';
import { makeSlabPhantom, waterPhantom } from '../../../src/engine/phantom/slabPhantom';
import { expectRelClose } from '../../helpers/expectClose';

describe('termaAlongRay', () => {
  it('termaAlongRay(...) for a 2 MeV parallel beam in water gives T(10)/T(0) = 0.6100', () => {
    // NIST SRD 126 (Hubbell & Seltzer), water μ/ρ(2 MeV) = 0.04942 cm²/g → exp(−0.4942) = 0.6100.
    const t = termaAlongRay(waterPhantom(30), monoenergeticSpectrum(2), [0, 10], {
      ssdCm: Infinity,
    });
    expectRelClose((t[1] as number) / (t[0] as number), 0.61, 2e-4); // 4-digit reference value
    expectRelClose(t[0] as number, 0.04942, 1e-3); // T(0) = μ/ρ per unit energy fluence
  });

  it('adds the inverse square of the distance from the source for a divergent beam', () => {
    // (100/110)² between 0 and 10 cm at SSD 100, on top of the attenuation above (exact).
    const s = monoenergeticSpectrum(2);
    const parallel = termaAlongRay(waterPhantom(30), s, [0, 10], { ssdCm: Infinity });
    const divergent = termaAlongRay(waterPhantom(30), s, [0, 10], { ssdCm: 100 });
    expectRelClose(
      (divergent[1] as number) / (divergent[0] as number),
      ((parallel[1] as number) / (parallel[0] as number)) * (100 / 110) ** 2,
      1e-12,
    );
  });

  it('hardens a 6 MV beam: the effective attenuation coefficient falls with depth', () => {
    const t = termaAlongRay(waterPhantom(40), beamSpectrum('6MV'), [0, 5, 20, 25], {
      ssdCm: Infinity,
    });
    const muShallow = Math.log((t[0] as number) / (t[1] as number)) / 5;
    const muDeep = Math.log((t[2] as number) / (t[3] as number)) / 5;
    expect(muDeep).toBeLessThan(muShallow * 0.97);
  });

  it('attenuates through a lung slab by its mass thickness, not its geometric thickness', () => {
    // 10 cm of ICRU lung at 0.25 g/cm³ attenuates a 2 MeV beam like 2.5 g/cm² of water.
    // NIST SRD 126: μ/ρ(2 MeV) lung 0.04900, water 0.04942 cm²/g → the TERMA ratios differ by
    // exp(0.00042·2.5)·(μ/ρ ratio at the points, both water) ≈ 0.1 %; 0.5 % tolerance.
    const s = monoenergeticSpectrum(2);
    const p = makeSlabPhantom([
      { materialId: 'water', thicknessCm: 2 },
      { materialId: 'lung', thicknessCm: 10, densityGPerCm3: 0.25 },
      { materialId: 'water', thicknessCm: 10 },
    ]);
    const het = termaAlongRay(p, s, [0, 13], { ssdCm: Infinity });
    const water = termaAlongRay(waterPhantom(30), s, [0, 5.5], { ssdCm: Infinity });
    expectRelClose(
      (het[1] as number) / (het[0] as number),
      (water[1] as number) / (water[0] as number),
      0.005,
    );
  });
});
