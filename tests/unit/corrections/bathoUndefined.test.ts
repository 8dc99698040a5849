// Unshifted Batho is withheld (null, with the reason) within d_max below an interface whose
// exponent |Δρ_e| ≥ 0.1: there the power law reads the build-up part of the table (undefined,
// Thomas 1991, from memory). The power law divides by the table's build-up values: with the
// modelled 6 MV beam (photons and its fitted contaminant electrons) it gives CF 5.3 below dense
// bone and 3.7 inside a thin air gap (derived: the formula on the modelled table); with the earlier
// photon-only beam (TMR(0) ≈ 0.03) these inputs showed CF 22 and 6.2.
import { describe, expect, it } from 'vitest';
import { bathoMethod, bathoPowerLawProduct } from '../../../src/engine/corrections/batho';
import { modelledWaterData } from '../../../src/engine/beam/modelledBeam';
import { makeSlabPhantom } from '../../../src/engine/phantom/slabPhantom';
import { calculateCase } from '../../../src/compute/calculateCase';
import { validateCase } from '../../../src/io/caseFile';

const wd = modelledWaterData('6MV');
const formula = (p: ReturnType<typeof makeSlabPhantom>, d: number) =>
  bathoPowerLawProduct(p, d, 0, (x) => wd.tmr(x, 10)).product;

describe('unshifted Batho where the power law is undefined', () => {
  it('water just below dense bone (3 g/cm³): the power law gives CF > 5, the method no value', () => {
    const p = makeSlabPhantom([
      { materialId: 'water', thicknessCm: 3 },
      { materialId: 'corticalBone', thicknessCm: 2, densityGPerCm3: 3 },
      { materialId: 'water', thicknessCm: 10 },
    ]);
    expect(formula(p, 5.1)).toBeGreaterThan(5);
    const r = bathoMethod.correct(p, 5.1, 10, wd, {});
    expect(r.cf).toBeNull();
    expect(r.flags).toEqual([
      `undefined: unshifted Batho 0.10 cm below the interface at 5.00 cm (Δρ_e ${(1 - p.layers[1]!.relativeElectronDensity).toFixed(2)}), within d_max ${wd.dMaxCm.toFixed(2)} cm: the power law would read the build-up region (use batho-modified)`,
    ]);
    // d_max below the bone the value is back, and plausible (bone upstream: CF < 1).
    const beyond = bathoMethod.correct(p, 5 + wd.dMaxCm + 0.01, 10, wd, {}).cf;
    expect(beyond).toBeGreaterThan(0.8);
    expect(beyond).toBeLessThan(1);
  });

  it('inside a 0.1 cm air gap: the power law gives 3.7, the method no value', () => {
    const p = makeSlabPhantom([
      { materialId: 'water', thicknessCm: 5 },
      { materialId: 'air', thicknessCm: 0.1 },
      { materialId: 'water', thicknessCm: 10 },
    ]);
    expect(formula(p, 5.05)).toBeCloseTo(3.67, 1);
    expect(bathoMethod.correct(p, 5.05, 10, wd, {}).cf).toBeNull();
  });

  it('soft tissue against water (|Δρ_e| 0.05) keeps its value, flagged', () => {
    const p = makeSlabPhantom([{ materialId: 'softTissue', thicknessCm: 10 }]);
    const r = bathoMethod.correct(p, 0.5, 10, wd, {});
    expect(r.cf).toBeGreaterThan(0.9);
    expect(r.flags.some((f) => f.startsWith('unshifted Batho: 0.50 cm from an interface'))).toBe(
      true,
    );
  });

  it('in a case the curve has a gap below the interface, the warning says why, batho-modified fills it', () => {
    const c = validateCase({
      format: 'lamina.case',
      version: 1,
      name: 'gap',
      beam: { energy: '6MV', setup: { kind: 'SSD', ssdCm: 100 }, fieldXCm: 10, fieldYCm: 10 },
      layers: [
        { materialId: 'water', thicknessCm: 5 },
        { materialId: 'lung', thicknessCm: 5 },
        { materialId: 'water', thicknessCm: 10 },
      ],
      points: [{ id: 'P', depthCm: 10.5 }],
    });
    if (!c.ok) throw new Error('case invalid');
    const r = calculateCase(c.value, { methods: ['batho', 'batho-modified'], depthStepCm: 0.1 });
    const [batho, modified] = r.methods;
    r.depthCm.forEach((d, i) => {
      const inGap = (d > 5 && d - 5 < wd.dMaxCm) || (d > 10 && d - 10 < wd.dMaxCm);
      expect(batho!.curve.cf[i] === null, `batho at ${d} cm`).toBe(inGap);
      expect(modified!.curve.cf[i]).not.toBeNull();
    });
    expect(batho!.points[0]!.dosePerMuCGy).toBeNull();
    const w = r.warnings.find((x) => x.id === 'UNSHIFTED-BATHO@layer3')!;
    expect(w.severity).toBe('severe');
    expect(w.explanation).toMatch(/Batho gives no value here/);
  });
});
