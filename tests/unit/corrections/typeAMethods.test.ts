// Behaviour of the individual type-A methods beyond the fixture vectors: variants, options,
// undefined cases and the ETAR scatter weighting. Water data: the analytic 6 MV-like fixture.
import { describe, expect, it } from 'vitest';
import { pddOf } from '../../../src/engine/beam/waterDataFunctions';
import { bathoMethod } from '../../../src/engine/corrections/batho';
import { bathoModifiedMethod } from '../../../src/engine/corrections/bathoModified';
import { eplPddMethod } from '../../../src/engine/corrections/eplPdd';
import { etarMethod } from '../../../src/engine/corrections/etar';
import {
  exponentialKernelWeights,
  weightedDensity,
} from '../../../src/engine/corrections/etarScatterWeights';
import { rtmrMethod } from '../../../src/engine/corrections/rtmr';
import { TYPE_A_METHODS, typeAMethodById } from '../../../src/engine/corrections/typeAMethods';
import { makeF6WaterData } from '../../fixtures/f6WaterData';
import { PHANTOM_L, slabs } from '../../fixtures/slabPhantoms';
import { expectRelClose } from '../../helpers/expectClose';

const wd = makeF6WaterData();

describe('method registry', () => {
  it('TYPE_A_METHODS lists the six stable ids, each with a label and a variant', () => {
    expect(TYPE_A_METHODS.map((m) => m.id)).toEqual([
      'water',
      'rtmr',
      'epl-pdd',
      'batho',
      'batho-modified',
      'etar',
    ]);
    for (const m of TYPE_A_METHODS) {
      expect(m.label.length).toBeGreaterThan(3);
      expect(m.variant({}).length).toBeGreaterThan(3);
    }
    expect(typeAMethodById('batho')).toBe(bathoMethod);
    expect(typeAMethodById('nope')).toBeUndefined();
  });

  it('variants name the choices: Batho table, shift, ETAR ρ̃ source', () => {
    expect(bathoMethod.variant({ bathoTable: 'tar' })).toMatch(/^TAR, no shift, μ₀ ≡ water/);
    expect(bathoModifiedMethod.variant({})).toMatch(/shift z_bu = d_max/);
    expect(etarMethod.variant({ etarRhoTilde: 0.6 })).toMatch(/ρ̃ = 0\.6 \(entered\)/);
    expect(etarMethod.variant({})).toMatch(/exponential scatter kernel/);
    expect(etarMethod.variant({ etarWeights: () => new Float64Array(1) })).toMatch(/supplied/);
  });
});

describe('EPL with PDD', () => {
  it('epl-pdd(...) equals the PDD ratio times ((f+d′)/(f+d))² rebuilt from TMR', () => {
    const p = PHANTOM_L();
    const f = 100;
    const d = 20;
    const sd = (10 * (f + d)) / f;
    const cf = eplPddMethod.correct(p, d, sd, wd, { ssdCm: f }).cf as number;
    const dEff = 12.5;
    const expected = (pddOf(wd, dEff, 10, f) / pddOf(wd, d, 10, f)) * ((f + dEff) / (f + d)) ** 2;
    expectRelClose(cf, expected, 1e-12); // same arithmetic, different order
    // the field at d′ differs from the field at d, so EPL-PDD is close to but not equal to RTMR
    const r = rtmrMethod.correct(p, d, sd, wd, {}).cf as number;
    expect(Math.abs(cf / r - 1)).toBeLessThan(0.01);
    expect(cf).not.toBe(r);
  });

  it('epl-pdd(...) without an SSD gives null with a flag, never NaN', () => {
    const r = eplPddMethod.correct(PHANTOM_L(), 20, 10, wd, {});
    expect(r.cf).toBeNull();
    expect(r.flags[0]).toMatch(/needs the SSD/);
  });
});

describe('Batho options', () => {
  it('batho(...) for a point inside a slab from the surface is T(X)^(ρ − 1)', () => {
    // Batho special case (Khan, from memory): point inside the slab, X = depth into the slab
    const p = slabs([
      [0.3, 10],
      [1, 10],
    ]);
    const cf = bathoMethod.correct(p, 6, 10, wd, {}).cf as number;
    expectRelClose(cf, wd.tmr(6, 10) ** (0.3 - 1), 1e-14);
  });

  it('batho-modified(...) equals batho(...) with every distance shifted by d_max', () => {
    const p = PHANTOM_L();
    const shifted = { ...wd, tmr: (d: number, s: number) => wd.tmr(d + wd.dMaxCm, s) };
    expectRelClose(
      bathoModifiedMethod.correct(p, 17, 10, wd, {}).cf as number,
      bathoMethod.correct(p, 17, 10, shifted, {}).cf as number,
      1e-14,
    );
  });
});

describe('ETAR scatter weighting', () => {
  const weights = exponentialKernelWeights(20);

  it('exponentialKernelWeights gives nearer layers more weight and is symmetric about the point', () => {
    const p = slabs([
      [1, 2],
      [1, 2],
      [1, 2],
      [1, 2],
      [1, 2],
    ]);
    const w = weights(p, 5, 10);
    expect(w[2]).toBeGreaterThan(w[1] as number);
    expect(w[1]).toBeGreaterThan(w[0] as number);
    expectRelClose(w[0] as number, w[4] as number, 1e-12); // mirror layers, same kernel integral
    expectRelClose(w[1] as number, w[3] as number, 1e-12);
  });

  it('a larger field gives distant layers relatively more weight', () => {
    const p = slabs([
      [1, 2],
      [1, 2],
      [1, 10],
    ]);
    const small = weights(p, 3, 4);
    const large = weights(p, 3, 30);
    expect((large[0] as number) / (large[1] as number)).toBeGreaterThan(0);
    expect((large[2] as number) / (large[1] as number)).toBeGreaterThan(
      (small[2] as number) / (small[1] as number),
    );
  });

  it('weightedDensity of a uniform phantom is its density whatever the weights', () => {
    const p = slabs([
      [0.4, 3],
      [0.4, 3],
    ]);
    expectRelClose(weightedDensity(p, new Float64Array([0.2, 0.9])), 0.4, 1e-14);
  });

  it('etar(...) takes a supplied weight function (the kernel-based weighting plugs in here)', () => {
    const p = PHANTOM_L();
    // all weight on the lung layer → ρ̃ = 0.25
    const lungOnly = () => new Float64Array([0, 1, 0]);
    const viaWeights = etarMethod.correct(p, 20, 10, wd, { etarWeights: lungOnly });
    const viaRho = etarMethod.correct(p, 20, 10, wd, { etarRhoTilde: 0.25 });
    expect(viaWeights.cf).toBe(viaRho.cf);
    expect(viaWeights.flags).toContain('ρ̃ = 0.250');
  });

  it('default etar(...) beyond lung lies between the ρ̃ = 1 (RTMR) and ρ̃ = 0.25 extremes', () => {
    const p = PHANTOM_L();
    const cf = etarMethod.correct(p, 20, 10, wd, {}).cf as number;
    const hi = etarMethod.correct(p, 20, 10, wd, { etarRhoTilde: 1 }).cf as number;
    const lo = etarMethod.correct(p, 20, 10, wd, { etarRhoTilde: 0.25 }).cf as number;
    expect(cf).toBeLessThan(hi);
    expect(cf).toBeGreaterThan(lo);
  });
});
