// Dose-to-medium factor of the type-A methods: spectrum-weighted (μ_en/ρ)_m/(μ_en/ρ)_w.
import { describe, expect, it } from 'vitest';
import { muEnRatioToWater } from '../../../src/engine/dose/muEnRatio';
import { beamSpectrum, monoenergeticSpectrum } from '../../../src/engine/kernels/spectrum';
import { expectRelClose } from '../../helpers/expectClose';

describe('muEnRatioToWater', () => {
  it('cortical bone/water at 1.25 MeV follows the electron-per-gram ratio (Compton-dominated)', () => {
    // NIST/ICRU-44 Z/A: cortical bone 0.51478, water 0.55508 → 0.92740; at 1.25 MeV μ_en/ρ is
    // almost all incoherent scattering, which scales with Z/A; 1 % allows for the small rest
    expectRelClose(
      muEnRatioToWater('corticalBone', monoenergeticSpectrum(1.25)),
      0.51478 / 0.55508,
      0.01,
    );
  });

  it('muEnRatioToWater is 1 for water for any spectrum', () => {
    expect(muEnRatioToWater('water', beamSpectrum('6MV'))).toBe(1);
  });
});
