// Type-A correction factors against derived test vectors: the analytic 6 MV-like TMR fixture
// (tests/fixtures/f6WaterData.ts) in slab phantoms L, B and G4, s_d = 10 cm at every depth.
// Formulas: ratio of TMR (Khan, TAR method, from memory); generalized Batho power law (Batho 1964,
// Sontag & Cunningham 1977, from memory); modified Batho with the d_max shift (Thomas 1991, from
// memory); ETAR (Sontag & Cunningham 1978, from memory). The vectors are quoted to 4 decimals, so
// every check uses an absolute tolerance of 1e-4 (rounding of the quoted value plus round-off).
import { describe, expect, it } from 'vitest';
import { bathoMethod, bathoPowerLawProduct } from '../../src/engine/corrections/batho';
import { bathoModifiedMethod } from '../../src/engine/corrections/bathoModified';
import type { CorrectionOptions, TypeAMethod } from '../../src/engine/corrections/correctionTypes';
import { etarMethod } from '../../src/engine/corrections/etar';
import { rtmrMethod } from '../../src/engine/corrections/rtmr';
import type { WaterData } from '../../src/engine/beam/waterData';
import type { SlabPhantom } from '../../src/engine/phantom/slabPhantom';
import { f6Psf, f6Tmr, makeExponentialWaterData, makeF6WaterData } from '../fixtures/f6WaterData';
import { PHANTOM_B, PHANTOM_G4, PHANTOM_L, slabs } from '../fixtures/slabPhantoms';
import { expectAbsClose, expectRelClose } from '../helpers/expectClose';

const QUOTED_4_DECIMALS = 1e-4;
const wd = makeF6WaterData();

function cfOf(
  method: TypeAMethod,
  phantom: SlabPhantom,
  depthCm: number,
  options: CorrectionOptions = {},
  water: WaterData = wd,
): number {
  const r = method.correct(phantom, depthCm, 10, water, options);
  expect(r.cf).not.toBeNull();
  return r.cf as number;
}

/** The unshifted generalized power law itself (phantom L's layers), T = TMR or TAR of the fixture. */
function unshiftedBathoFormula(p: SlabPhantom, depthCm: number, table: 'tmr' | 'tar'): number {
  const psf = table === 'tar' ? f6Psf(10) : 1;
  return bathoPowerLawProduct(p, depthCm, 0, (x) => f6Tmr(x, 10) * psf).product;
}

/** Phantom L: within d_max 1.5 cm below the lung's top (5 cm) or its exit (15 cm). */
const withinBuildUpOfLung = (depthCm: number) =>
  (depthCm >= 5 && depthCm < 6.5) || (depthCm >= 15 && depthCm < 16.5);

function expectWithheld(p: SlabPhantom, depthCm: number, options: CorrectionOptions = {}): void {
  const r = bathoMethod.correct(p, depthCm, 10, wd, options);
  expect(r.cf).toBeNull();
  expect(r.flags[0]).toMatch(/^undefined: unshifted Batho .* within d_max 1\.50 cm/);
}

describe('analytic TMR fixture F6', () => {
  it('f6Tmr and f6Psf reproduce the fixture sanity values', () => {
    // derived test vector: analytic 6 MV-like TMR fixture, sanity values; tolerance = half a unit
    // in the last quoted digit
    const cases: [number, number, number][] = [
      [f6Tmr(10, 10), 0.78455, 5e-6],
      [f6Tmr(20, 10) / f6Tmr(10, 10), 0.678, 5e-4],
      [f6Tmr(10, 5), 0.7485, 5e-5],
      [f6Tmr(5, 10), 0.91943, 5e-6],
      [f6Tmr(15, 10), 0.65142, 5e-6],
      [f6Tmr(12.5, 10), 0.71675, 5e-6],
      [f6Tmr(0.5, 3), 0.77778, 5e-6],
      [f6Psf(10), 1.03567, 5e-6],
      [f6Psf(6), 1.02638, 5e-6],
    ];
    for (const [actual, expected, tol] of cases) expectAbsClose(actual, expected, tol);
  });
});

