// Dose-to-medium factor of the Batho forms: spectrum-weighted (μ_en/ρ)_m/(μ_en/ρ)_w.
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { calculateCase } from '../../../src/compute/calculateCase';
import { muEnRatioToWater } from '../../../src/engine/corrections/doseToMedium';
import { beamSpectrum, monoenergeticSpectrum } from '../../../src/engine/kernels/spectrum';
import { parseCaseText } from '../../../src/io/caseFile';
import { makeF6WaterData } from '../../fixtures/f6WaterData';
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

  it('calculateCase with doseToMedium scales Batho by the ratio of the point’s layer only', () => {
    const parsed = parseCaseText(readFileSync('public/cases/lung-slab-6mv.json', 'utf8'));
    if (!parsed.ok) throw new Error('demo case');
    const base = { waterData: makeF6WaterData(), methods: ['batho', 'rtmr'] };
    const byId = (ms: { id: string }[]) =>
      ['batho', 'rtmr'].map((id) => ms.find((x) => x.id === id));
    const w = byId(calculateCase(parsed.value, base).methods) as ReturnType<
      typeof calculateCase
    >['methods'];
    const m = byId(
      calculateCase(parsed.value, { ...base, typeA: { doseToMedium: true } }).methods,
    ) as ReturnType<typeof calculateCase>['methods'];
    const ratio = muEnRatioToWater('lung', beamSpectrum('6MV'));
    // in-lung point: Batho CF times the lung/water ratio; RTMR untouched
    expectRelClose((m[0]?.points[1]?.cf as number) / (w[0]?.points[1]?.cf as number), ratio, 1e-14);
    expect(m[1]?.points[1]?.cf).toBe(w[1]?.points[1]?.cf);
    expect(m[0]?.variant).toMatch(/dose to medium/);
  });
});
