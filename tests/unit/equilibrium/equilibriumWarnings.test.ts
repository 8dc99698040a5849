import type { MethodId } from '../../../src/engine/methodRegistry';
import { describe, expect, it } from 'vitest';
import {
  equilibriumWarnings,
  extrapolationEventsOfMethods,
  warningsAtDepth,
  withWarningFlags,
  type EquilibriumInput,
  type Warning,
} from '../../../src/engine/equilibrium';
import { makeSlabPhantom, waterPhantom } from '../../../src/engine/phantom/slabPhantom';
import type { MethodResult } from '../../../src/engine/methodResult';
import { expectAbsClose } from '../../helpers/expectClose';

// ρ_e exactly 0.25 and 1.8 from NIST SRD 126 Z/A (lung 0.55048, cortical bone 0.51478, water 0.55508).
const LUNG_025 = (0.25 * 0.55508) / 0.55048;
const BONE_18 = (1.8 * 0.55508) / 0.51478;

function lungPhantom() {
  return makeSlabPhantom([
    { materialId: 'water', thicknessCm: 5 },
    { materialId: 'lung', thicknessCm: 10, densityGPerCm3: LUNG_025 },
    { materialId: 'water', thicknessCm: 15 },
  ]);
}

function input(over: Partial<EquilibriumInput> = {}): EquilibriumInput {
  return {
    phantom: lungPhantom(),
    beam: { energy: '6MV', ssdCm: 100, fieldXCm: 10, fieldYCm: 10 },
    dMaxCm: 1.5,
    tpr2010: 0.67,
    qualitySource: 'water data: test',
    ...over,
  };
}

const byId = (ws: Warning[], id: string) => ws.find((w) => w.id === id);

describe('equilibriumWarnings: interfaces', () => {
  const ws = equilibriumWarnings(input());

  it('equilibriumWarnings puts a build-down band of d_max/ρ = 6 cm inside lung below its top face', () => {
    const w = byId(ws, 'INTERFACE-DOWNSTREAM@layer2');
    expect(w?.code).toBe('INTERFACE-DOWNSTREAM');
    // Derived: 1.5 cm water-equivalent in ρ_e 0.25 spans 6 cm. Tolerance: round-off only.
    expectAbsClose(w?.depthRangeCm.fromCm ?? NaN, 5, 1e-9);
    expectAbsClose(w?.depthRangeCm.toCm ?? NaN, 11, 1e-9);
    expect(w?.numbers).toMatch(/build-down/);
  });

  it('equilibriumWarnings puts a re-build-up band of d_max = 1.5 cm in water below the lung', () => {
    const w = byId(ws, 'INTERFACE-DOWNSTREAM@layer3');
    expectAbsClose(w?.depthRangeCm.fromCm ?? NaN, 15, 1e-9);
    expectAbsClose(w?.depthRangeCm.toCm ?? NaN, 16.5, 1e-9);
    expect(w?.numbers).toMatch(/re-build-up/);
    expect(w?.methods.concerned).toEqual(expect.arrayContaining(['rtmr', 'batho', 'etar']));
    expect(w?.methods.unaffected).toContain('monte-carlo');
  });

  it('equilibriumWarnings scales the interface band with d_max', () => {
    const w = byId(equilibriumWarnings(input({ dMaxCm: 3 })), 'INTERFACE-DOWNSTREAM@layer3');
    expectAbsClose(w?.depthRangeCm.toCm ?? NaN, 18, 1e-9);
  });

  it('equilibriumWarnings ends a build-down band at the next significant interface', () => {
    const thinLung = makeSlabPhantom([
      { materialId: 'water', thicknessCm: 5 },
      { materialId: 'lung', thicknessCm: 2, densityGPerCm3: LUNG_025 },
      { materialId: 'water', thicknessCm: 15 },
    ]);
    const w = byId(
      equilibriumWarnings(input({ phantom: thinLung })),
      'INTERFACE-DOWNSTREAM@layer2',
    );
    expect(w?.depthRangeCm).toEqual({ fromCm: 5, toCm: 7 });
  });

  it('equilibriumWarnings ignores density steps below 0.1', () => {
    const soft = makeSlabPhantom([
      { materialId: 'water', thicknessCm: 5 },
      { materialId: 'softTissue', thicknessCm: 10 },
    ]);
    const ws2 = equilibriumWarnings(input({ phantom: soft }));
    expect(ws2.filter((w) => w.code === 'INTERFACE-DOWNSTREAM')).toHaveLength(0);
  });

  it('equilibriumWarnings flags unshifted Batho within d_max below each face and only for batho', () => {
    const w = byId(ws, 'UNSHIFTED-BATHO@layer3');
    expect(w?.depthRangeCm).toEqual({ fromCm: 15, toCm: 16.5 });
    expect(w?.methods.concerned).toEqual(['batho']);
    expect(w?.methods.unaffected).toContain('batho-modified');
    // |Δρ_e| = 0.75 ≥ 0.5: the fixture shows a 20 % artefact at 0.2 cm beyond lung (derived).
    expect(w?.severity).toBe('severe');
  });
});

