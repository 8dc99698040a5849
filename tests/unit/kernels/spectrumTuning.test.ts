import { describe, expect, it } from 'vitest';
import { tiltedWeights } from '../../../src/engine/kernels/spectrumTuning';
import {
  beamSpectrum,
  spectrumBins,
  storedSpectrumBins,
} from '../../../src/engine/kernels/spectrum';
import { makeSpectrumSampler } from '../../../src/engine/montecarlo/spectrumSampler';
import { BEAM_ENERGIES } from '../../../src/engine/beam/energies';
import { expectRelClose } from '../../helpers/expectClose';

const meanEnergyMeV = (e: ArrayLike<number>, w: ArrayLike<number>): number => {
  let s = 0;
  let m = 0;
  for (let i = 0; i < e.length; i++) {
    s += w[i] as number;
    m += (w[i] as number) * (e[i] as number);
  }
  return m / s;
};

describe('tiltedWeights', () => {
  const stored = storedSpectrumBins('18MV');

  it('tiltedWeights(...) keeps the stored total for any β', () => {
    const total = stored.weight.reduce((a, b) => a + b, 0);
    for (const beta of [-0.2, -0.05, 0.03, 0.0806, 0.5]) {
      const w = tiltedWeights(stored.centreMeV, stored.weight, beta);
      // Summation round-off only.
      expectRelClose(
        w.reduce((a, b) => a + b, 0),
        total,
        1e-12,
      );
    }
  });

  it('tiltedWeights(..., 0) returns the stored weights unchanged', () => {
    expect(Array.from(tiltedWeights(stored.centreMeV, stored.weight, 0))).toEqual(
      Array.from(stored.weight),
    );
  });

  it('tiltedWeights(...) lowers the mean energy as β grows and raises it for β < 0', () => {
    const betas = [-0.1, 0, 0.02, 0.05, 0.1, 0.2];
    const means = betas.map((b) =>
      meanEnergyMeV(stored.centreMeV, tiltedWeights(stored.centreMeV, stored.weight, b)),
    );
    for (let k = 1; k < means.length; k++)
      expect(means[k] as number).toBeLessThan(means[k - 1] as number);
  });

  it('tiltedWeights(...) multiplies each weight by exp(−β·E) up to one common factor', () => {
    const beta = 0.07;
    const w = tiltedWeights(stored.centreMeV, stored.weight, beta);
    const factor = (i: number) =>
      (w[i] as number) /
      ((stored.weight[i] as number) * Math.exp(-beta * (stored.centreMeV[i] as number)));
    for (let i = 1; i < w.length; i++) expectRelClose(factor(i), factor(0), 1e-12);
  });
});

describe('spectrumBins', () => {
  it('spectrumBins("18MV") applies the stored tuning, and the Monte Carlo sampler uses the same weights', () => {
    const stored = storedSpectrumBins('18MV');
    const tuned = spectrumBins('18MV');
    expect(stored.tuning).not.toBeNull();
    expect(stored.tuning!.betaPerMeV).toBeGreaterThan(0);
    expect(stored.tuning!.target).toMatch(/PDD\(10\)/);
    expect(Array.from(tuned.weight)).toEqual(
      Array.from(tiltedWeights(stored.centreMeV, stored.weight, stored.tuning!.betaPerMeV)),
    );
    // The sampler's fluence-weighted mean (bin centres) equals that of the kernels' spectrum.
    const s = beamSpectrum('18MV');
    expectRelClose(
      makeSpectrumSampler('18MV').meanEnergyMeV,
      meanEnergyMeV(s.energyMeV, s.photonFraction),
      1e-12,
    );
    expect(makeSpectrumSampler('18MV').meanEnergyMeV).toBeLessThan(
      meanEnergyMeV(stored.centreMeV, stored.weight),
    );
  });

  it.each(BEAM_ENERGIES.filter((e) => e !== '18MV'))(
    'spectrumBins("%s") is the published spectrum as stored (no tuning)',
    (energy) => {
      const b = spectrumBins(energy);
      expect(b.tuning).toBeNull();
      expect(b.approximate).toBe(false);
      expect(Array.from(b.weight)).toEqual(Array.from(storedSpectrumBins(energy).weight));
    },
  );
});
