// The written-out terms of each type-A method (correctionExplanation.ts): the factors each method
// multiplied, checked against hand calculations from the fixture vectors of the physics notes
// (§5.2: analytic "6 MV-like" water data F6, phantom L; derived) and against the method's own CF.
import { describe, expect, it } from 'vitest';
import { bathoMethod } from '../../../src/engine/corrections/batho';
import { bathoModifiedMethod } from '../../../src/engine/corrections/bathoModified';
import { productOfFactors } from '../../../src/engine/corrections/correctionExplanation';
import { eplPddMethod } from '../../../src/engine/corrections/eplPdd';
import { etarMethod } from '../../../src/engine/corrections/etar';
import { rtmrMethod } from '../../../src/engine/corrections/rtmr';
import { TYPE_A_METHODS } from '../../../src/engine/corrections/typeAMethods';
import { waterMethod } from '../../../src/engine/corrections/water';
import { makeF6WaterData } from '../../fixtures/f6WaterData';
import { PHANTOM_G4, PHANTOM_L } from '../../fixtures/slabPhantoms';
import { expectRelClose } from '../../helpers/expectClose';

const wd = makeF6WaterData();
// Phantom L, fixture s_d = 10 cm at every depth (no divergence), as in the fixture table.
const S = 10;
const quantity = (r: ReturnType<typeof rtmrMethod.correct>, symbol: string) =>
  r.explanation?.quantities.find((q) => q.symbol === symbol)?.value;

describe('Batho written out per layer', () => {
  it('bathoMethod.correct(L, 20 cm) lists T(15)^−0.75 for the lung and T(5)^+0.75 for the water below, product 1.2949', () => {
    const r = bathoMethod.correct(PHANTOM_L(), 20, S, wd, { explain: true });
    const layers = r.explanation?.bathoLayers ?? [];
    expect(layers.map((l) => l.exponent)).toEqual([0, -0.75, 0.75]);
    expect(layers.map((l) => l.distanceCm)).toEqual([20, 15, 5]);
    expect(layers[0]?.factor).toBe(1);
    expect(layers[0]?.depthFunction).toBeNull();
    // derived: fixture TMR(15, 10) = 0.65142, TMR(5, 10) = 0.91943 (physics notes §5.2);
    // 0.65142^−0.75 = 1.37911, 0.91943^0.75 = 0.93894; 5-digit table values: 1e-4
    expectRelClose(layers[1]?.depthFunction as number, 0.65142, 1e-4);
    expectRelClose(layers[1]?.factor as number, 1.37911, 1e-4);
    expectRelClose(layers[2]?.depthFunction as number, 0.91943, 1e-4);
    expectRelClose(layers[2]?.factor as number, 0.93894, 1e-4);
    // Generalized Batho L1 (P 5 cm beyond lung) = 1.2949 (physics notes §5.2, derived)
    expectRelClose(r.cf as number, 1.2949, 1e-4);
    expect(r.explanation?.factors.map((f) => f.value)).toEqual([
      layers[1]?.factor,
      layers[2]?.factor,
    ]);
    expect(productOfFactors(r.explanation?.factors ?? [])).toBe(r.cf);
  });

  it('bathoModifiedMethod.correct(L, 20 cm) reads every TMR d_max deeper: T(16.5)^−0.75 · T(6.5)^0.75 = 1.3102', () => {
    const r = bathoModifiedMethod.correct(PHANTOM_L(), 20, S, wd, { explain: true });
    const layers = r.explanation?.bathoLayers ?? [];
    expect(layers.map((l) => l.readAtCm)).toEqual([21.5, 16.5, 6.5]);
    // Modified Batho L1 = 1.3102 (physics notes §5.2, derived)
    expectRelClose(r.cf as number, 1.3102, 1e-4);
    expect(productOfFactors(r.explanation?.factors ?? [])).toBe(r.cf);
  });

  it('bathoMethod.correct(G4, 16 cm) has one factor per density step: bone in, bone→lung, lung→water', () => {
    const r = bathoMethod.correct(PHANTOM_G4(), 16, S, wd, { explain: true });
    const layers = r.explanation?.bathoLayers ?? [];
    expect(layers.map((l) => l.exponent)).toEqual([0, 0.8, 0.25 - 1.8, 0.75]);
    expect(r.explanation?.factors).toHaveLength(3);
    // G4: 4 cm beyond lung, bone above: Batho 1.1127 (physics notes §5.2, derived)
    expectRelClose(r.cf as number, 1.1127, 1e-4);
    expect(productOfFactors(r.explanation?.factors ?? [])).toBe(r.cf);
  });
});

