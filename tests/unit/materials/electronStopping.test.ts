import { describe, expect, it } from 'vitest';
import {
  collisionStoppingPowerMeVCm2PerG,
  csdaRangeGPerCm2,
  radiativeStoppingPowerMeVCm2PerG,
  MATERIAL_IDS,
} from '../../../src/engine/materials';
import { expectRelClose } from '../../helpers/expectClose';

describe('csdaRangeGPerCm2', () => {
  it('returns the ESTAR CSDA range of water at 1 and 10 MeV', () => {
    // NIST ESTAR (SRD 124), liquid water: CSDA range 0.4367 g/cm² (1 MeV), 4.975 g/cm² (10 MeV)
    expectRelClose(csdaRangeGPerCm2('water', 1), 0.4367, 1e-9);
    expectRelClose(csdaRangeGPerCm2('water', 10), 4.975, 1e-9);
  });

  it('increases with energy for every material', () => {
    for (const id of MATERIAL_IDS) {
      let last = 0;
      for (const t of [0.01, 0.1, 0.5, 1, 2, 5, 10, 20]) {
        const r = csdaRangeGPerCm2(id, t);
        expect(r).toBeGreaterThan(last);
        last = r;
      }
    }
  });
});

describe('collisionStoppingPowerMeVCm2PerG', () => {
  it('returns ESTAR water values at 0.1, 1 and 10 MeV', () => {
    // NIST ESTAR, liquid water: S_col/ρ = 4.115, 1.849, 1.968 MeV cm²/g
    expectRelClose(collisionStoppingPowerMeVCm2PerG('water', 0.1), 4.115, 1e-9);
    expectRelClose(collisionStoppingPowerMeVCm2PerG('water', 1), 1.849, 1e-9);
    expectRelClose(collisionStoppingPowerMeVCm2PerG('water', 10), 1.968, 1e-9);
  });

  it('is lower per gram in cortical bone than in water (fewer electrons per gram, higher I)', () => {
    // NIST ESTAR: bone, cortical (ICRP) below water at 1 MeV (common practice: S/ρ ∝ Z/A·L(I))
    expect(collisionStoppingPowerMeVCm2PerG('corticalBone', 1)).toBeLessThan(
      collisionStoppingPowerMeVCm2PerG('water', 1),
    );
  });
});

describe('radiativeStoppingPowerMeVCm2PerG', () => {
  it('returns the ESTAR water value at 10 MeV', () => {
    // NIST ESTAR, liquid water: S_rad/ρ(10 MeV) = 0.1814 MeV cm²/g
    expectRelClose(radiativeStoppingPowerMeVCm2PerG('water', 10), 0.1814, 1e-9);
  });
});
