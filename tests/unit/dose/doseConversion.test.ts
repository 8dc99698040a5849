// One dose convention for every method: what each engine computes and how it is converted.
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { calculateCase } from '../../../src/compute/calculateCase';
import { nativeDoseQuantity } from '../../../src/engine/dose/doseConversion';
import { muEnRatioToWater } from '../../../src/engine/dose/muEnRatio';
import { stoppingPowerRatioWaterToMedium } from '../../../src/engine/dose/stoppingPowerRatio';
import { beamSpectrum } from '../../../src/engine/kernels/spectrum';
import { parseCaseText } from '../../../src/io/caseFile';
import { expectRelClose } from '../../helpers/expectClose';

const rib = parseCaseText(readFileSync('public/cases/rib-and-bone-6mv.json', 'utf8'));
if (!rib.ok) throw new Error('demo case');
// A point inside the bone plate (3–5 cm) and one in soft tissue beyond it.
const c = {
  ...rib.value,
  points: [
    { id: 'bone', depthCm: 4 },
    { id: 'tissue', depthCm: 10 },
  ],
};
const opts = {
  depthStepCm: 0.5,
  methods: ['water', 'rtmr', 'batho-modified', 'superposition', 'pencil-beam'],
};
const water = calculateCase(c, { ...opts, doseTo: 'water' });
const medium = calculateCase(c, { ...opts, doseTo: 'medium' });
const at = (r: typeof water, id: string, point: string) =>
  r.methods.find((m) => m.id === id)?.points.find((p) => p.id === point)?.dosePerMuCGy as number;
const spectrum = beamSpectrum('6MV');

describe('convertMethodDose through calculateCase', () => {
  it('names what each engine computes natively', () => {
    expect(['rtmr', 'batho', 'etar', 'water'].map(nativeDoseQuantity)).toEqual([
      'water',
      'water',
      'water',
      'water',
    ]);
    expect(['superposition', 'pencil-beam', 'monte-carlo'].map(nativeDoseQuantity)).toEqual([
      'medium',
      'medium',
      'medium',
    ]);
  });

  it('type A: dose to medium = dose to water × the spectrum-weighted μ_en ratio of the point’s layer', () => {
    // Modified Batho: the unshifted power law gives no value 1 cm below the bone's top (within d_max).
    for (const id of ['rtmr', 'batho-modified']) {
      // Identical arithmetic but for one factor: 1e-12 relative.
      expectRelClose(
        at(medium, id, 'bone') / at(water, id, 'bone'),
        muEnRatioToWater('corticalBone', spectrum),
        1e-12,
      );
      expectRelClose(
        at(medium, id, 'tissue') / at(water, id, 'tissue'),
        muEnRatioToWater('softTissue', spectrum),
        1e-12,
      );
    }
  });

  it('kernel engines: dose to water = dose to medium × s_water,medium of the point’s layer', () => {
    for (const id of ['superposition', 'pencil-beam']) {
      expectRelClose(
        at(water, id, 'bone') / at(medium, id, 'bone'),
        stoppingPowerRatioWaterToMedium('corticalBone', spectrum),
        1e-12,
      );
    }
  });

  it('the water method is the same in both conventions, and every method prints its convention', () => {
    expect(at(medium, 'water', 'bone')).toBe(at(water, 'water', 'bone'));
    expect(water.doseTo).toBe('water');
    expect(medium.doseTo).toBe('medium');
    for (const m of medium.methods) expect(m.dose?.quantity).toBe('medium');
    expect(medium.methods.find((m) => m.id === 'rtmr')?.dose?.conversion).toMatch(/μ_en/);
    expect(water.methods.find((m) => m.id === 'superposition')?.dose?.conversion).toMatch(
      /stopping-power ratio \(ESTAR\)/,
    );
    expect(water.methods.find((m) => m.id === 'rtmr')?.dose?.conversion).toBe('native');
  });

  it('the default convention is dose to water', () => {
    expect(calculateCase(c, { ...opts, methods: ['rtmr'] }).doseTo).toBe('water');
  });
});

describe('the dose planes follow the same convention', () => {
  it('typeBDosePlane(...) rows in bone scale by s_water,medium, rows in water not at all', async () => {
    const { typeBDosePlane } = await import('../../../src/engine/superposition/typeBMethods');
    const { makeSlabPhantom } = await import('../../../src/engine/phantom/slabPhantom');
    const phantom = makeSlabPhantom([
      { materialId: 'water', thicknessCm: 3 },
      { materialId: 'corticalBone', thicknessCm: 2 },
      { materialId: 'water', thicknessCm: 5 },
    ]);
    const beam = { ssdCm: 100, fieldXCm: 10, fieldYCm: 10 };
    const o = { method: 'pencil-beam' as const, stepCm: 1, halfWidthCm: 2 };
    const m = typeBDosePlane('6MV', phantom, beam, { ...o, doseTo: 'medium' });
    const w = typeBDosePlane('6MV', phantom, beam, { ...o, doseTo: 'water' });
    const row = (p: typeof m, depthCm: number) => p.dosePerMuCGy[p.depthCm.indexOf(depthCm)]!;
    // Depth 4 cm lies in bone, 8 cm in water: one factor per row, exact arithmetic otherwise.
    row(w, 4).forEach((v, i) =>
      expectRelClose(
        v / row(m, 4)[i]!,
        stoppingPowerRatioWaterToMedium('corticalBone', spectrum),
        1e-12,
      ),
    );
    expect(row(w, 8)).toEqual(row(m, 8));
  });
});
