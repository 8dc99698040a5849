// The point check's settings as files carry them: prescription, tolerances, the deciding method
// and the dose convention. A case file keeps them in its `check` block, a plan file at its top
// level; both use these rules, so a message names the same field wherever it sits.
import { z } from 'zod';
import { DOSE_QUANTITIES } from '../engine/dose/doseQuantity';
import { METHOD_IDS } from '../engine/methodRegistry';

const finite = (what: string) =>
  z.number({ error: `${what} must be a number` }).refine(Number.isFinite, `${what} must be finite`);

const percent = (what: string) =>
  finite(what)
    .refine((v) => v > 0, `${what} must be > 0 %`)
    .refine((v) => v <= 100, `${what} must be ≤ 100 %`);

export const tolerancesSchema = z.strictObject({
  homogeneousPercent: percent('homogeneous tolerance'),
  heterogeneousPercent: percent('heterogeneous tolerance'),
});

export const prescriptionSchema = z.strictObject({
  pointId: z
    .string({ error: 'prescription point must be text' })
    .min(1, 'prescription point must not be empty'),
  doseCGy: finite('prescribed dose').refine((v) => v > 0, 'prescribed dose must be > 0 cGy'),
});

/** A method id of the registry: an unknown one is refused (it fell back to the default silently). */
export const checkMethodIdSchema = z.enum(METHOD_IDS, {
  error: `unknown method (expected one of ${METHOD_IDS.join(', ')})`,
});

export const doseToSchema = z.enum(DOSE_QUANTITIES, {
  error: `dose convention must be one of ${DOSE_QUANTITIES.map((q) => `"${q}"`).join(', ')}`,
});

/** The `check` block of a case file (every field optional: absent means the default). */
export const caseCheckSchema = z.strictObject({
  prescription: prescriptionSchema.optional(),
  tolerances: tolerancesSchema.optional(),
  /** Method whose verdict decides; absent: the default for the path (see decidingMethod.ts). */
  checkMethodId: checkMethodIdSchema.optional(),
  /** Dose to water or dose to medium, for every method; absent: water. */
  doseTo: doseToSchema.optional(),
});

export type CaseCheckSettings = z.infer<typeof caseCheckSchema>;
export type PlanTolerances = z.infer<typeof tolerancesSchema>;
export type PlanPrescription = z.infer<typeof prescriptionSchema>;