describe('effective-depth methods written out', () => {
  it('rtmrMethod.correct(L, 20 cm): d′ = 5 + 10·0.25 + 5 = 12.5 cm, TMR(12.5)/TMR(20) = 1.3477', () => {
    const r = rtmrMethod.correct(PHANTOM_L(), 20, S, wd, { explain: true });
    expect(quantity(r, 'd′')).toBeCloseTo(12.5, 12);
    // derived: fixture TMR(12.5, 10) = 0.71675 (physics notes §5.2)
    expectRelClose(quantity(r, 'TMR(d′, s_d)') as number, 0.71675, 1e-4);
    // derived: TMR(20, 10) = TMR(10, 10) · 0.678 = 0.78455 · 0.678 = 0.53192 (3-digit ratio: 1e-3)
    expectRelClose(quantity(r, 'TMR(d, s_d)') as number, 0.53192, 1e-3);
    // RTAR (TMR) L1 = 1.3477 (physics notes §5.2, derived)
    expectRelClose(r.explanation?.factors[0]?.value as number, 1.3477, 1e-4);
    expect(productOfFactors(r.explanation?.factors ?? [])).toBe(r.cf);
  });

  it('eplPddMethod.correct(L, 20 cm, f = 100) writes the inverse-square term ((100+12.5)/(100+20))² = 0.87891', () => {
    const r = eplPddMethod.correct(PHANTOM_L(), 20, S, wd, { ssdCm: 100, explain: true });
    const isq = r.explanation?.factors.find((f) => f.symbol === '((f+d′)/(f+d))²');
    // EPL-with-PDD inverse-square factor for L1 (physics notes §5.2, derived)
    expectRelClose(isq?.value as number, 0.87891, 1e-5);
    expect(r.explanation?.factors).toHaveLength(2);
    expect(productOfFactors(r.explanation?.factors ?? [])).toBe(r.cf);
  });

  it('etarMethod.correct(L, 20 cm, ρ̃ = 0.6) writes the TMR and PSF ratios, product 1.2843, s̃ = 6 cm', () => {
    const r = etarMethod.correct(PHANTOM_L(), 20, S, wd, { etarRhoTilde: 0.6, explain: true });
    expect(quantity(r, 'ρ̃')).toBe(0.6);
    expect(quantity(r, 's̃ = ρ̃·s_d')).toBeCloseTo(6, 12);
    // r̃ = ρ̃·s/√π for the disc of equal area: 6/√π = 3.38514 (derived)
    expectRelClose(quantity(r, 'r̃ = ρ̃·r') as number, 3.38514, 1e-5);
    // ETAR L1 with ρ̃ = 0.60 → 1.2843; without the PSF ratio 1.2959 (physics notes §5.2, derived)
    expectRelClose(r.cf as number, 1.2843, 1e-4);
    expectRelClose(r.explanation?.factors[0]?.value as number, 1.2959, 1e-4);
    // derived: PSF(6)/PSF(10) = 1.02638/1.03567
    expectRelClose(r.explanation?.factors[1]?.value as number, 1.02638 / 1.03567, 1e-4);
    expect(productOfFactors(r.explanation?.factors ?? [])).toBe(r.cf);
  });

  it('etarMethod.correct with the default weighting lists one scatter weight per layer', () => {
    const r = etarMethod.correct(PHANTOM_L(), 20, S, wd, { explain: true });
    const weights = r.explanation?.quantities.filter((q) => q.symbol.startsWith('W_')) ?? [];
    expect(weights).toHaveLength(3);
    for (const w of weights) expect(w.value).toBeGreaterThanOrEqual(0);
    expect(productOfFactors(r.explanation?.factors ?? [])).toBe(r.cf);
  });

  it('waterMethod.correct has no factors: the empty product, 1', () => {
    const r = waterMethod.correct(PHANTOM_L(), 20, S, wd, { explain: true });
    expect(r.explanation?.factors).toEqual([]);
    expect(r.cf).toBe(1);
  });

  it('every type-A method writes out a product that is its CF, at depths across phantom L', () => {
    for (const m of TYPE_A_METHODS)
      for (const d of [0.5, 3, 5, 5.5, 10, 15, 15.2, 22, 30]) {
        const r = m.correct(PHANTOM_L(), d, S, wd, { ssdCm: 100, explain: true });
        if (r.cf === null) continue;
        expect(productOfFactors(r.explanation?.factors ?? []), `${m.id} at ${d} cm`).toBe(r.cf);
      }
  });
});