describe('equilibriumWarnings: homogeneous water', () => {
  it('equilibriumWarnings raises nothing in water beyond d_max', () => {
    const ws = equilibriumWarnings(
      input({ phantom: waterPhantom(30), points: [{ id: 'P', depthCm: 10 }] }),
    );
    expect(ws.map((w) => w.code)).toEqual(['BUILDUP']);
    expect(warningsAtDepth(ws, 1.6)).toHaveLength(0);
    expect(warningsAtDepth(ws, 10)).toHaveLength(0);
  });

  it('equilibriumWarnings limits BUILDUP to d′ < d_max, i.e. d_max/ρ in a low-density first layer', () => {
    const water = equilibriumWarnings(input({ phantom: waterPhantom(30) }));
    expect(water[0]?.depthRangeCm).toEqual({ fromCm: 0, toCm: 1.5 });
    expect(water[0]?.severity).toBe('note');
    const lungFirst = makeSlabPhantom([
      { materialId: 'lung', thicknessCm: 4, densityGPerCm3: LUNG_025 },
      { materialId: 'water', thicknessCm: 20 },
    ]);
    const w = byId(equilibriumWarnings(input({ phantom: lungFirst })), 'BUILDUP');
    // Derived: 4 cm of ρ 0.25 give d′ = 1.0 cm; the remaining 0.5 cm of d_max lies in water.
    expectAbsClose(w?.depthRangeCm.toCm ?? NaN, 4.5, 1e-9);
  });

  it('equilibriumWarnings lists the points inside each range', () => {
    const ws = equilibriumWarnings(
      input({
        points: [
          { id: 'deep', depthCm: 25 },
          { id: 'exit', depthCm: 15.2 },
        ],
      }),
    );
    expect(byId(ws, 'INTERFACE-DOWNSTREAM@layer3')?.pointIds).toEqual(['exit']);
    expect(ws.some((w) => w.pointIds.includes('deep'))).toBe(false);
  });
});

describe('equilibriumWarnings: density extremes', () => {
  it('equilibriumWarnings raises HIGH-Z over a bone layer and not over soft tissue', () => {
    const bone = makeSlabPhantom([
      { materialId: 'water', thicknessCm: 3 },
      { materialId: 'corticalBone', thicknessCm: 3, densityGPerCm3: BONE_18 },
      { materialId: 'softTissue', thicknessCm: 14 },
    ]);
    const ws = equilibriumWarnings(input({ phantom: bone }));
    const w = byId(ws, 'HIGH-Z@layer2');
    expect(w?.depthRangeCm).toEqual({ fromCm: 3, toCm: 6 });
    expect(w?.numbers).toMatch(/1\.800 > 1\.3/);
    expect(ws.filter((x) => x.code === 'HIGH-Z')).toHaveLength(1);
  });

  it('equilibriumWarnings raises LOW-DENSITY over an air cavity and d_max beyond it', () => {
    const cavity = makeSlabPhantom([
      { materialId: 'water', thicknessCm: 3 },
      { materialId: 'air', thicknessCm: 2 },
      { materialId: 'water', thicknessCm: 15 },
    ]);
    const ws = equilibriumWarnings(input({ phantom: cavity }));
    const w = byId(ws, 'LOW-DENSITY@layer2');
    expect(w?.depthRangeCm).toEqual({ fromCm: 3, toCm: 6.5 });
    // 2 cm ≥ 1 cm: severe by the stated threshold.
    expect(w?.severity).toBe('severe');
    // Air (ρ_e ≈ 0.001) has no lateral equilibrium for any field.
    expect(ws.some((x) => x.code === 'LED' && x.severity === 'severe')).toBe(true);
  });
});

