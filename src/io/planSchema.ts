// The Lamina plan file: several beams, each a complete single-beam case (its own slab path,
// set-up and field, and the depth of every shared point along that beam), with a weight, an
// optional prescription at a shared point and the check tolerances. Points are matched by id
// across beams. A single-beam case file stays valid on its own and lifts into a one-beam plan.
// zod/mini (the tree-shakable form of zod: same checks and messages) keeps the page's entry small.
import * as z from 'zod/mini';
import './zodEnglish';

export const PLAN_FORMAT = 'lamina.plan';
export const PLAN_VERSION = 1;
export const MAX_BEAMS = 12;

const finite = (what: string) =>
  z
    .number({ error: `${what} must be a number` })
    .check(z.refine(Number.isFinite, `${what} must be finite`));

const percent = (what: string) =>
  finite(what).check(
    z.refine((v) => v > 0, `${what} must be > 0 %`),
    z.refine((v) => v <= 100, `${what} must be ≤ 100 %`),
  );

export const planBeamShellSchema = z.strictObject({
  id: z
    .string({ error: 'beam id must be text' })
    .check(
      z.minLength(1, 'beam id must not be empty'),
      z.maxLength(40, 'beam id must be at most 40 characters'),
    ),
  label: z.optional(z.string().check(z.maxLength(80, 'label must be at most 80 characters'))),
  weight: finite('weight').check(z.refine((v) => v >= 0, 'weight must be ≥ 0')),
  /** A complete single-beam case document ("lamina.case"), validated by the case rules. */
  case: z.unknown(),
});

export const tolerancesSchema = z.strictObject({
  homogeneousPercent: percent('homogeneous tolerance'),
  heterogeneousPercent: percent('heterogeneous tolerance'),
});

export const prescriptionSchema = z.strictObject({
  pointId: z
    .string({ error: 'prescription point must be text' })
    .check(z.minLength(1, 'prescription point must not be empty')),
  doseCGy: finite('prescribed dose').check(
    z.refine((v) => v > 0, 'prescribed dose must be > 0 cGy'),
  ),
});

export const planShellSchema = z
  .strictObject({
    format: z.literal(PLAN_FORMAT, { error: `format must be "${PLAN_FORMAT}"` }),
    version: z.literal(PLAN_VERSION, { error: `version must be ${PLAN_VERSION}` }),
    name: z
      .string({ error: 'name must be text' })
      .check(z.maxLength(200, 'name must be at most 200 characters')),
    notes: z.optional(z.string().check(z.maxLength(5000, 'notes must be at most 5000 characters'))),
    beams: z
      .array(planBeamShellSchema, { error: 'beams must be a list' })
      .check(
        z.minLength(1, 'beams: at least one beam is needed'),
        z.maxLength(MAX_BEAMS, `beams: at most ${MAX_BEAMS} beams`),
      ),
    prescription: z.optional(prescriptionSchema),
    tolerances: z.optional(tolerancesSchema),
    /** Method whose verdict decides the check (a preferred available method when absent). */
    checkMethodId: z.optional(z.string().check(z.maxLength(40))),
  })
  .check(
    z.superRefine((p, ctx) => {
      const seen = new Set<string>();
      p.beams.forEach((b, i) => {
        if (seen.has(b.id))
          ctx.addIssue({
            code: 'custom',
            path: ['beams', i, 'id'],
            message: `duplicate beam id "${b.id}"`,
          });
        seen.add(b.id);
      });
      if (p.beams.every((b) => b.weight === 0))
        ctx.addIssue({
          code: 'custom',
          path: ['beams'],
          message: 'at least one beam needs a weight > 0',
        });
    }),
  );

export type PlanShell = z.infer<typeof planShellSchema>;
export type PlanTolerances = z.infer<typeof tolerancesSchema>;
export type PlanPrescription = z.infer<typeof prescriptionSchema>;
