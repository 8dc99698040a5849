// fast-check generators for case files: valid cases of the current version (with planning values
// and a check block of settings, or without), version-1 cases that migrate (the planning MU on
// the points), and malformed ones made by breaking one rule of a valid case. Kept here so they
// grow with the schema.
import fc from 'fast-check';
import { BEAM_ENERGIES } from '../../../src/engine/beam/energies';
import { DOSE_QUANTITIES } from '../../../src/engine/dose/doseQuantity';
import { MATERIAL_IDS } from '../../../src/engine/materials/materialLibrary';
import { METHOD_IDS } from '../../../src/engine/methodRegistry';
import { CASE_FORMAT, CASE_VERSION } from '../../../src/io/caseSchema';

const layer = fc.record(
  {
    materialId: fc.constantFrom(...MATERIAL_IDS),
    thicknessCm: fc.double({ min: 0.01, max: 20, noNaN: true }),
    densityGPerCm3: fc.double({ min: 0.001, max: 3, noNaN: true }),
  },
  { requiredKeys: ['materialId', 'thicknessCm'] },
);

const setup = fc.oneof(
  fc.record({
    kind: fc.constant('SSD' as const),
    ssdCm: fc.double({ min: 50, max: 150, noNaN: true }),
  }),
  fc.record({
    kind: fc.constant('SAD' as const),
    sadCm: fc.double({ min: 80, max: 150, noNaN: true }),
    // A fraction of the phantom's thickness; scaled to a depth once the layers are known.
    isocentreDepthCm: fc.double({ min: 0, max: 1, noNaN: true }),
  }),
);

const percent = fc.double({ min: 0.1, max: 100, noNaN: true });

/** The check block's settings (each optional); the prescription's point is picked later. */
const checkSettings = fc.record(
  {
    prescribedDoseCGy: fc.double({ min: 1, max: 1000, noNaN: true }),
    prescriptionPoint: fc.nat(),
    tolerances: fc.record({ homogeneousPercent: percent, heterogeneousPercent: percent }),
    // Registry ids only (an unknown id is refused by the schema); one the calculation may not have
    // computed (monte-carlo without a run) lets the default decide.
    checkMethodId: fc.constantFrom(...METHOD_IDS),
    doseTo: fc.constantFrom(...DOSE_QUANTITIES),
  },
  { requiredKeys: [] },
);

/** A valid case: every value inside the schema's rules, points inside the phantom. */
export const validCase = fc
  .record(
    {
      name: fc.string({ maxLength: 40 }),
      energy: fc.constantFrom(...BEAM_ENERGIES),
      setup,
      fieldXCm: fc.double({ min: 1, max: 40, noNaN: true }),
      fieldYCm: fc.double({ min: 1, max: 40, noNaN: true }),
      layers: fc.array(layer, { minLength: 1, maxLength: 5 }),
      pointFractions: fc.array(fc.double({ min: 0, max: 1, noNaN: true }), { maxLength: 4 }),
      // The planning system's values (case version 2: one MU per beam, a dose per point).
      planningMu: fc.double({ min: 1, max: 1000, noNaN: true }),
      planningDosesCGy: fc.array(
        fc.option(fc.oneof(fc.constant(0), fc.double({ min: 0.001, max: 1000, noNaN: true }))),
        {
          minLength: 4,
          maxLength: 4,
        },
      ),
      check: checkSettings,
    },
    {
      requiredKeys: ['name', 'energy', 'setup', 'fieldXCm', 'fieldYCm', 'layers', 'pointFractions'],
    },
  )
  .map((r) => {
    const total = r.layers.reduce((s, l) => s + l.thicknessCm, 0);
    const setup =
      r.setup.kind === 'SAD'
        ? {
            ...r.setup,
            isocentreDepthCm: r.setup.isocentreDepthCm * Math.min(total, r.setup.sadCm - 50),
          }
        : r.setup;
    const points = r.pointFractions.map((f, i) => {
      const dose = r.planningDosesCGy?.[i];
      return {
        id: `P${i + 1}`,
        depthCm: f * total,
        ...(dose !== null && dose !== undefined ? { planningDoseCGy: dose } : {}),
      };
    });
    const k = r.check;
    const rxPoint =
      k?.prescriptionPoint !== undefined ? points[k.prescriptionPoint % 4] : undefined;
    const check = k
      ? {
          ...(k.prescribedDoseCGy !== undefined && rxPoint
            ? { prescription: { pointId: rxPoint.id, doseCGy: k.prescribedDoseCGy } }
            : {}),
          ...(k.tolerances ? { tolerances: k.tolerances } : {}),
          ...(k.checkMethodId ? { checkMethodId: k.checkMethodId } : {}),
          ...(k.doseTo ? { doseTo: k.doseTo } : {}),
        }
      : undefined;
    return {
      format: CASE_FORMAT,
      version: CASE_VERSION,
      name: r.name,
      beam: {
        energy: r.energy,
        setup,
        fieldXCm: r.fieldXCm,
        fieldYCm: r.fieldYCm,
        ...(r.planningMu !== undefined ? { planningMu: r.planningMu } : {}),
      },
      layers: r.layers,
      points,
      ...(check ? { check } : {}),
    };
  });

