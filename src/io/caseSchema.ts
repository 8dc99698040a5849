// The Lamina case file: a versioned JSON document describing one beam's path through a slab
// phantom, the points of interest on its central axis, the planning system's values to compare
// with (the beam's MU, the dose at each point) and the check's settings. Every rule here names
// its field. Version 2 moved the planning MU from the points to the beam (caseMigrations.ts).
// zod/mini (the tree-shakable form of zod: same checks and messages) keeps the page's entry small.
import * as z from 'zod/mini';
import './zodEnglish';
import { caseCheckSchema } from './checkSettingsSchema';
import { BEAM_ENERGIES } from '../engine/beam/energies';
import { MATERIAL_IDS } from '../engine/materials/materialLibrary';
import { buildMeasuredWaterData } from '../engine/beam/measuredTable';

export const CASE_FORMAT = 'lamina.case';
export const CASE_VERSION = 2;

/** Limits that keep inputs physical and inside what the engine is built for. */
export const LIMITS = {
  maxDensityGPerCm3: 3,
  maxLayerThicknessCm: 100,
  maxPhantomThicknessCm: 100,
  minDistanceCm: 50,
  maxDistanceCm: 150,
  minFieldCm: 1,
  maxFieldCm: 40,
  maxLayers: 50,
  maxPoints: 50,
  /**
   * Thinnest layer (cm): 10 µm, far below a CT voxel or a film; thinner "layers" only carry
   * rounding (1e-323 cm gave a non-finite superposition curve).
   */
  minLayerThicknessCm: 0.001,
  /**
   * Lowest layer density (g/cm³): a tenth of air's (0.0012); lower densities only carry rounding
   * (5e-324 g/cm³ gave an infinite lateral electron range in the equilibrium warnings).
   */
  minDensityGPerCm3: 0.0001,
} as const;

const finite = (what: string) =>
  z
    .number({ error: `${what} must be a number` })
    .check(z.refine(Number.isFinite, `${what} must be finite`));

export const layerSchema = z.strictObject({
  materialId: z.enum(MATERIAL_IDS, {
    error: `unknown material (expected one of ${MATERIAL_IDS.join(', ')})`,
  }),
  thicknessCm: finite('thickness').check(
    z.refine((v) => v > 0, 'thickness must be > 0 cm'),
    z.refine(
      (v) => v >= LIMITS.minLayerThicknessCm,
      `thickness must be ≥ ${LIMITS.minLayerThicknessCm} cm`,
    ),
    z.refine(
      (v) => v <= LIMITS.maxLayerThicknessCm,
      `thickness must be ≤ ${LIMITS.maxLayerThicknessCm} cm`,
    ),
  ),
  densityGPerCm3: z.optional(
    finite('density').check(
      z.refine((v) => v > 0, 'density must be > 0 g/cm³'),
      z.refine(
        (v) => v >= LIMITS.minDensityGPerCm3,
        `density must be ≥ ${LIMITS.minDensityGPerCm3} g/cm³`,
      ),
      z.refine(
        (v) => v <= LIMITS.maxDensityGPerCm3,
        `density must be ≤ ${LIMITS.maxDensityGPerCm3} g/cm³`,
      ),
    ),
  ),
  label: z.optional(z.string().check(z.maxLength(80, 'label must be at most 80 characters'))),
});

const distance = (what: string) =>
  finite(what).check(
    z.refine((v) => v >= LIMITS.minDistanceCm, `${what} must be ≥ ${LIMITS.minDistanceCm} cm`),
    z.refine((v) => v <= LIMITS.maxDistanceCm, `${what} must be ≤ ${LIMITS.maxDistanceCm} cm`),
  );

const field = (what: string) =>
  finite(what).check(
    z.refine((v) => v >= LIMITS.minFieldCm, `${what} must be ≥ ${LIMITS.minFieldCm} cm`),
    z.refine((v) => v <= LIMITS.maxFieldCm, `${what} must be ≤ ${LIMITS.maxFieldCm} cm`),
  );

