// fast-check generators for case files: valid cases, and malformed ones made by breaking one rule
// of a valid case. Kept here so they grow with the schema.
import fc from 'fast-check';
import { BEAM_ENERGIES } from '../../../src/engine/beam/energies';
import { MATERIAL_IDS } from '../../../src/engine/materials/materialLibrary';
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

/** A valid case: every value inside the schema's rules, points inside the phantom. */
export const validCase = fc
  .record({
    name: fc.string({ maxLength: 40 }),
    energy: fc.constantFrom(...BEAM_ENERGIES),
    setup,
    fieldXCm: fc.double({ min: 1, max: 40, noNaN: true }),
    fieldYCm: fc.double({ min: 1, max: 40, noNaN: true }),
    layers: fc.array(layer, { minLength: 1, maxLength: 5 }),
    pointFractions: fc.array(fc.double({ min: 0, max: 1, noNaN: true }), { maxLength: 4 }),
  })
  .map((r) => {
    const total = r.layers.reduce((s, l) => s + l.thicknessCm, 0);
    const setup =
      r.setup.kind === 'SAD'
        ? {
            ...r.setup,
            isocentreDepthCm: r.setup.isocentreDepthCm * Math.min(total, r.setup.sadCm - 50),
          }
        : r.setup;
    return {
      format: CASE_FORMAT,
      version: CASE_VERSION,
      name: r.name,
      beam: { energy: r.energy, setup, fieldXCm: r.fieldXCm, fieldYCm: r.fieldYCm },
      layers: r.layers,
      points: r.pointFractions.map((f, i) => ({ id: `P${i + 1}`, depthCm: f * total })),
    };
  });

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
