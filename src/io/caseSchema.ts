// The Lamina case file: a versioned JSON document describing one beam's path through a slab
// phantom, the points of interest on its central axis, the planning system's values to compare
// with (the beam's MU, the dose at each point) and the check's settings. Every rule here names
// its field. Version 2 moved the planning MU from the points to the beam (caseMigrations.ts).
import { z } from 'zod';
import { caseCheckSchema } from './checkSettingsSchema';
import { BEAM_ENERGIES } from '../engine/beam/energies';
import { MATERIAL_IDS } from '../engine/materials/materialLibrary';
import { buildMeasuredWaterData } from '../engine/beam/measuredTable';
import {
  LIMITS,
  planningDoseProblem,
  RANGES,
  rangeProblem,
  type NumericRange,
} from '../engine/inputRanges';

export const CASE_FORMAT = 'lamina.case';
export const CASE_VERSION = 2;

// Ranges live in one module shared with the page's fields, the table builder and the command line.
export { LIMITS } from '../engine/inputRanges';

const finite = (what: string) =>
  z.number({ error: `${what} must be a number` }).refine(Number.isFinite, `${what} must be finite`);

/** A number inside one of the shared ranges, the message naming the field ("SSD must be ≥ 50 cm"). */
const inRange = (what: string, range: NumericRange) =>
  z.number({ error: `${what} must be a number` }).superRefine((v, ctx) => {
    const problem = rangeProblem(v, range);
    if (problem) ctx.addIssue({ code: 'custom', message: `${what} ${problem}` });
  });

export const layerSchema = z.strictObject({
  materialId: z.enum(MATERIAL_IDS, {
    error: `unknown material (expected one of ${MATERIAL_IDS.join(', ')})`,
  }),
  thicknessCm: inRange('thickness', RANGES.layerThicknessCm),
  densityGPerCm3: inRange('density', RANGES.densityGPerCm3).optional(),
  label: z.string().max(80, 'label must be at most 80 characters').optional(),
});

const distance = (what: string) => inRange(what, RANGES.distanceCm);

const field = (what: string) => inRange(what, RANGES.fieldCm);

export const setupSchema = z.discriminatedUnion(
  'kind',
  [
    z.strictObject({ kind: z.literal('SSD'), ssdCm: distance('SSD') }),
    z.strictObject({
      kind: z.literal('SAD'),
      sadCm: distance('SAD'),
      isocentreDepthCm: finite('isocentre depth').refine(
        (v) => v >= 0,
        'isocentre depth must be ≥ 0 cm',
      ),
    }),
  ],
  { error: 'set-up kind must be "SSD" or "SAD"' },
);

export const beamSchema = z.strictObject({
  energy: z.enum(BEAM_ENERGIES, {
    error: `unknown energy (expected one of ${BEAM_ENERGIES.join(', ')})`,
  }),
  setup: setupSchema,
  /** Field width (X) at 100 cm from the source (cm). */
  fieldXCm: field('field X'),
  /** Field length (Y) at 100 cm from the source (cm). */
  fieldYCm: field('field Y'),
  /**
   * Monitor units the planning system gives this beam, for comparison. One value per beam: every
   * point of the case is checked against it.
   */
  planningMu: finite('planning MU')
    .refine((v) => v > 0, 'planning MU must be > 0')
    .optional(),
});

export const pointSchema = z.strictObject({
  id: z
    .string({ error: 'point id must be text' })
    .min(1, 'point id must not be empty')
    .max(40, 'point id must be at most 40 characters'),
  depthCm: finite('depth').refine((v) => v >= 0, 'depth must be ≥ 0 cm'),
  /** Dose per fraction from the planning system at this point from this beam (cGy), for comparison. */
  planningDoseCGy: z
    .number({ error: 'planning dose must be a number' })
    .superRefine((v, ctx) => {
      const problem = planningDoseProblem(v);
      if (problem) ctx.addIssue({ code: 'custom', message: `planning dose ${problem}` });
    })
    .optional(),
});

/**
 * Measured water data carried inline as raw CSV text, so a case file stays self-contained:
 * a TMR or PDD matrix (PDD with its SSD), optional scatter factors, d_max and reference dose rate.
 * The tables themselves are checked with the measured-table reader (row/column in each message).
 */
export const waterDataSchema = z
  .strictObject({
    kind: z.enum(['tmr', 'pdd'], { error: 'water data kind must be "tmr" or "pdd"' }),
    fileName: z
      .string({ error: 'file name must be text' })
      .min(1, 'file name must not be empty')
      .max(200),
    csv: z
      .string({ error: 'csv must be text' })
      .min(1, 'csv must not be empty')
      .max(500_000, 'csv must be at most 500 000 characters'),
    ssdCm: distance('table SSD').optional(),
    dMaxCm: inRange('d_max', RANGES.dMaxCm).optional(),
    scatterFileName: z.string().min(1).max(200).optional(),
    scatterCsv: z
      .string()
      .max(100_000, 'scatter csv must be at most 100 000 characters')
      .optional(),
    referenceDosePerMuCGy: inRange('reference dose rate', RANGES.referenceDosePerMuCGy).optional(),
  })
  .superRefine((w, ctx) => {
    if (w.kind === 'pdd' && w.ssdCm === undefined) {
      ctx.addIssue({ code: 'custom', path: ['ssdCm'], message: 'a PDD table needs its SSD (cm)' });
      return;
    }
    // A number out of its range is reported on its own field, not again by the table builder.
    const ranged: [number | undefined, NumericRange][] = [
      [w.ssdCm, RANGES.distanceCm],
      [w.dMaxCm, RANGES.dMaxCm],
      [w.referenceDosePerMuCGy, RANGES.referenceDosePerMuCGy],
    ];
    if (ranged.some(([v, r]) => v !== undefined && rangeProblem(v, r) !== null)) return;
    const built = buildMeasuredWaterData(w);
    if (!built.ok)
      for (const message of built.problems)
        ctx.addIssue({
          code: 'custom',
          path: [
            message.startsWith(`${w.scatterFileName ?? 'scatter factors'}: `)
              ? 'scatterCsv'
              : 'csv',
          ],
          message,
        });
  });