/**
 * A version-1 case file that migrates: the planning MU written on the points (the same value on
 * every point that has one), no check block (version 2 added it).
 */
export const validV1Case = fc
  .tuple(validCase, fc.array(fc.boolean(), { minLength: 4, maxLength: 4 }))
  .map(([c, onPoint]) => {
    const { planningMu, ...beam } = c.beam as typeof c.beam & { planningMu?: number };
    return {
      format: CASE_FORMAT,
      version: 1,
      name: c.name,
      beam,
      layers: c.layers,
      points: c.points.map((p, i) =>
        planningMu !== undefined && onPoint[i] ? { ...p, planningMu } : p,
      ),
    };
  });

/** A case file as users have them: mostly the current version, some version 1. */
export const validCaseFile = fc.oneof(
  { arbitrary: validCase, weight: 3 },
  { arbitrary: validV1Case, weight: 1 },
);

/** Ways to break a valid case, each a rule the schema must enforce. */
const breakers: ((c: any, v: unknown) => void)[] = [
  (c, v) => (c.layers[0].thicknessCm = v),
  (c, v) => (c.layers[0].densityGPerCm3 = v),
  (c, v) => (c.beam.energy = v),
  (c, v) => (c.beam.fieldXCm = v),
  (c, v) => (c.beam.setup = v),
  (c, v) => (c.version = v),
  (c, v) => (c.format = v),
  (c, v) => (c.layers = v),
  (c, v) => (c.points = [{ id: 'X', depthCm: v }]),
  (c, v) => (c.name = v),
  (c) => delete c.beam,
  (c, v) => (c.extra = v),
  (c, v) => (c.beam.planningMu = v),
  (c, v) => (c.check = { doseTo: v }),
  (c, v) => (c.check = { tolerances: { homogeneousPercent: v, heterogeneousPercent: 5 } }),
  (c) => (c.check = { prescription: { pointId: 'no-such-point', doseCGy: 100 } }),
  // A version-1 file whose points disagree on the planning MU: refused, naming the fields.
  (c) => {
    c.version = 1;
    delete c.check;
    delete c.beam.planningMu;
    c.points = [
      { id: 'A', depthCm: 0, planningMu: 100 },
      { id: 'B', depthCm: 0, planningMu: 101 },
    ];
  },
];

const badValue = fc.oneof(
  fc.constantFrom(
    NaN,
    Infinity,
    -Infinity,
    -1,
    0,
    1e9,
    null,
    '',
    '10',
    'abc',
    [],
    {},
    true,
    '7MV',
    99,
  ),
  fc.anything(),
);

/** A malformed case (one rule broken), or random JSON. */
export const malformedCase = fc.oneof(
  fc
    .tuple(validCase, fc.integer({ min: 0, max: breakers.length - 1 }), badValue)
    .map(([c, k, v]) => {
      const copy = structuredClone(c) as any;
      (breakers[k] as (c: any, v: unknown) => void)(copy, v);
      return copy as unknown;
    }),
  fc.jsonValue(),
);
