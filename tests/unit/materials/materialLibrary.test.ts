import { describe, expect, it } from 'vitest';
import { allMaterials, getMaterial, relativeElectronDensity } from '../../../src/engine/materials';
import { expectAbsClose } from '../../helpers/expectClose';

describe('relativeElectronDensity', () => {
  it('is 1 for water at 1 g/cm³', () => {
    expect(relativeElectronDensity('water', 1)).toBe(1);
  });

  it('reproduces the relative electron densities of ICRU-44 tissues', () => {
    // ρ_e = ρ·(Z/A)/(Z/A)_w with NIST SRD 126 Table 2 Z/A values (ICRU-44); derived values to 3 decimals:
    // inflated lung 0.26 g/cm³ → 0.258, cortical bone 1.92 → 1.781, adipose 0.95 → 0.951, muscle 1.05 → 1.040
    expectAbsClose(relativeElectronDensity('lung', 0.26), 0.258, 5e-4);
    expectAbsClose(relativeElectronDensity('corticalBone', 1.92), 1.781, 5e-4);
    expectAbsClose(relativeElectronDensity('adipose', 0.95), 0.951, 5e-4);
    expectAbsClose(relativeElectronDensity('muscle', 1.05), 1.04, 5e-4);
  });
});

describe('material library', () => {
  it('defaults inflated lung to the ICRU-44 composition at 0.26 g/cm³', () => {
    // ICRU 44/46 inflated lung 0.26 g/cm³ (from memory); patients' mean bulk lung density 0.26 g/cm³
    expect(getMaterial('lung').defaultDensityGPerCm3).toBe(0.26);
    expect(getMaterial('lung').zOverA).toBe(0.55048);
  });

  it('names a source for every material', () => {
    for (const m of allMaterials()) expect(m.source.length).toBeGreaterThan(10);
  });

  it('gives spongy bone constants between muscle and cortical bone', () => {
    const s = getMaterial('spongyBone');
    expect(s.zOverA).toBeGreaterThan(getMaterial('corticalBone').zOverA);
    expect(s.zOverA).toBeLessThan(getMaterial('muscle').zOverA);
    expect(s.meanExcitationEnergyEV).toBeGreaterThan(74.6);
    expect(s.meanExcitationEnergyEV).toBeLessThan(112);
  });
});