describe('equilibriumWarnings: beam quality source', () => {
  it('equilibriumWarnings uses typical values for the energy and says so when no water data is given', () => {
    const ws = equilibriumWarnings({
      phantom: lungPhantom(),
      beam: { energy: '18MV', ssdCm: 100, fieldXCm: 5, fieldYCm: 5 },
    });
    const led = ws.find((w) => w.code === 'LED');
    expect(led?.numbers).toMatch(/from memory/);
    expect(led?.numbers).toMatch(/TPR20,10 0\.780/);
  });

  it('equilibriumWarnings names the water data when it supplies d_max and TPR20,10', () => {
    const ws = equilibriumWarnings(input());
    expect(ws[0]?.numbers).toMatch(/water data: test/);
    expect(ws[0]?.numbers).not.toMatch(/from memory/);
  });
});

describe('equilibriumWarnings: extrapolation', () => {
  it('equilibriumWarnings groups extrapolation events per method and quantity over their depths', () => {
    const ws = equilibriumWarnings(
      input({
        extrapolations: [
          { methodId: 'rtmr', depthCm: 20, quantity: 'depth', requested: 42, clampedTo: 40 },
          { methodId: 'rtmr', depthCm: 25, quantity: 'depth', requested: 50, clampedTo: 40 },
          { methodId: 'etar', depthCm: 8, quantity: 'field', requested: 1.5, clampedTo: 2 },
        ],
      }),
    );
    const depth = byId(ws, 'EXTRAPOLATION@rtmr/depth');
    expect(depth?.depthRangeCm).toEqual({ fromCm: 20, toCm: 25 });
    // 50 vs 40: 25 % beyond the edge > 10 % → caution.
    expect(depth?.severity).toBe('caution');
    expect(depth?.methods.concerned).toEqual(['rtmr']);
    const field = byId(ws, 'EXTRAPOLATION@etar/field');
    expect(field?.depthRangeCm).toEqual({ fromCm: 8, toCm: 8 });
  });

  it('extrapolationEventsOfMethods reads extrapolation flags off method points', () => {
    const m: MethodResult = {
      id: 'batho',
      label: 'Batho',
      variant: 'TMR',
      methodClass: 'type A',
      waterData: 'test',
      curve: { depthCm: [], dosePerMuCGy: [], cf: [] },
      points: [
        { id: 'P', depthCm: 12, cf: 1, dosePerMuCGy: 1, flags: ['depth extrapolated'] },
        { id: 'Q', depthCm: 3, cf: 1, dosePerMuCGy: 1, flags: ['field clamped to table'] },
        { id: 'R', depthCm: 4, cf: 1, dosePerMuCGy: 1, flags: ['build-up'] },
        {
          id: 'S',
          depthCm: 0.2,
          cf: 1,
          dosePerMuCGy: 1,
          flags: ['extrapolated: depth 0.05 cm outside the table, clamped to 0.5 cm'],
        },
      ],
    };
    expect(extrapolationEventsOfMethods([m])).toEqual([
      { methodId: 'batho', depthCm: 12, quantity: 'depth' },
      { methodId: 'batho', depthCm: 3, quantity: 'field' },
      { methodId: 'batho', depthCm: 0.2, quantity: 'depth', requested: 0.05, clampedTo: 0.5 },
    ]);
  });
});

