// The Lamina plan file: several beams, each a complete single-beam case (its own slab path,
// set-up, field and planning MU, and the depth of every shared point along that beam), with a
// weight, and the check's settings for the whole plan: an optional prescription at a shared
// point, the tolerances, the deciding method and the dose convention (a beam case's own `check`
// block is not read inside a plan). Points are matched by id across beams. A single-beam case
// file stays valid on its own and lifts into a one-beam plan with its settings.
// Version 2 added `doseTo`; its beams' cases are case version 2 (version-1 plans still read).
// zod/mini (the tree-shakable form of zod: same checks and messages) keeps the page's entry small.
import * as z from 'zod/mini';
import './zodEnglish';
import {
  checkMethodIdSchema,
  doseToSchema,
  prescriptionSchema,
  tolerancesSchema,
} from './checkSettingsSchema';

export { prescriptionSchema, tolerancesSchema };
export type { PlanPrescription, PlanTolerances } from './checkSettingsSchema';

export const PLAN_FORMAT = 'lamina.plan';
export const PLAN_VERSION = 2;
export const MAX_BEAMS = 12;

const finite = (what: string) =>
  z
    .number({ error: `${what} must be a number` })
    .check(z.refine(Number.isFinite, `${what} must be finite`));

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

export const planShellSchema = z
  .strictObject({
    format: z.literal(PLAN_FORMAT, { error: `format must be "${PLAN_FORMAT}"` }),
    version: z.union([z.literal(1), z.literal(PLAN_VERSION)], {
      error: `version must be 1 or ${PLAN_VERSION}`,
    }),
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
    /** Method whose verdict decides the check (the default for the path when absent). */
    checkMethodId: z.optional(checkMethodIdSchema),
    /** Dose to water or dose to medium for every method and beam (water when absent). */
    doseTo: z.optional(doseToSchema),
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
