// The layer-thickness floor (0.001 cm) and the planning-dose rule (0, or ≥ 0.001 cGy) live in the
// shared ranges (src/engine/inputRanges) with the density floor: the case file, the page's field
// and the message agree. Check values are derived from the stated rules.
import { describe, expect, it } from 'vitest';
import {
  MIN_LAYER_THICKNESS_CM,
  MIN_PLANNING_DOSE_CGY,
  planningDoseProblem,
  RANGES,
  rangeProblem,
  rangeText,
} from '../../../src/engine/inputRanges';
import { validateCase } from '../../../src/io/caseFile';
import { parseNumberField, RULES } from '../../../src/ui/fieldRules';

const caseWith = (thicknessCm: number, planningDoseCGy?: number) => ({
  format: 'lamina.case',
  version: 2,
  name: 'floors',
  beam: { energy: '6MV', setup: { kind: 'SSD', ssdCm: 100 }, fieldXCm: 10, fieldYCm: 10 },
  layers: [
    { materialId: 'water', thicknessCm: 5 },
    { materialId: 'lung', thicknessCm },
  ],
  points: [{ id: 'P', depthCm: 2, ...(planningDoseCGy === undefined ? {} : { planningDoseCGy }) }],
});

const problemsOf = (raw: unknown) => {
  const r = validateCase(raw);
  return r.ok ? [] : r.problems;
};

describe('layer thickness floor', () => {
  it('refuses 1e-323 cm (it gave a non-finite superposition curve) and 0.0005 cm, naming the floor', () => {
    for (const t of [1e-323, 0.0005])
      expect(problemsOf(caseWith(t))).toEqual([
        { path: 'layers[1].thicknessCm', message: 'thickness must be ≥ 0.001 cm' },
      ]);
  });

  it('keeps "must be > 0 cm" for 0 and below, and accepts the floor itself', () => {
    expect(problemsOf(caseWith(0))).toEqual([
      { path: 'layers[1].thicknessCm', message: 'thickness must be > 0 cm' },
    ]);
    expect(problemsOf(caseWith(MIN_LAYER_THICKNESS_CM))).toEqual([]);
    expect(rangeText(RANGES.layerThicknessCm)).toBe('[0.001, 100] cm');
  });

  it("the page's thickness field refuses the same values with the same words", () => {
    expect(parseNumberField('0.0005', RULES.thickness(2))).toEqual({
      ok: false,
      message: 'Layer 2 thickness: must be ≥ 0.001 cm',
    });
    expect(parseNumberField('0.001', RULES.thickness(2))).toEqual({ ok: true, value: 0.001 });
    expect(rangeProblem(0.0005, RANGES.layerThicknessCm)).toBe('must be ≥ 0.001 cm');
  });
});

describe('planning dose: 0 (none) or at least 0.001 cGy', () => {
  it('refuses a denormal planning dose (it gave an infinite percent difference) and a negative one', () => {
    expect(problemsOf(caseWith(1, 5e-324))).toEqual([
      {
        path: 'points[0].planningDoseCGy',
        message: 'planning dose must be 0 (none) or ≥ 0.001 cGy',
      },
    ]);
    expect(problemsOf(caseWith(1, -1))).toEqual([
      { path: 'points[0].planningDoseCGy', message: 'planning dose must be ≥ 0 cGy' },
    ]);
  });

  it('accepts 0 and the floor', () => {
    expect(planningDoseProblem(0)).toBeNull();
    expect(planningDoseProblem(MIN_PLANNING_DOSE_CGY)).toBeNull();
    expect(problemsOf(caseWith(1, 0))).toEqual([]);
    expect(problemsOf(caseWith(1, 180))).toEqual([]);
  });
});
