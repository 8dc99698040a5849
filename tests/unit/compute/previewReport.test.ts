import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { calculateCase } from '../../../src/compute/calculateCase';
import {
  mergePreviewReport,
  PREVIEW_DEPTH_STEP_CM,
  PREVIEW_ETAR_KNOT_STEP_CM,
  PREVIEW_METHOD_IDS,
  resampleCurve,
  SLOW_METHOD_IDS,
} from '../../../src/compute/previewReport';
import { TYPE_A_METHOD_IDS } from '../../../src/engine/corrections/typeAMethods';
import { validateCase } from '../../../src/io/caseFile';
import type { LaminaCase } from '../../../src/io/caseSchema';
import { expectRelClose } from '../../helpers/expectClose';

function demoCase(): LaminaCase {
  const text = readFileSync(new URL('../../../public/cases/lung-slab-6mv.json', import.meta.url));
  const v = validateCase(JSON.parse(text.toString()));
  if (!v.ok) throw new Error('demo case does not validate');
  return v.value;
}

/** The same case with its first interface moved by `deltaCm` (as a drag would). */
function withFirstInterfaceMoved(c: LaminaCase, deltaCm: number): LaminaCase {
  const layers = c.layers.map((l, i) =>
    i === 0
      ? { ...l, thicknessCm: l.thicknessCm + deltaCm }
      : i === 1
        ? { ...l, thicknessCm: l.thicknessCm - deltaCm }
        : l,
  );
  return { ...c, layers };
}

describe('preview method set', () => {
  it('holds every type-A method and the pencil beam, and no slow method', () => {
    const expected = [...TYPE_A_METHOD_IDS, 'pencil-beam'];
    expect([...PREVIEW_METHOD_IDS].sort()).toEqual(expected.sort());
    for (const id of SLOW_METHOD_IDS) expect(PREVIEW_METHOD_IDS).not.toContain(id);
  });
});

describe('resampleCurve', () => {
  it('reproduces a linear curve exactly and holds the end values beyond the ends', () => {
    const curve = {
      depthCm: [0, 1, 2, 4],
      dosePerMuCGy: [1, 3, 5, 9],
      cf: [1, 1.5, 2, 3],
    };
    const r = resampleCurve(curve, [-1, 0.5, 3, 5]);
    expect(r.depthCm).toEqual([-1, 0.5, 3, 5]);
    // Linear in depth (dose = 1 + 2z, cf = 1 + z/2): interpolation is exact up to rounding.
    expect(r.dosePerMuCGy).toEqual([1, 2, 7, 9]);
    expect(r.cf).toEqual([1, 1.25, 2.5, 3]);
  });

  it('gives null between samples where either neighbour is null', () => {
    const r = resampleCurve(
      { depthCm: [0, 1, 2], dosePerMuCGy: [1, null, 3], cf: [1, 1, 1] },
      [0.5, 1.5, 2],
    );
    expect(r.dosePerMuCGy).toEqual([null, null, 3]);
  });
});

describe('mergePreviewReport', () => {
  const c = demoCase();
  const before = calculateCase(c, { depthStepCm: 0.05 });
  const moved = withFirstInterfaceMoved(c, 0.4);
  const preview = calculateCase(moved, {
    methods: PREVIEW_METHOD_IDS,
    depthStepCm: PREVIEW_DEPTH_STEP_CM,
    typeA: { etarKnotStepCm: PREVIEW_ETAR_KNOT_STEP_CM },
  });

  it('without a full report shows the preview alone, nothing marked as updating', () => {
    const m = mergePreviewReport(preview, null);
    expect(m.report).toBe(preview);
    expect(m.updatingIds).toEqual([]);
  });

  it('keeps the full report’s method order, takes fast methods from the preview and marks the rest', () => {
    const m = mergePreviewReport(preview, before);
    expect(m.report.methods.map((x) => x.id)).toEqual(before.methods.map((x) => x.id));
    const slow = before.methods.map((x) => x.id).filter((id) => !PREVIEW_METHOD_IDS.includes(id));
    expect(slow.length).toBeGreaterThan(0);
    expect(m.updatingIds).toEqual(slow);
    for (const x of m.report.methods) {
      expect(x.curve.depthCm).toEqual(preview.depthCm);
      if (PREVIEW_METHOD_IDS.includes(x.id))
        expect(x).toBe(preview.methods.find((p) => p.id === x.id));
    }
  });

  it('never shows point values of the previous geometry for the carried-over methods', () => {
    const m = mergePreviewReport(preview, before);
    for (const x of m.report.methods.filter((y) => m.updatingIds.includes(y.id))) {
      expect(x.points.map((p) => p.id)).toEqual(preview.points.map((p) => p.id));
      for (const p of x.points) {
        expect(p.dosePerMuCGy).toBeNull();
        expect(p.cf).toBeNull();
      }
    }
  });

  it('carries a slow curve over unchanged at the depths the two grids share', () => {
    const m = mergePreviewReport(preview, before);
    const old = before.methods.find((x) => x.id === 'superposition')!;
    const carried = m.report.methods.find((x) => x.id === 'superposition')!;
    // 0.2 cm grid points are every 4th point of the 0.05 cm grid (same 20 cm phantom); the grids'
    // depths differ only by rounding, so values agree to rounding (1e-9 relative).
    for (let i = 0; i < carried.curve.depthCm.length; i++) {
      expectRelClose(carried.curve.dosePerMuCGy[i]!, old.curve.dosePerMuCGy[4 * i]!, 1e-9);
    }
  });
});

describe('preview accuracy', () => {
  it('the preview’s fast curves equal the full calculation’s at the depths both grids share', () => {
    const c = withFirstInterfaceMoved(demoCase(), 0.4);
    const full = calculateCase(c, { depthStepCm: 0.05 });
    const preview = calculateCase(c, {
      methods: PREVIEW_METHOD_IDS,
      depthStepCm: PREVIEW_DEPTH_STEP_CM,
    });
    for (const p of preview.methods) {
      const f = full.methods.find((x) => x.id === p.id)!;
      // ETAR's kernel weights are interpolated only when asked (etarKnotStepCm, not set here).
      for (let i = 0; i < p.curve.depthCm.length; i++) {
        const a = p.curve.dosePerMuCGy[i];
        const b = f.curve.dosePerMuCGy[4 * i];
        if (a === null || a === undefined || b === null || b === undefined) {
          expect(a ?? null).toBe(b ?? null);
          continue;
        }
        // Each method is evaluated depth by depth: the coarser grid changes no value
        // (1e-9 relative allows for the grids' depths differing by rounding).
        expectRelClose(a, b, 1e-9);
      }
    }
  });
});
