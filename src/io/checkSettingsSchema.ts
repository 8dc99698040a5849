// The point check's settings as files carry them: prescription, tolerances, the deciding method
// and the dose convention. A case file keeps them in its `check` block, a plan file at its top
// level; both use these rules, so a message names the same field wherever it sits. zod/mini, as
// the case and plan schemas (caseSchema.ts).
import * as z from 'zod/mini';
import './zodEnglish';
import { DOSE_QUANTITIES } from '../engine/dose/doseQuantity';

const finite = (what: string) =>
  z
    .number({ error: `${what} must be a number` })
    .check(z.refine(Number.isFinite, `${what} must be finite`));

const percent = (what: string) =>
  finite(what).check(
    z.refine((v) => v > 0, `${what} must be > 0 %`),
    z.refine((v) => v <= 100, `${what} must be ≤ 100 %`),
  );

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

export const checkMethodIdSchema = z
  .string({ error: 'check method must be a method id' })
  .check(
    z.minLength(1, 'check method must not be empty'),
    z.maxLength(40, 'check method must be at most 40 characters'),
  );

export const doseToSchema = z.enum(DOSE_QUANTITIES, {
  error: `dose convention must be one of ${DOSE_QUANTITIES.map((q) => `"${q}"`).join(', ')}`,
});

/** The `check` block of a case file (every field optional: absent means the default). */
export const caseCheckSchema = z.strictObject({
  prescription: z.optional(prescriptionSchema),
  tolerances: z.optional(tolerancesSchema),
  /** Method whose verdict decides; absent: the default for the path (see decidingMethod.ts). */
  checkMethodId: z.optional(checkMethodIdSchema),
  /** Dose to water or dose to medium, for every method; absent: water. */
  doseTo: z.optional(doseToSchema),
});

export type CaseCheckSettings = z.infer<typeof caseCheckSchema>;
export type PlanTolerances = z.infer<typeof tolerancesSchema>;
export type PlanPrescription = z.infer<typeof prescriptionSchema>;
