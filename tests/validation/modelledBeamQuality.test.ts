// The modelled beams (photon kernels + contaminant electrons, generated water data) against
// published and typical beam data: depth of maximum, PDD(10), TPR20,10, the build-up (surface dose
// against energy and field size, PDD at 1 and 2 cm), peak-scatter and head-scatter factors.
// Tolerances follow the self-consistency targets of the project's data note (d_max ±0.3 cm,
// PDD(10) ±2 % points, TPR20,10 ±0.01 of typical values) unless stated.
import { describe, expect, it } from 'vitest';
import { BEAM_ENERGIES, type BeamEnergy } from '../../src/engine/beam/energies';
import { modelledBeamTables } from '../../src/engine/beam/modelledBeam';
import { modelledHeadScatter } from '../../src/engine/beam/headScatter';
import { waterPhantom } from '../../src/engine/phantom/slabPhantom';
import {
  referencePoint,
  typeBPhotonDose,
  typeBRawDose,
} from '../../src/engine/superposition/typeBDose';
import { expectAbsClose } from '../helpers/expectClose';

/** Typical 10 × 10, SSD 100 values (from memory; ±2 % points, ±0.01): d_max midpoints, PDD(10), TPR20,10. */
const TYPICAL: Record<BeamEnergy, { dMaxCm: number; pdd10: number | null; tpr2010: number }> = {
  // Co-60: typical PDD(10) is for SSD 80, the modelled tables are at SSD 100: not compared.
  'Co-60': { dMaxCm: 0.5, pdd10: null, tpr2010: 0.57 },
  '4MV': { dMaxCm: 1.1, pdd10: 63, tpr2010: 0.62 },
  '6MV': { dMaxCm: 1.5, pdd10: 67, tpr2010: 0.675 },
  '10MV': { dMaxCm: 2.35, pdd10: 73.5, tpr2010: 0.735 },
  '15MV': { dMaxCm: 2.85, pdd10: 77, tpr2010: 0.76 },
  '18MV': { dMaxCm: 3.25, pdd10: 79, tpr2010: 0.78 },
};

const SSD100 = (side: number) => ({ ssdCm: 100, fieldXCm: side, fieldYCm: side });

/** PDD (%) of the modelled beam's total dose at depths, SSD 100. */
function pdd(energy: BeamEnergy, side: number, depthsCm: number[]): number[] {
  const d = typeBRawDose('superposition', energy, waterPhantom(40), SSD100(side), depthsCm, [0]);
  const max =
    side === 10
      ? referencePoint('superposition', energy).rawDose
      : Math.max(...maxSearch(energy, side));
  return Array.from(d, (x) => (100 * x) / max);
}

function maxSearch(energy: BeamEnergy, side: number): Float64Array {
  const depths = Array.from({ length: 121 }, (_, i) => i * 0.05);
  return typeBRawDose('superposition', energy, waterPhantom(40), SSD100(side), depths, [0]);
}

describe('modelled beams, 10 × 10 at SSD 100, against typical published beams', () => {
  it.each([...BEAM_ENERGIES])(
    '%s: d_max within 0.3 cm, PDD(10) within 2 % points, TPR20,10 within 0.01',
    (energy) => {
      const b = modelledBeamTables(energy);
      const t = TYPICAL[energy];
      expectAbsClose(b.dMaxCm, t.dMaxCm, 0.3);
      if (t.pdd10 !== null) expectAbsClose(b.pdd10, t.pdd10, 2);
      expectAbsClose(b.tpr2010, t.tpr2010, 0.01);
    },
  );

  it.each(['6MV', '10MV', '15MV', '18MV'] as const)(
    '%s: TPR20,10 follows Kalach & Rogers from the photon PDD(10) within 0.01',
    (energy) => {
      // Kalach & Rogers, Med. Phys. 30, 1546 (2003) (from memory): TPR20,10 = −0.8228 +
      // 0.0342·%dd(10)_x − 0.0001776·%dd(10)_x², %dd(10)_x of the photons alone.
      const b = modelledBeamTables(energy);
      const photons = typeBPhotonDose(
        'superposition',
        energy,
        waterPhantom(40),
        SSD100(10),
        [...Array.from({ length: 201 }, (_, i) => i * 0.04), 10],
        [0],
      );
      const max = Math.max(...photons.subarray(0, 201));
      const x = (100 * (photons[201] as number)) / max;
      expectAbsClose(b.tpr2010, -0.8228 + 0.0342 * x - 0.0001776 * x * x, 0.01);
    },
  );
});

