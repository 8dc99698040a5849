import { describe, expect, it } from 'vitest';
import {
  muEnOverRhoCm2PerG,
  muOverRhoCm2PerG,
  linearAttenuationPerCm,
  MATERIAL_IDS,
} from '../../../src/engine/materials';
import { expectRelClose } from '../../helpers/expectClose';

// Tabulated energies must return the table value exactly (to float rounding): tolerance 1e-9.
describe('muOverRhoCm2PerG', () => {
  it('returns NIST SRD 126 values for water at 1, 2, 6 and 10 MeV', () => {
    // NIST SRD 126 (Hubbell & Seltzer), water, coherent included: 0.07072, 0.04942, 0.02770, 0.02219 cm²/g
    expectRelClose(muOverRhoCm2PerG('water', 1), 0.07072, 1e-9);
    expectRelClose(muOverRhoCm2PerG('water', 2), 0.04942, 1e-9);
    expectRelClose(muOverRhoCm2PerG('water', 6), 0.0277, 1e-9);
    expectRelClose(muOverRhoCm2PerG('water', 10), 0.02219, 1e-9);
  });

  it('returns the NIST SRD 126 value for cortical bone (ICRU-44) at 1 MeV', () => {
    // NIST SRD 126, bone, cortical (ICRU-44): μ/ρ(1 MeV) = 0.06566 cm²/g
    expectRelClose(muOverRhoCm2PerG('corticalBone', 1), 0.06566, 1e-9);
  });

  it('interpolates log–log between tabulated energies', () => {
    // Between 1.25 MeV (0.06323) and 1.5 MeV (0.05754), NIST SRD 126 water: the log–log value at
    // 1.3693 MeV (geometric mean) is the geometric mean of the two values.
    const e = Math.sqrt(1.25 * 1.5);
    expectRelClose(muOverRhoCm2PerG('water', e), Math.sqrt(0.06323 * 0.05754), 1e-9);
  });

  it('per electron is within 0.3 % of water for every material in the Compton region (1 MeV)', () => {
    // Common practice: at 1 MeV Compton dominates, so μ/ρ scales with electrons per gram (Z/A).
    // Tolerance 0.3 %: spread of the per-electron ratio for ICRU-44 tissues at 0.5–1.5 MeV.
    const zOverA: Record<string, number> = {
      water: 0.55508,
      lung: 0.55048,
      corticalBone: 0.51478,
      adipose: 0.55579,
      muscle: 0.55,
      air: 0.49919,
    };
    for (const [id, za] of Object.entries(zOverA)) {
      const perElectron = muOverRhoCm2PerG(id as never, 1) / za;
      expectRelClose(perElectron, 0.07072 / 0.55508, 3e-3);
    }
  });

  it('gives a positive finite value for every material across 0.01–20 MeV', () => {
    for (const id of MATERIAL_IDS) {
      for (const e of [0.01, 0.1, 0.511, 1.25, 6, 20]) {
        const mu = muOverRhoCm2PerG(id, e);
        expect(Number.isFinite(mu) && mu > 0).toBe(true);
      }
    }
  });

  it('scales with density for the linear coefficient', () => {
    expectRelClose(
      linearAttenuationPerCm('lung', 0.26, 2),
      muOverRhoCm2PerG('lung', 2) * 0.26,
      1e-12,
    );
  });
});

describe('muEnOverRhoCm2PerG', () => {
  it('returns NIST SRD 126 values for water at 1, 2, 6 and 10 MeV', () => {
    // NIST SRD 126, water: μ_en/ρ = 0.03103, 0.02608, 0.01806, 0.01566 cm²/g
    expectRelClose(muEnOverRhoCm2PerG('water', 1), 0.03103, 1e-9);
    expectRelClose(muEnOverRhoCm2PerG('water', 2), 0.02608, 1e-9);
    expectRelClose(muEnOverRhoCm2PerG('water', 6), 0.01806, 1e-9);
    expectRelClose(muEnOverRhoCm2PerG('water', 10), 0.01566, 1e-9);
  });

  it('returns the NIST SRD 126 value for cortical bone at 1 MeV', () => {
    // NIST SRD 126, bone, cortical (ICRU-44): μ_en/ρ(1 MeV) = 0.02875 cm²/g
    expectRelClose(muEnOverRhoCm2PerG('corticalBone', 1), 0.02875, 1e-9);
  });

  it('gives the bone/water ratio 0.926 at 1.25 MeV', () => {
    // NIST SRD 126 ratio at 1.25 MeV, bone/water = 0.02745/0.02965 = 0.9258 (derived from the table)
    expectRelClose(
      muEnOverRhoCm2PerG('corticalBone', 1.25) / muEnOverRhoCm2PerG('water', 1.25),
      0.926,
      2e-3,
    );
  });
});
