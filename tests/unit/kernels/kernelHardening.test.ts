// Kernel hardening with depth: the filtered spectrum, the fitted mixing fraction f(t) and its
// interpolation, and how well two kernels represent the hardened kernel at any depth.
import { describe, expect, it } from 'vitest';
import { readTypedArrayFileSync } from '../../../src/io/generatedDataNode';
import { monoKernelsOfFile, type MonoKernelFile } from '../../../src/engine/kernels/kernelFiles';
import {
  filteredSpectrum,
  HARDENING_FILTRATIONS_CM,
  HARDENING_REFERENCE_CM,
  hardeningMixAt,
  hardeningMixFractions,
  hardenedKernel,
} from '../../../src/engine/kernels/kernelHardening';
import { polyenergeticKernel } from '../../../src/engine/kernels/polyenergeticKernel';
import { beamSpectrum, monoenergeticSpectrum } from '../../../src/engine/kernels/spectrum';
import { expectAbsClose, expectRelClose } from '../../helpers/expectClose';

const mono = monoKernelsOfFile(
  readTypedArrayFileSync('src/engine/data/generated/pointKernelsMono.bin') as MonoKernelFile,
);
const meanEnergy = (s: ReturnType<typeof beamSpectrum>) =>
  s.energyMeV.reduce((a, e, i) => a + e * (s.photonFraction[i] as number), 0);

describe('filteredSpectrum', () => {
  it('weights each bin by exp(−μ_w(E)·t): a 2 MeV line keeps its energy, a beam hardens', () => {
    const line = filteredSpectrum(monoenergeticSpectrum(2), 10);
    expect(line.energyMeV[0]).toBe(2);
    expectRelClose(line.photonFraction[0] as number, 1, 1e-12);
    const s = beamSpectrum('6MV');
    const f = filteredSpectrum(s, 20);
    expect(meanEnergy(f)).toBeGreaterThan(meanEnergy(s));
    // Two bins: the ratio of photon fractions changes by exp(−(μ₁ − μ₂)·t). NIST SRD 126 water:
    // μ/ρ(1 MeV) = 0.07072, μ/ρ(5 MeV) = 0.03031 cm²/g (derived: e^(−0.04041·10) = 0.6676).
    const two = filteredSpectrum(
      { ...s, energyMeV: Float64Array.of(1, 5), photonFraction: Float64Array.of(0.5, 0.5) },
      10,
    );
    expectRelClose(
      (two.photonFraction[0] as number) / (two.photonFraction[1] as number),
      Math.exp(-(0.07072 - 0.03031) * 10),
      1e-3,
    );
  });
});

describe('hardeningMixFractions', () => {
  it('is 0 at the surface, 1 at the reference filtration and rises with depth', () => {
    const f = hardeningMixFractions(mono, beamSpectrum('18MV'));
    expect(f[0]).toBe(0);
    expectAbsClose(f[HARDENING_FILTRATIONS_CM.indexOf(HARDENING_REFERENCE_CM)] as number, 1, 1e-9);
    for (let i = 1; i < f.length; i++) expect(f[i] as number).toBeGreaterThan(f[i - 1] as number);
  });

  it.each(['6MV', '18MV'] as const)(
    '%s: K(0) + f(t)·[K(20) − K(0)] represents the hardened kernel within 2.5 % (L1) to 40 cm',
    (energy) => {
      // Derived: the exact hardened kernel is Σ_E w_E(t)·K_E with w_E(t) ∝ Φ_E·E·μ/ρ·e^(−μ_w t).
      // Ignoring hardening altogether errs by 13 % (6 MV) and 12.5 % (18 MV) at 20 cm.
      const s = beamSpectrum(energy);
      const mix = {
        filtrationsCm: HARDENING_FILTRATIONS_CM,
        mixFractions: hardeningMixFractions(mono, s),
      };
      const k0 = polyenergeticKernel(mono, s, 'k0');
      const kRef = hardenedKernel(mono, s, 'ref');
      for (const t of [7.5, 25, 40]) {
        const exact = polyenergeticKernel(mono, filteredSpectrum(s, t), 'exact');
        const f = hardeningMixAt(mix, t);
        let err = 0;
        let norm = 0;
        let errNone = 0;
        for (let i = 0; i < exact.primary.length; i++) {
          const e = (exact.primary[i] as number) + (exact.scatter[i] as number);
          const a = (k0.primary[i] as number) + (k0.scatter[i] as number);
          const b = (kRef.primary[i] as number) + (kRef.scatter[i] as number);
          err += Math.abs(e - (a + f * (b - a)));
          errNone += Math.abs(e - a);
          norm += e;
        }
        expect(err / norm).toBeLessThan(0.025);
        expect(err).toBeLessThan(errNone / 4);
      }
    },
  );
});

describe('hardeningMixAt', () => {
  it('interpolates linearly, returns f(0) at or above the surface and holds the last value', () => {
    const mix = { filtrationsCm: [0, 10, 20], mixFractions: [0, 0.6, 1] };
    expectAbsClose(hardeningMixAt(mix, 5), 0.3, 1e-12);
    expectAbsClose(hardeningMixAt(mix, 15), 0.8, 1e-12);
    expect(hardeningMixAt(mix, -1)).toBe(0);
    expect(hardeningMixAt(mix, 50)).toBe(1);
  });
});
