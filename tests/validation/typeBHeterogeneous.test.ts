// Type-B engines in slabs, the modelled water data built from them, and their plumbing into the
// case calculation and the worker API.
import { describe, expect, it } from 'vitest';
import { makeSlabPhantom, waterPhantom } from '../../src/engine/phantom/slabPhantom';
import { typeBDosePerMu } from '../../src/engine/superposition/typeBDose';
import { typeBDosePlane } from '../../src/engine/superposition/typeBMethods';
import { modelledBeamTables, modelledWaterData } from '../../src/engine/beam/modelledBeam';
import { BEAM_ENERGIES } from '../../src/engine/beam/energies';
import { etarScatterWeights, etarWeightedDensity } from '../../src/engine/kernels/scatterWeights';
import { calculateCase } from '../../src/compute/calculateCase';
import { computeApi } from '../../src/compute/computeApi';
import { parseCaseText } from '../../src/io/caseFile';
import { readFileSync } from 'node:fs';
import { expectAbsClose, expectRelClose } from '../helpers/expectClose';

const lungSlab = makeSlabPhantom([
  { materialId: 'water', thicknessCm: 5 },
  { materialId: 'water', thicknessCm: 10, densityGPerCm3: 0.25 },
  { materialId: 'water', thicknessCm: 15 },
]);

describe('superposition against pencil beam in a lung slab', () => {
  it('18 MV, 5 × 5, 10 cm of ρ 0.25: superposition dose inside the lung is lower than pencil beam', () => {
    // Loss of lateral electronic equilibrium in low density for small high-energy fields, which a
    // 1-D scaled pencil beam cannot see (Miften et al. 2001; Fogliata et al. 2007). From 4 cm
    // into the lung the lateral loss amounts to several per cent; 5 % is a margin below the
    // ≈ 7–15 % found here, and far above the 1 % the two engines agree to in water.
    const beam = { ssdCm: 100, fieldXCm: 5, fieldYCm: 5 };
    const depths = [9, 11, 13];
    const sup = typeBDosePerMu('superposition', '18MV', lungSlab, beam, depths, [0]);
    const pb = typeBDosePerMu('pencil-beam', '18MV', lungSlab, beam, depths, [0]);
    depths.forEach((_, i) => expect(sup[i] as number).toBeLessThan(0.95 * (pb[i] as number)));
  });

  it('both engines raise the dose beyond the lung above water (less attenuation)', () => {
    const beam = { ssdCm: 100, fieldXCm: 10, fieldYCm: 10 };
    for (const engine of ['superposition', 'pencil-beam'] as const) {
      const het = typeBDosePerMu(engine, '6MV', lungSlab, beam, [20], [0]);
      const water = typeBDosePerMu(engine, '6MV', waterPhantom(30), beam, [20], [0]);
      expect((het[0] as number) / (water[0] as number)).toBeGreaterThan(1.1);
    }
  });
});

describe('typeBDosePlane', () => {
  it('is symmetric across the axis, equals the central-axis curve on the axis and falls outside the field', () => {
    const beam = { ssdCm: 100, fieldXCm: 10, fieldYCm: 10 };
    const plane = typeBDosePlane('6MV', lungSlab, beam, { stepCm: 0.5, profileDepthsCm: [10] });
    const nx = plane.lateralCm.length;
    const mid = (nx - 1) / 2;
    expectAbsClose(plane.lateralCm[mid] as number, 0, 1e-12);
    const iz = plane.depthCm.indexOf(10);
    const row = plane.dosePerMuCGy[iz]!;
    for (let k = 1; k <= mid; k++)
      expectRelClose(row[mid + k] as number, row[mid - k] as number, 1e-9);
    const cax = typeBDosePerMu('superposition', '6MV', lungSlab, beam, [10], [0]);
    // Plane (node-interpolated lateral path) vs direct central-axis evaluation: 0.5 %.
    expectRelClose(row[mid] as number, cax[0] as number, 0.005);
    // 5.5 cm off axis at 10 cm depth is outside the 11 cm field at that depth.
    const outside = row[plane.lateralCm.findIndex((x) => x >= 8)] as number;
    expect(outside).toBeLessThan(0.2 * (row[mid] as number));
    expect(plane.profiles[0]!.dosePerMuCGy).toHaveLength(nx);
  });
});