describe('build-up: surface dose against energy and field size, PDD at 1 and 2 cm', () => {
  it('6 MV surface dose of 5 × 5, 10 × 10 and 20 × 20 matches the published compilation', () => {
    // J Med Phys 45(3), 175–181 (2020), Table 4 (eight studies; extrapolation chamber, film,
    // parallel-plate chambers, Monte Carlo): 5 × 5 9.9–12.0 %, 10 × 10 15.0–18.0 %,
    // 20 × 20 23.0–28.1 %. Tolerance: the spread of the studies.
    expectAbsClose(pdd('6MV', 5, [0])[0] as number, 10.5, 1.5);
    expectAbsClose(pdd('6MV', 10, [0])[0] as number, 16.5, 1.5);
    expectAbsClose(pdd('6MV', 20, [0])[0] as number, 26, 3);
  });

  it('15 MV surface dose of 10 × 10 matches the published measurement', () => {
    // Akbas et al., Adv. High Energy Phys. 2016, 8361028: Markus chamber 14.9 %, EBT3 film
    // 13.4 % (MOSFET 16.4 %, thicker effective depth). Tolerance: ±1.5 % points.
    expectAbsClose(pdd('15MV', 10, [0])[0] as number, 14.2, 1.5);
  });

  it('surface dose falls with energy and rises with field size for every beam', () => {
    // Common practice: higher energies spare the skin more; larger fields carry more
    // contaminant electrons and phantom scatter to the surface.
    const s10 = BEAM_ENERGIES.map((e) => pdd(e, 10, [0])[0] as number);
    for (let i = 1; i < s10.length; i++)
      expect(s10[i] as number).toBeLessThan(s10[i - 1] as number);
    for (const e of BEAM_ENERGIES) {
      const [a, b, c] = [5, 10, 20].map((s) => pdd(e, s, [0])[0] as number);
      expect(a as number).toBeLessThan(b as number);
      expect(b as number).toBeLessThan(c as number);
    }
  });

  it.each([
    ['6MV', 97.6, 99.3],
    ['10MV', 90.7, 99.9],
    ['18MV', 78.1, 97.4],
  ] as const)(
    '%s: PDD at 1 and 2 cm match the empirical PDD model within 2.5 % points',
    (energy, at1, at2) => {
      // Li, Ye, Zhang & Wu, PLoS ONE 17(1), e0261042 (2022): PDD ∝ z/√(z² + n)·e^(−uz), fitted to
      // measured 10 × 10 beams (its surface region is not modelled, so no shallower depths).
      const [p1, p2] = pdd(energy, 10, [1, 2]);
      expectAbsClose(p1 as number, at1, 2.5);
      expectAbsClose(p2 as number, at2, 2.5);
    },
  );
});

describe('peak-scatter and head-scatter factors', () => {
  it('PSF(10 × 10) of 6 MV is about 1.035–1.04 and the Co-60 BSF(10 × 10) about 1.036', () => {
    // 6 MV: 1.035–1.04 (from memory, ±0.01); Co-60: BSF(10 × 10) = 1.036 (BJR Suppl. 25, as
    // tabulated by Khan; from memory, ±0.012: the model's contaminant electrons add 0.5 % at the
    // Co-60 d_max of 0.4 cm, which a build-up-cap D_air does not see). The old definition (dose
    // over first-generation-electron dose) gave 1.082 and 1.064.
    const psf10 = (e: BeamEnergy) => {
      const b = modelledBeamTables(e);
      return b.psf[b.fieldsCm.indexOf(10)] as number;
    };
    expectAbsClose(psf10('6MV'), 1.0375, 0.01);
    expectAbsClose(psf10('Co-60'), 1.036, 0.012);
  });

  it.each([...BEAM_ENERGIES])(
    '%s: PSF rises with field size from about 1 for the smallest fields',
    (energy) => {
      const b = modelledBeamTables(energy);
      for (let i = 1; i < b.psf.length; i++)
        expect(b.psf[i] as number).toBeGreaterThan(b.psf[i - 1] as number);
      // 2 × 2: a mini-phantom-sized field, lateral disequilibrium at high energy: 0.9–1.03 (derived).
      expect(b.psf[0] as number).toBeGreaterThan(0.9);
      expect(b.psf[0] as number).toBeLessThan(1.03);
    },
  );

  it.each([
    ['Co-60', 0.98, 1.02],
    ['4MV', 0.97, 1.03],
    ['6MV', 0.97, 1.03],
    ['10MV', 0.972, 1.028],
    ['15MV', 0.975, 1.025],
    ['18MV', 0.975, 1.025],
  ] as const)(
    '%s: S_c(5 × 5) ≈ %f and S_c(20 × 20) ≈ %f (typical, from memory, ±1 %)',
    (energy, sc5, sc20) => {
      expectAbsClose(modelledHeadScatter(energy, 5), sc5, 0.01);
      expectAbsClose(modelledHeadScatter(energy, 20), sc20, 0.01);
      expectAbsClose(modelledHeadScatter(energy, 10), 1, 1e-12);
    },
  );

  it('6 MV S_c of 3 × 3 and 40 × 40, and 15/18 MV S_c(40 × 40)', () => {
    // 6 MV S_c(3 × 3) ≈ 0.95, S_c(40 × 40) ≈ 1.05; 15 MV S_c(40 × 40) ≈ 1.04 (a public
    // study-notes table, unverified; from memory; ±1 %).
    expectAbsClose(modelledHeadScatter('6MV', 3), 0.95, 0.01);
    expectAbsClose(modelledHeadScatter('6MV', 40), 1.05, 0.01);
    expectAbsClose(modelledHeadScatter('15MV', 40), 1.04, 0.01);
    expectAbsClose(modelledHeadScatter('18MV', 40), 1.04, 0.01);
  });
});