export const setupSchema = z.discriminatedUnion(
  'kind',
  [
    z.strictObject({ kind: z.literal('SSD'), ssdCm: distance('SSD') }),
    z.strictObject({
      kind: z.literal('SAD'),
      sadCm: distance('SAD'),
      isocentreDepthCm: finite('isocentre depth').check(
        z.refine((v) => v >= 0, 'isocentre depth must be ≥ 0 cm'),
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
  planningMu: z.optional(
    finite('planning MU').check(z.refine((v) => v > 0, 'planning MU must be > 0')),
  ),
});

export const pointSchema = z.strictObject({
  id: z
    .string({ error: 'point id must be text' })
    .check(
      z.minLength(1, 'point id must not be empty'),
      z.maxLength(40, 'point id must be at most 40 characters'),
    ),
  depthCm: finite('depth').check(z.refine((v) => v >= 0, 'depth must be ≥ 0 cm')),
  /** Dose per fraction from the planning system at this point from this beam (cGy), for comparison. */
  planningDoseCGy: z.optional(
    finite('planning dose').check(
      z.refine((v) => v >= 0, 'planning dose must be ≥ 0 cGy'),
      z.refine((v) => v === 0 || v >= 0.001, 'planning dose must be 0 (none) or ≥ 0.001 cGy'),
    ),
  ),
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
      .check(z.minLength(1, 'file name must not be empty'), z.maxLength(200)),
    csv: z
      .string({ error: 'csv must be text' })
      .check(
        z.minLength(1, 'csv must not be empty'),
        z.maxLength(500_000, 'csv must be at most 500 000 characters'),
      ),
    ssdCm: z.optional(distance('table SSD')),
    dMaxCm: z.optional(
      finite('d_max').check(z.refine((v) => v > 0 && v < 10, 'd_max must lie in (0, 10) cm')),
    ),
    scatterFileName: z.optional(z.string().check(z.minLength(1), z.maxLength(200))),
    scatterCsv: z.optional(
      z.string().check(z.maxLength(100_000, 'scatter csv must be at most 100 000 characters')),
    ),
    referenceDosePerMuCGy: z.optional(
      finite('reference dose rate').check(
        z.refine((v) => v > 0 && v <= 10, 'reference dose rate must lie in (0, 10] cGy/MU'),
      ),
    ),
  })
  .check(
    z.superRefine((w, ctx) => {
      if (w.kind === 'pdd' && w.ssdCm === undefined) {
        ctx.addIssue({
          code: 'custom',
          path: ['ssdCm'],
          message: 'a PDD table needs its SSD (cm)',
        });
        return;
      }
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
    }),
  );

export const caseSchema = z
  .strictObject({
    format: z.literal(CASE_FORMAT, { error: `format must be "${CASE_FORMAT}"` }),
    version: z.literal(CASE_VERSION, { error: `version must be ${CASE_VERSION}` }),
    name: z
      .string({ error: 'name must be text' })
      .check(z.maxLength(200, 'name must be at most 200 characters')),
    notes: z.optional(z.string().check(z.maxLength(5000, 'notes must be at most 5000 characters'))),
    beam: beamSchema,
    layers: z
      .array(layerSchema, { error: 'layers must be a list' })
      .check(
        z.minLength(1, 'layers: at least one layer is needed'),
        z.maxLength(LIMITS.maxLayers, `layers: at most ${LIMITS.maxLayers} layers`),
      ),
    points: z
      .array(pointSchema, { error: 'points must be a list' })
      .check(z.maxLength(LIMITS.maxPoints, `points: at most ${LIMITS.maxPoints} points`)),
    /** Measured water data (optional; type-A methods need water data). */
    waterData: z.optional(waterDataSchema),
    /** The check's settings saved with the case (prescription, tolerances, method, dose convention). */
    check: z.optional(caseCheckSchema),
  })
  .check(
    z.superRefine((c, ctx) => {
      const total = c.layers.reduce((s, l) => s + l.thicknessCm, 0);
      if (total > LIMITS.maxPhantomThicknessCm + 1e-9)
        ctx.addIssue({
          code: 'custom',
          path: ['layers'],
          message: `total thickness ${total.toFixed(2)} cm exceeds ${LIMITS.maxPhantomThicknessCm} cm`,
        });
      c.points.forEach((p, i) => {
        if (p.depthCm > total + 1e-9)
          ctx.addIssue({
            code: 'custom',
            path: ['points', i, 'depthCm'],
            message: `depth ${p.depthCm} cm is outside the phantom (0–${total.toFixed(2)} cm)`,
          });
      });
      const seen = new Set<string>();
      c.points.forEach((p, i) => {
        if (seen.has(p.id))
          ctx.addIssue({
            code: 'custom',
            path: ['points', i, 'id'],
            message: `duplicate point id "${p.id}"`,
          });
        seen.add(p.id);
      });
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
            message: `isocentre depth ${isocentreDepthCm} cm is outside the phantom (0–${total.toFixed(2)} cm)`,
          });
        if (sadCm - isocentreDepthCm < LIMITS.minDistanceCm)
          ctx.addIssue({
            code: 'custom',
            path: ['beam', 'setup', 'isocentreDepthCm'],
            message: `SAD minus isocentre depth gives an SSD below ${LIMITS.minDistanceCm} cm`,
          });
      }
    }),
  );

export type LaminaCase = z.infer<typeof caseSchema>;
export type CaseLayer = z.infer<typeof layerSchema>;
export type CasePoint = z.infer<typeof pointSchema>;
export type CaseBeam = z.infer<typeof beamSchema>;
export type CaseWaterData = z.infer<typeof waterDataSchema>;
