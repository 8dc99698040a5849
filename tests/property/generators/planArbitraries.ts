// fast-check generators for multi-beam plan files ("lamina.plan"): valid plans built from valid
// cases (shared point ids, weights, an optional prescription and tolerances), and malformed ones
// made by breaking one plan rule or one embedded case.
import fc from 'fast-check';
import { MAX_BEAMS, PLAN_FORMAT, PLAN_VERSION } from '../../../src/io/planSchema';
import { malformedCase, validCase } from './caseArbitraries';

/** A valid plan document (plain JSON, as read from a file). */
export const validPlan = fc
  .record(
    {
      name: fc.string({ maxLength: 40 }),
      cases: fc.array(validCase, { minLength: 1, maxLength: 3 }),
      weights: fc.array(fc.double({ min: 0, max: 3, noNaN: true }), {
        minLength: 3,
        maxLength: 3,
      }),
      prescribedDoseCGy: fc.double({ min: 1, max: 1000, noNaN: true }),
      tolerances: fc.record({
        homogeneousPercent: fc.double({ min: 0.1, max: 100, noNaN: true }),
        heterogeneousPercent: fc.double({ min: 0.1, max: 100, noNaN: true }),
      }),
    },
    { requiredKeys: ['name', 'cases', 'weights'] },
  )
  .map((r) => {
    const beams = r.cases.map((c, i) => ({
      id: `beam-${i + 1}`,
      // The first beam always carries weight, so "every weight is 0" never happens here.
      weight: i === 0 ? 1 + (r.weights[i] as number) : (r.weights[i] as number),
      case: c,
    }));
    const firstPoint = r.cases.flatMap((c) => c.points)[0];
    return {
      format: PLAN_FORMAT,
      version: PLAN_VERSION,
      name: r.name,
      beams,
      ...(r.prescribedDoseCGy !== undefined && firstPoint
        ? { prescription: { pointId: firstPoint.id, doseCGy: r.prescribedDoseCGy } }
        : {}),
      ...(r.tolerances ? { tolerances: r.tolerances } : {}),
    };
  });

type PlanDoc = Record<string, unknown> & { beams: Record<string, unknown>[] };

/** Ways to break a valid plan, each a rule the plan reader must enforce. */
const planBreakers: ((p: PlanDoc, v: unknown, broken: unknown) => void)[] = [
  (p, v) => (p.format = v),
  (p, v) => (p.version = v),
  (p) => (p.beams = []),
  (p, _v, broken) => ((p.beams[0] as Record<string, unknown>).case = broken),
  (p) => p.beams.push({ ...p.beams[0], weight: 1 }), // duplicate beam id
  (p) => p.beams.forEach((b) => (b.weight = 0)),
  (p, v) => ((p.beams[0] as Record<string, unknown>).weight = v),
  (p, v) => ((p.beams[0] as Record<string, unknown>).id = v),
  (p) => (p.prescription = { pointId: 'no-such-point', doseCGy: 200 }),
  (p, v) => (p.prescription = { pointId: 'P1', doseCGy: v }),
  (p, v) => (p.tolerances = { homogeneousPercent: v, heterogeneousPercent: 3 }),
  (p) =>
    (p.beams = Array.from({ length: MAX_BEAMS + 1 }, (_, i) => ({
      ...p.beams[0],
      id: `b${i}`,
    }))),
  (p, v) => (p.unknownKey = v),
  (p, v) => (p.name = v),
];

/** Values no plan field accepts where a number > 0 (or the format/version literal) is needed. */
const badValue = fc.constantFrom(NaN, Infinity, -1, 0, -0.5, null, '', '2', 'lamina.case', [], {});

/** A malformed plan: one rule broken, or random JSON. */
export const malformedPlan = fc.oneof(
  fc
    .tuple(validPlan, fc.integer({ min: 0, max: planBreakers.length - 1 }), badValue, malformedCase)
    .map(([plan, k, v, broken]) => {
      const copy = structuredClone(plan) as unknown as PlanDoc;
      (planBreakers[k] as (p: PlanDoc, v: unknown, b: unknown) => void)(copy, v, broken);
      return copy;
    }),
  fc.jsonValue(),
);