describe('withWarningFlags', () => {
  it('withWarningFlags adds the warnings concerning a method at each point, and none to others', () => {
    const ws = equilibriumWarnings(
      input({ beam: { energy: '18MV', ssdCm: 100, fieldXCm: 5, fieldYCm: 5 }, tpr2010: 0.78 }),
    );
    const result = (id: MethodId): MethodResult => ({
      id,
      label: id,
      variant: '',
      methodClass: 'type A',
      waterData: 'test',
      curve: { depthCm: [], dosePerMuCGy: [], cf: [] },
      points: [
        { id: 'in-lung', depthCm: 12, cf: 1, dosePerMuCGy: 1, flags: [] },
        { id: 'deep', depthCm: 28, cf: 1, dosePerMuCGy: 1, flags: [] },
      ],
    });
    const [rtmr, mc, sup] = withWarningFlags(
      [result('rtmr'), result('monte-carlo'), result('superposition')],
      ws,
    );
    expect(rtmr?.points[0]?.flags).toContain('LED (severe)');
    expect(rtmr?.points[1]?.flags).toEqual([]);
    expect(mc?.points[0]?.flags).toEqual([]);
    expect(sup?.points[0]?.flags).toContain('LED (severe; modelled approximately)');
  });
});

describe('equilibriumWarnings: severity thresholds', () => {
  it('equilibriumWarnings grades LED by the half-width / lateral-range ratio (caution between 0.5 and 0.8)', () => {
    // Derived: 10 MV typical TPR20,10 0.73 → r_LCPE 1.672 g/cm², 6.69 cm in ρ 0.25; a 7 × 7 field
    // has half-width 3.5·(100 + d)/100 = 3.675–3.85 cm in the lung → ratio 0.55–0.58.
    const ws = equilibriumWarnings({
      phantom: lungPhantom(),
      beam: { energy: '10MV', ssdCm: 100, fieldXCm: 7, fieldYCm: 7 },
    });
    const led = ws.filter((w) => w.code === 'LED');
    expect(led).toHaveLength(1);
    expect(led[0]?.severity).toBe('caution');
    expect(led[0]?.values.ratio).toBeGreaterThan(0.5);
    expect(led[0]?.values.ratio).toBeLessThan(0.8);
  });

  it('equilibriumWarnings uses the narrower side of a rectangular field for LED', () => {
    const wide = equilibriumWarnings(
      input({ beam: { energy: '6MV', ssdCm: 100, fieldXCm: 20, fieldYCm: 20 } }),
    );
    const slit = equilibriumWarnings(
      input({ beam: { energy: '6MV', ssdCm: 100, fieldXCm: 20, fieldYCm: 3 } }),
    );
    expect(wide.filter((w) => w.code === 'LED')).toHaveLength(0);
    const led = slit.find((w) => w.code === 'LED');
    // Derived: half-width 1.5·1.05 = 1.575 cm against 1.31/0.25 = 5.25 cm → ratio 0.30.
    expect(led?.severity).toBe('severe');
  });

  it('equilibriumWarnings makes a lung interface severe at high energy and caution at 6 MV', () => {
    const high = equilibriumWarnings(input({ tpr2010: 0.78, dMaxCm: 3.2 }));
    const low = equilibriumWarnings(input());
    expect(byId(high, 'INTERFACE-DOWNSTREAM@layer3')?.severity).toBe('severe');
    expect(byId(low, 'INTERFACE-DOWNSTREAM@layer3')?.severity).toBe('caution');
  });

  it('equilibriumWarnings raises HIGH-ENERGY-SMALL-FIELD-LUNG from TPR20,10 0.75 and up to an 8 cm equivalent square', () => {
    const codes = (tpr: number, side: number) =>
      equilibriumWarnings(
        input({
          tpr2010: tpr,
          beam: { energy: '15MV', ssdCm: 100, fieldXCm: side, fieldYCm: side },
        }),
      ).map((w) => w.code);
    expect(codes(0.76, 8)).toContain('HIGH-ENERGY-SMALL-FIELD-LUNG');
    expect(codes(0.74, 8)).not.toContain('HIGH-ENERGY-SMALL-FIELD-LUNG');
    expect(codes(0.76, 8.5)).not.toContain('HIGH-ENERGY-SMALL-FIELD-LUNG');
  });
});
