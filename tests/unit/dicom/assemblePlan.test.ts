// Imported beams to a lamina.plan: set-up, field, points and planning values, validated by the
// plan and case rules.
import { describe, expect, it } from 'vitest';
import { ISO_POINT_ID, layersOf } from '../../../src/dicom/assemblePlan';
import { analyseAll, planOfAnalysed } from '../../../src/dicom/importPipeline';
import { defaultImportSettings } from '../../../src/dicom/importSettings';
import { withPlanningValues } from '../../../src/dicom/planningValues';
import { validatePlan } from '../../../src/io/planFile';
import { BOX_BEAMS, boxPlanFiles } from '../../helpers/dicomFixtures';
import { importFiles } from '../../helpers/dicomScenario';

describe('assemblePlan', () => {
  it('makes one SAD beam per RT beam with the ISO point, planning MU and dose, weights from beam doses', async () => {
    const imp = await importFiles(boxPlanFiles());
    const s = { ...defaultImportSettings(), extraPointOffsetsCm: [-3, 2] };
    const r = planOfAnalysed(imp, analyseAll(imp, s), s);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(validatePlan(JSON.parse(JSON.stringify(r.plan))).ok).toBe(true);
    expect(r.plan.name).toBe('BOX 4F');
    expect(r.plan.beams.map((b) => b.id)).toEqual(['beam-1', 'beam-2', 'beam-3', 'beam-4']);
    r.plan.beams.forEach((b, i) => {
      const spec = BOX_BEAMS[i]!;
      expect(b.weight).toBe(spec.doseGy);
      expect(b.case.beam).toMatchObject({
        energy: '6MV',
        fieldXCm: 10,
        fieldYCm: 10,
        setup: { kind: 'SAD', sadCm: 100 },
      });
      // Case version 2: the RT Plan's beam meterset is the beam's planning MU; the beam dose of
      // the fraction group is the planning dose at the isocentre point.
      expect(b.case.version).toBe(2);
      expect(b.case.beam.planningMu).toBe(spec.meterset);
      const iso = b.case.points.find((p) => p.id === ISO_POINT_ID)!;
      expect(iso).not.toHaveProperty('planningMu');
      expect(iso.planningDoseCGy).toBeCloseTo(spec.doseGy * 100, 9);
      expect(b.case.points.map((p) => p.id)).toEqual([
        'ISO',
        `B${spec.number}-3`,
        `B${spec.number}+2`,
      ]);
      expect(b.case.notes).toMatch(/lateral inhomogeneity/);
    });
  });

  it('gives the field at 100 cm from the source for another SAD', async () => {
    const { scenarioFiles } = await import('../../helpers/dicomScenario');
    const imp = await importFiles(
      scenarioFiles({
        position: 'HFS',
        gantryDeg: 0,
        isoMm: [0, 0, 0],
        dir: [0, 1, 0],
        isoDepthMm: 50,
        layers: [{ thicknessMm: 120, hu: 0 }],
        beam: { sadMm: 800, jawXMm: [-40, 40], jawYMm: [-25, 25] },
      }),
    );
    const s = defaultImportSettings();
    const r = planOfAnalysed(imp, analyseAll(imp, s), s);
    expect(r.ok && r.plan.beams[0]!.case.beam).toMatchObject({
      fieldXCm: 10,
      fieldYCm: 6.25,
      setup: { sadCm: 80 },
    });
  });

  it('rounds slab boundaries, not thicknesses, so the total stays exact', () => {
    const slab = { rhoE: 1, materialId: 'water' as const };
    const layers = layersOf([1 / 3, 1 / 3, 1 / 3].map((t) => ({ ...slab, thicknessCm: t })));
    expect(layers.map((l) => l.thicknessCm)).toEqual([0.333, 0.334, 0.333]);
  });

  it('puts the meterset on the beam and the beam dose on the isocentre point (case version 2)', () => {
    const base = {
      beam: { energy: '6MV', setup: { kind: 'SSD', ssdCm: 100 }, fieldXCm: 10, fieldYCm: 10 },
      points: [
        { id: 'ISO', depthCm: 5 },
        { id: 'X', depthCm: 1 },
      ],
    } as never;
    const both = withPlanningValues(base, 'ISO', { mu: 100, doseCGy: 180 });
    expect(both.beam.planningMu).toBe(100);
    expect(both.points).toEqual([
      { id: 'ISO', depthCm: 5, planningDoseCGy: 180 },
      { id: 'X', depthCm: 1 },
    ]);
    const neither = withPlanningValues(base, 'ISO', { mu: null, doseCGy: null });
    expect(neither.beam).not.toHaveProperty('planningMu');
    expect(neither.points).toEqual([
      { id: 'ISO', depthCm: 5 },
      { id: 'X', depthCm: 1 },
    ]);
  });
});
