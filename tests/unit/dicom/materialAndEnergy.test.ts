// Slab ρe to library materials (ρe = ρ·(Z/A)/(Z/A)_water with the NIST SRD 126 Table 2 constants
// of src/engine/materials) and nominal energies to Lamina's beams.
import { describe, expect, it } from 'vitest';
import { beamEnergyFor } from '../../../src/dicom/energyMapping';
import { materialForRhoE, nominalRhoE, rhoEOfMaterial } from '../../../src/dicom/materialMapping';

describe('materialForRhoE', () => {
  it('water at ρe 1 needs no density override', () => {
    expect(materialForRhoE(1)).toEqual({
      materialId: 'water',
      densityGPerCm3: undefined,
      clamped: false,
    });
  });

  it('maps inflated lung, adipose and cortical bone at their nominal ρe to themselves', () => {
    for (const id of ['lung', 'adipose', 'corticalBone', 'air'] as const)
      expect(materialForRhoE(nominalRhoE(id)).materialId).toBe(id);
  });

  it('keeps the slab ρe through the density override (to 0.001 g/cm³)', () => {
    const m = materialForRhoE(0.3);
    expect(m.materialId).toBe('lung');
    expect(Math.abs(rhoEOfMaterial(m.materialId, m.densityGPerCm3) - 0.3)).toBeLessThan(0.001);
  });

  it('uses a custom density where no material lies within the tolerance', () => {
    expect(materialForRhoE(0.6)).toEqual({
      materialId: 'custom',
      densityGPerCm3: 0.6,
      clamped: false,
    });
  });

  it('holds densities above the case limit at 3 g/cm³ and says so', () => {
    expect(materialForRhoE(3.5)).toMatchObject({ densityGPerCm3: 3, clamped: true });
  });
});

describe('beamEnergyFor', () => {
  it.each([
    [6, '6MV'],
    [18, '18MV'],
    [1.25, 'Co-60'],
    [10, '10MV'],
  ] as const)('%d MV maps to %s', (mv, e) => {
    expect(beamEnergyFor(mv, null)).toEqual({ ok: true, energy: e });
  });

  it('says clearly when no beam fits', () => {
    expect(beamEnergyFor(8, null)).toEqual({
      ok: false,
      message:
        'no Lamina beam fits a nominal energy of 8 MV (available: Co-60, 4 MV, 6 MV, 10 MV, 15 MV, 18 MV (approximate spectrum))',
    });
  });

  it('refuses a flattening-filter-free beam', () => {
    const r = beamEnergyFor(6, 'FFF');
    expect(r.ok).toBe(false);
    expect(r.ok ? '' : r.message).toMatch(/6 MV FFF .*flattened beams only/);
  });
});