/** A depth in cm for a message: two decimals, or enough digits for a sliver thinner than 0.01 cm. */
function cmText(v: number): string {
  return v >= 0.01 ? v.toFixed(2) : String(Number(v.toPrecision(3)));
}

/** Duplicate point ids (the points may be partly invalid: only text ids are compared). */
function checkDuplicatePointIds(points: unknown, ctx: z.RefinementCtx): void {
  if (!Array.isArray(points)) return;
  const seen = new Set<string>();
  points.forEach((p: unknown, i) => {
    const id = typeof p === 'object' && p !== null ? (p as { id?: unknown }).id : undefined;
    if (typeof id !== 'string') return;
    if (seen.has(id))
      ctx.addIssue({
        code: 'custom',
        path: ['points', i, 'id'],
        message: `duplicate point id "${id}"`,
      });
    seen.add(id);
  });
}

export const caseNotesSchema = z
  .string({ error: 'notes must be text' })
  .max(5000, 'notes must be at most 5000 characters');

export const caseSchema = z
  .strictObject({
    format: z.literal(CASE_FORMAT, { error: `format must be "${CASE_FORMAT}"` }),
    version: z.literal(CASE_VERSION, { error: `version must be ${CASE_VERSION}` }),
    name: z.string({ error: 'name must be text' }).max(200, 'name must be at most 200 characters'),
    notes: caseNotesSchema.optional(),
    beam: beamSchema,
    layers: z
      .array(layerSchema, { error: 'layers must be a list' })
      .min(1, 'at least one layer is needed')
      .max(LIMITS.maxLayers, `at most ${LIMITS.maxLayers} layers`),
    points: z
      .array(pointSchema, { error: 'points must be a list' })
      .max(LIMITS.maxPoints, `at most ${LIMITS.maxPoints} points`),
    /** Measured water data (optional; type-A methods need water data). */
    waterData: waterDataSchema.optional(),
    /** The check's settings saved with the case (prescription, tolerances, method, dose convention). */
    check: caseCheckSchema.optional(),
  })
  .superRefine((c, ctx) => {
    // Depths are checked against the phantom only when every layer is valid: a total built from
    // an invalid thickness would give ranges like "(0–-5.00 cm)".
    const layersValid =
      Array.isArray(c.layers) &&
      c.layers.length > 0 &&
      c.layers.every((l) => layerSchema.safeParse(l).success);
    if (!layersValid) {
      checkDuplicatePointIds(c.points, ctx);
      return;
    }
    const total = c.layers.reduce((s, l) => s + l.thicknessCm, 0);
    if (total > LIMITS.maxPhantomThicknessCm + 1e-9)
      ctx.addIssue({
        code: 'custom',
        path: ['layers'],
        message: `total thickness ${cmText(total)} cm exceeds ${LIMITS.maxPhantomThicknessCm} cm`,
      });
    c.points.forEach((p, i) => {
      if (p.depthCm > total + 1e-9)
        ctx.addIssue({
          code: 'custom',
          path: ['points', i, 'depthCm'],
          message: `depth ${p.depthCm} cm is outside the phantom (0–${cmText(total)} cm)`,
        });
    });
    checkDuplicatePointIds(c.points, ctx);
    const rx = c.check?.prescription;
    if (rx && !c.points.some((p) => p.id === rx.pointId))
      ctx.addIssue({
        code: 'custom',
        path: ['check', 'prescription', 'pointId'],
        message: `no point "${rx.pointId}" in this case`,
      });
    if (c.beam.setup.kind === 'SAD') {
      const { sadCm, isocentreDepthCm } = c.beam.setup;
      if (isocentreDepthCm > total + 1e-9)
        ctx.addIssue({
          code: 'custom',
          path: ['beam', 'setup', 'isocentreDepthCm'],
          message: `isocentre depth ${isocentreDepthCm} cm is outside the phantom (0–${cmText(total)} cm)`,
        });
      if (sadCm - isocentreDepthCm < LIMITS.minDistanceCm)
        ctx.addIssue({
          code: 'custom',
          path: ['beam', 'setup', 'isocentreDepthCm'],
          message: `SAD minus isocentre depth gives an SSD below ${LIMITS.minDistanceCm} cm`,
        });
    }
  });

export type LaminaCase = z.infer<typeof caseSchema>;
export type CaseLayer = z.infer<typeof layerSchema>;
export type CasePoint = z.infer<typeof pointSchema>;
export type CaseBeam = z.infer<typeof beamSchema>;
export type CaseWaterData = z.infer<typeof waterDataSchema>;