describe('phantom L (water | lung 0.25, 5–15 cm | water), s_d = 10 cm', () => {
  // derived test vectors: analytic 6 MV-like TMR fixture, phantom L
  // [depth cm, RTMR, Batho TMR no shift, modified Batho TMR + 1.5 cm]
  const rows: [number, number, number, number][] = [
    [5.5, 1.0107, 1.2074, 1.0076],
    [6, 1.022, 1.0438, 1.0158],
    [10, 1.1302, 1.065, 1.1006],
    [14, 1.2697, 1.1691, 1.2155],
    [15.2, 1.3114, 0.8471, 1.2519],
    [16, 1.3186, 1.1802, 1.2637],
    [20, 1.3477, 1.2949, 1.3102],
    [25, 1.3731, 1.3385, 1.3483],
  ];
  it.each(rows)(
    'at %s cm: rtmr %s, batho %s, batho-modified %s',
    (depth, rtmr, batho, modified) => {
      const p = PHANTOM_L();
      expectAbsClose(cfOf(rtmrMethod, p, depth), rtmr, QUOTED_4_DECIMALS);
      expectAbsClose(unshiftedBathoFormula(p, depth, 'tmr'), batho, QUOTED_4_DECIMALS);
      // Within d_max (1.5 cm) below an interface with |Δρ_e| ≥ 0.1 the method withholds the
      // formula's value (the build-up artefact of L3/L4); elsewhere it gives it.
      if (withinBuildUpOfLung(depth)) expectWithheld(p, depth);
      else expectAbsClose(cfOf(bathoMethod, p, depth), batho, QUOTED_4_DECIMALS);
      expectAbsClose(cfOf(bathoModifiedMethod, p, depth), modified, QUOTED_4_DECIMALS);
    },
  );

  it('batho(..., TAR) gives 1.0374 mid-lung, 1.1761 at 0.5 cm into lung and 1.2949 beyond', () => {
    // derived test vectors: analytic 6 MV-like TMR fixture with its PSF, phantom L, TAR-based Batho
    const p = PHANTOM_L();
    const tar = { bathoTable: 'tar' } as const;
    expectAbsClose(cfOf(bathoMethod, p, 10, tar), 1.0374, QUOTED_4_DECIMALS);
    expectAbsClose(unshiftedBathoFormula(p, 5.5, 'tar'), 1.1761, QUOTED_4_DECIMALS);
    expectWithheld(p, 5.5, tar);
    expectAbsClose(cfOf(bathoMethod, p, 20, tar), 1.2949, QUOTED_4_DECIMALS);
  });

  it('etar(...) with ρ̃ = 0.60 gives 1.2843 at 20 cm (not the PSF-less 1.2959)', () => {
    // derived test vector: analytic 6 MV-like TMR fixture, phantom L, point L1, ETAR TAR form
    const cf = cfOf(etarMethod, PHANTOM_L(), 20, { etarRhoTilde: 0.6 });
    expectAbsClose(cf, 1.2843, QUOTED_4_DECIMALS);
    expect(Math.abs(cf - 1.2959)).toBeGreaterThan(0.005);
  });

  it('etar(...) with ρ̃ = 0.50 gives 1.0827 mid-lung', () => {
    // derived test vector: analytic 6 MV-like TMR fixture, phantom L, point L2
    expectAbsClose(
      cfOf(etarMethod, PHANTOM_L(), 10, { etarRhoTilde: 0.5 }),
      1.0827,
      QUOTED_4_DECIMALS,
    );
  });

  it('unshifted batho(...) withholds the build-up artefact 0.2 cm beyond the lung, naming why', () => {
    const r = bathoMethod.correct(PHANTOM_L(), 15.2, 10, wd, {});
    expect(r.cf).toBeNull();
    expect(r.flags).toEqual([
      'undefined: unshifted Batho 0.20 cm below the interface at 15.00 cm (Δρ_e 0.75), within d_max 1.50 cm: the power law would read the build-up region (use batho-modified)',
    ]);
    expect(bathoMethod.correct(PHANTOM_L(), 20, 10, wd, {}).flags).toEqual([]);
  });
});