describe('modelled water data', () => {
  it('6 MV 10 × 10 at SSD 100: d_max 1.2–1.8 cm and PDD(10) 64–69 %', () => {
    // Typical published 6 MV beams, from memory: d_max 1.4–1.6 cm, PDD(10) ≈ 66.5–67.5 %.
    const b = modelledBeamTables('6MV');
    expect(b.dMaxCm).toBeGreaterThanOrEqual(1.2);
    expect(b.dMaxCm).toBeLessThanOrEqual(1.8);
    expect(b.pdd10).toBeGreaterThanOrEqual(64);
    expect(b.pdd10).toBeLessThanOrEqual(69);
  });

  it('18 MV 10 × 10 at SSD 100: PDD(10) 76–82 % and d_max 2.8–3.8 cm', () => {
    // Typical published 18 MV beams, from memory: PDD(10) 76–82 %, d_max 2.8–3.8 cm. The 18 MV
    // spectrum is a derived stand-in tuned on PDD(10) and TPR20,10, so d_max is an independent
    // check (tighter checks of every beam: modelledBeamQuality.test.ts).
    const b = modelledBeamTables('18MV');
    expect(b.pdd10).toBeGreaterThanOrEqual(76);
    expect(b.pdd10).toBeLessThanOrEqual(82);
    expect(b.dMaxCm).toBeGreaterThanOrEqual(2.8);
    expect(b.dMaxCm).toBeLessThanOrEqual(3.8);
  });

  it.each([...BEAM_ENERGIES])(
    '%s: TPR20,10 matches 1.2661·PDD20,10 − 0.0595 within 0.01',
    (energy) => {
      // IAEA TRS-398 (2000) / Followill et al. 1998: TPR20,10 = 1.2661·PDD20,10 − 0.0595.
      const b = modelledBeamTables(energy);
      expectAbsClose(b.tpr2010, 1.2661 * b.pdd2010 - 0.0595, 0.01);
    },
  );

  it('modelledWaterData(...) interpolates the tables: TMR(d_max, s) = 1, S_p(10) = S_c(10) = 1', () => {
    const w = modelledWaterData('10MV');
    expect(w.source).toMatch(/^modelled beam \(10MV, generated \d{4}-\d{2}-\d{2}\)$/);
    for (const s of [3, 10, 27.5]) expectRelClose(w.tmr(w.dMaxCm, s), 1, 2e-3);
    expectRelClose(w.sp(10), 1, 1e-9);
    expectRelClose(w.sc(10), 1, 1e-9);
    expect(w.sp(5)).toBeLessThan(1);
    expect(w.sp(20)).toBeGreaterThan(1);
    expect(w.tmr(20, 10)).toBeLessThan(w.tmr(10, 10));
    const flags: unknown[] = [];
    w.tmr(55, 10, { flag: (f) => flags.push(f) });
    expect(flags).toHaveLength(1);
  });
});

describe('modelled water data against the engine it came from', () => {
  it.each([
    ['6MV', 10, 10],
    ['6MV', 6, 5],
    ['18MV', 15, 20],
  ] as const)(
    '%s, isocentre at %i cm, %i cm field (SAD 100): dose per MU = TMR·S_c·S_p·((100 + d_max)/100)²',
    (energy, depthCm, side) => {
      // The classic isocentric MU relation (Khan, from memory) with the modelled tables must give
      // back the superposition's own dose per MU; 0.5 % covers the table interpolation in depth
      // and field and the slightly different divergence of the two geometries.
      const w = modelledWaterData(energy);
      const predicted =
        w.tmr(depthCm, side) * w.sc(side) * w.sp(side) * ((100 + w.dMaxCm) / 100) ** 2;
      const engine = typeBDosePerMu(
        'superposition',
        energy,
        waterPhantom(40),
        { ssdCm: 100 - depthCm, fieldXCm: side, fieldYCm: side },
        [depthCm],
        [0],
      );
      expectRelClose(engine[0] as number, predicted * w.referenceDosePerMuCGy, 0.005);
    },
  );
});

describe('etarScatterWeights', () => {
  it('sums to 1, and a uniform phantom gives ρ̃ equal to its density', () => {
    const w = etarScatterWeights('6MV', lungSlab, 20, 10);
    expectRelClose(
      w.reduce((a, b) => a + b, 0),
      1,
      1e-12,
    );
    const uniform = makeSlabPhantom([
      { materialId: 'water', thicknessCm: 10, densityGPerCm3: 0.5 },
      { materialId: 'water', thicknessCm: 20, densityGPerCm3: 0.5 },
    ]);
    expectRelClose(etarWeightedDensity('6MV', uniform, 15, 10), 0.5, 1e-12);
  });

  it('weights the layers near the point most: ρ̃ at 20 cm lies between the lung and water', () => {
    const rho = etarWeightedDensity('6MV', lungSlab, 20, 10);
    expect(rho).toBeGreaterThan(0.5);
    expect(rho).toBeLessThan(1);
    const w = etarScatterWeights('6MV', lungSlab, 20, 10);
    expect(w[2] as number).toBeGreaterThan(w[0] as number);
  });
});

describe('type-B methods in the case calculation', () => {
  const demo = parseCaseText(readFileSync('public/cases/lung-slab-6mv.json', 'utf8'));

  it("calculateCase(...) returns 'pencil-beam' and 'superposition' as type-B MethodResults", () => {
    if (!demo.ok) throw new Error('demo case invalid');
    const r = calculateCase(demo.value, {
      methods: ['pencil-beam', 'superposition'],
      depthStepCm: 0.5,
    });
    expect(r.unavailable).toEqual([]);
    expect(r.methods.map((m) => m.id)).toEqual(['pencil-beam', 'superposition']);
    for (const m of r.methods) {
      expect(m.methodClass).toBe('type B');
      expect(m.waterData).toMatch(/^modelled beam \(6MV/);
      expect(m.variant).toMatch(/contaminant electrons \(fitted surface doses\)/);
      expect(m.curve.dosePerMuCGy).toHaveLength(r.depthCm.length);
      expect(m.points.map((p) => p.id)).toEqual(['P1', 'in-lung']);
      // Demo case: 3 cm soft tissue, 8 cm lung, mediastinum; P1 at 15 cm lies beyond the lung.
      expect(m.points[0]!.cf as number).toBeGreaterThan(1);
    }
  });

  it('gives CF = 1 in water for both engines', () => {
    if (!demo.ok) throw new Error('demo case invalid');
    const water = { ...demo.value, layers: [{ materialId: 'water' as const, thicknessCm: 20 }] };
    const r = calculateCase(water, { methods: ['pencil-beam', 'superposition'], depthStepCm: 1 });
    for (const m of r.methods) for (const cf of m.curve.cf) expectRelClose(cf as number, 1, 1e-12);
  });

  it('computeApi.dosePlane(...) returns the plane and a profile per point, or the problems', () => {
    const raw: unknown = JSON.parse(readFileSync('public/cases/lung-slab-6mv.json', 'utf8'));
    const r = computeApi.dosePlane(raw, { stepCm: 1 });
    if (!r.ok) throw new Error(JSON.stringify(r.problems));
    expect(r.plane.method).toBe('superposition');
    expect(r.plane.dosePerMuCGy).toHaveLength(r.plane.depthCm.length);
    expect(r.plane.profiles.map((p) => p.depthCm)).toEqual([15, 7]);
    const bad = computeApi.dosePlane({ format: 'lamina.case' });
    expect(bad.ok).toBe(false);
  });
});