describe('phantoms B and G4', () => {
  it.each([
    // derived test vectors: analytic 6 MV-like TMR fixture, phantom B (bone 3–6 cm), point at 10 cm
    [1.8, 0.917, 0.9335, 0.928],
    [1.78, 0.919, 0.9351, 0.9298],
  ])('bone ρ_e %s: rtmr %s, batho %s, batho-modified %s', (rho, rtmr, batho, modified) => {
    const p = PHANTOM_B(rho);
    expectAbsClose(cfOf(rtmrMethod, p, 10), rtmr, QUOTED_4_DECIMALS);
    expectAbsClose(cfOf(bathoMethod, p, 10), batho, QUOTED_4_DECIMALS);
    expectAbsClose(cfOf(bathoModifiedMethod, p, 10), modified, QUOTED_4_DECIMALS);
  });

  it('G4 (bone over lung) at 16 cm: rtmr 1.1510, batho 1.1127, batho-modified 1.1222', () => {
    // derived test vector: analytic 6 MV-like TMR fixture, phantom G4
    const p = PHANTOM_G4();
    expectAbsClose(cfOf(rtmrMethod, p, 16), 1.151, QUOTED_4_DECIMALS);
    expectAbsClose(cfOf(bathoMethod, p, 16), 1.1127, QUOTED_4_DECIMALS);
    expectAbsClose(cfOf(bathoModifiedMethod, p, 16), 1.1222, QUOTED_4_DECIMALS);
  });
});

describe('uniform density and exponential identities', () => {
  it('etar(...) in uniform ρ 0.25 at 20 cm follows O’Connor scaling (1.6097), rtmr gives 1.7288', () => {
    // derived test vector: analytic 6 MV-like TMR fixture; O'Connor 1957 density scaling (from memory)
    const p = slabs([[0.25, 30]]);
    expectAbsClose(cfOf(etarMethod, p, 20), 1.6097, QUOTED_4_DECIMALS); // default kernel weights
    expectAbsClose(cfOf(etarMethod, p, 20, { etarRhoTilde: 0.25 }), 1.6097, QUOTED_4_DECIMALS);
    expectAbsClose(cfOf(rtmrMethod, p, 20), 1.7288, QUOTED_4_DECIMALS);
  });

  it('rtmr, batho and batho-modified all give e^(0.05·0.75·10) = 1.45499 for an exponential TMR', () => {
    // derived test vector: T(d) = e^(−0.05 d), 10 cm slab of ρ_e 0.25 (phantom L), point at 20 cm
    const exp = makeExponentialWaterData(0.05);
    const p = PHANTOM_L();
    for (const m of [rtmrMethod, bathoMethod, bathoModifiedMethod])
      expectRelClose(cfOf(m, p, 20, {}, exp), 1.45499, 1e-5); // quoted to 6 significant digits
  });

  it('a thin slab changes rtmr(...) by +2.62 %/cm of lung and −2.79 %/cm of bone (first order)', () => {
    // derived test vector: −d ln TMR/dd at 10 cm, s = 10, is 0.03493 cm⁻¹ for the fixture
    const h = 1e-4;
    const slope = -(Math.log(f6Tmr(10 + h, 10)) - Math.log(f6Tmr(10 - h, 10))) / (2 * h);
    expectAbsClose(slope, 0.03493, 1e-5);
    // 0.1 cm slab 9.9–10.0 cm; the point 0.05 cm below it. First-order estimates hold to ~1 %.
    const perCm = (rho: number) =>
      (cfOf(
        rtmrMethod,
        slabs([
          [1, 9.9],
          [rho, 0.1],
          [1, 10],
        ]),
        10.05,
      ) -
        1) /
      0.1;
    expectRelClose(perCm(0.25), 0.0262, 0.01);
    expectRelClose(perCm(1.8), -0.0279, 0.01);
  });
});
