// Sweeps for the factor view (worker side): the CF at one point of a case as one input varies —
// the density of one layer, the square field size, the beam energy or the point's depth — for
// every deterministic method. Each value is a changed copy of the case calculated by the same
// functions as a report (computeCaseParts, then the dose convention by convertMethodDose), so a
// sweep value equals the CF a report of that changed case prints. The Monte Carlo is not swept.
import { BEAM_ENERGIES, BEAM_ENERGY_LABELS, type BeamEnergy } from '../engine/beam/energies';
import { convertMethodDose } from '../engine/dose/doseConversion';
import type { DoseQuantity } from '../engine/dose/doseQuantity';
import { getMaterial } from '../engine/materials/materialLibrary';
import {
  isMethodId,
  METHOD_IDS,
  MONTE_CARLO_METHOD_ID,
  methodInfo,
  methodOrder,
} from '../engine/methodRegistry';
import { validateCase } from '../io/caseFile';
import { LIMITS, type LaminaCase } from '../io/caseSchema';
import type { SweepResult, SweepSeries, SweepVariable } from '../contract/explain';
import type { Problem } from './calcRequest';
import { computeCaseParts, phantomOfCase } from './calculateCase';
import { resolveDoseTo } from './doseConvention';
import type { TypeAVariants } from './typeAForCase';
import { resolveWater, type WaterSourceSpec } from './waterSource';

export interface SweepRequest {
  case: unknown;
  water: WaterSourceSpec;
  variable: SweepVariable;
  /** Depth of the point (cm); for a depth sweep, ignored (the x values are depths). */
  depthCm: number;
  /** Density sweep: index of the layer whose density varies (from the surface). */
  layerIndex?: number;
  /** Range and number of values (density g/cm³, field side cm, depth cm); ignored for energy. */
  from?: number;
  to?: number;
  count?: number;
  /** One series per energy (density, field and depth sweeps); the case's energy when absent. */
  energies?: string[];
  options?: {
    doseTo?: DoseQuantity;
    typeA?: Pick<TypeAVariants, 'bathoTable' | 'etarRhoTilde' | 'etarScatterLengthCm'>;
  };
}

type SweepTypeA = NonNullable<SweepRequest['options']>['typeA'];

export type SweepAnswer = { ok: true; result: SweepResult } | { ok: false; problems: Problem[] };

/** Most values in one sweep (each is a calculation of every method at one point). */
export const SWEEP_MAX_COUNT = 101;

/** Nominal MV of an energy, for the x axis of an energy sweep (Co-60: 1.25, its mean photon energy in MeV). */
const NOMINAL_MV: Record<BeamEnergy, number> = {
  'Co-60': 1.25,
  '4MV': 4,
  '6MV': 6,
  '10MV': 10,
  '15MV': 15,
  '18MV': 18,
};

/** Deterministic methods in registry order (the Monte Carlo is never swept). */
const SWEPT_METHODS = METHOD_IDS.filter((id) => id !== MONTE_CARLO_METHOD_ID);

function evenly(from: number, to: number, count: number): Float64Array {
  if (count === 1) return Float64Array.of(from);
  return Float64Array.from({ length: count }, (_, i) => from + ((to - from) * i) / (count - 1));
}

type Checked =
  | {
      ok: true;
      c: LaminaCase;
      x: Float64Array;
      energies: BeamEnergy[];
      xLabel: string;
      conditions: string;
    }
  | { ok: false; problems: Problem[] };

function rangeProblems(
  req: SweepRequest,
  lo: number,
  hi: number,
  unit: string,
): Problem[] | Float64Array {
  const problems: Problem[] = [];
  const num = (name: 'from' | 'to', v: unknown) => {
    if (typeof v !== 'number' || !Number.isFinite(v))
      problems.push({ path: name, message: `${name} must be a finite number (${unit})` });
    else if (v < lo || v > hi)
      problems.push({ path: name, message: `${name} must lie in ${lo}–${hi} ${unit} (got ${v})` });
  };
  num('from', req.from);
  num('to', req.to);
  const n = req.count;
  if (typeof n !== 'number' || !Number.isInteger(n) || n < 2 || n > SWEEP_MAX_COUNT)
    problems.push({
      path: 'count',
      message: `count must be a whole number from 2 to ${SWEEP_MAX_COUNT}`,
    });
  return problems.length ? problems : evenly(req.from as number, req.to as number, n as number);
}

function checkRequest(req: SweepRequest): Checked {
  const v = validateCase(req.case);
  if (!v.ok) return v;
  const c = v.value;
  const phantom = phantomOfCase(c);
  const total = phantom.totalThicknessCm;
  const problems: Problem[] = [];
  const energies: BeamEnergy[] = [];
  for (const [i, e] of (req.energies ?? [c.beam.energy]).entries()) {
    if ((BEAM_ENERGIES as readonly string[]).includes(e)) energies.push(e as BeamEnergy);
    else
      problems.push({
        path: `energies[${i}]`,
        message: `unknown energy "${e}" (expected one of ${BEAM_ENERGIES.join(', ')})`,
      });
  }
  if (req.variable !== 'depth') {
    const d = req.depthCm;
    if (typeof d !== 'number' || !Number.isFinite(d) || d < 0 || d > total)
      problems.push({
        path: 'depthCm',
        message: `depth must lie in the phantom, 0–${total.toFixed(2)} cm (got ${String(d)})`,
      });
  }
  if (problems.length) return { ok: false, problems };
  const field = `${c.beam.fieldXCm} × ${c.beam.fieldYCm} cm`;
  const at = `point at ${req.depthCm} cm`;
  const names = energies.map((e) => BEAM_ENERGY_LABELS[e]).join(', ');
  const finish = (
    r: Problem[] | Float64Array,
    xLabel: string,
    conditions: string,
    list = energies,
  ): Checked =>
    r instanceof Float64Array
      ? { ok: true, c, x: r, energies: list, xLabel, conditions }
      : { ok: false, problems: r };
  switch (req.variable) {
    case 'density': {
      const k = req.layerIndex;
      const layer = typeof k === 'number' ? phantom.layers[k] : undefined;
      if (!layer || !Number.isInteger(k))
        return {
          ok: false,
          problems: [
            {
              path: 'layerIndex',
              message: `layer must be one of the case's layers, 0–${phantom.layers.length - 1}`,
            },
          ],
        };
      const name = getMaterial(layer.materialId).label.replace(/ \(.*\)$/, '');
      return finish(
        rangeProblems(req, 0.001, LIMITS.maxDensityGPerCm3, 'g/cm³'),
        `Density of layer ${(k as number) + 1}, ${name} (g/cm³)`,
        `${at}, field ${field}, ${names}`,
      );
    }
    case 'field':
      return finish(
        rangeProblems(req, LIMITS.minFieldCm, LIMITS.maxFieldCm, 'cm'),
        'Square field side at 100 cm (cm)',
        `${at}, ${names}`,
      );
    case 'depth':
      return finish(
        rangeProblems(req, 0, total, 'cm'),
        'Depth of the point (cm)',
        `field ${field}, ${names}`,
      );
    case 'energy': {
      const x = Float64Array.from(BEAM_ENERGIES, (e) => NOMINAL_MV[e]);
      return finish(x, 'Nominal energy (MV; Co-60 at 1.25)', `${at}, field ${field}`, [
        ...BEAM_ENERGIES,
      ]);
    }
    default:
      return {
        ok: false,
        problems: [
          {
            path: 'variable',
            message: 'variable must be one of density, field, energy, depth',
          },
        ],
      };
  }
}

/** CF of every deterministic method at the depths of a changed case, in the dose convention. */
function cfsAt(
  c: LaminaCase,
  depthsCm: ArrayLike<number>,
  water: WaterSourceSpec,
  doseTo: DoseQuantity,
  typeA: SweepTypeA | undefined,
): Map<string, (number | null)[]> {
  const points = Array.from(depthsCm, (d, i) => ({ id: `x${i}`, depthCm: d }));
  const changed: LaminaCase = { ...c, points };
  const resolved = resolveWater(changed, water);
  const waterData = resolved.ok ? resolved.waterData : undefined;
  const phantom = phantomOfCase(changed);
  const parts = computeCaseParts(changed, {
    ...(waterData ? { waterData } : {}),
    depthStepCm: phantom.totalThicknessCm,
    methods: SWEPT_METHODS,
    ...(typeA ? { typeA } : {}),
  });
  const out = new Map<string, (number | null)[]>();
  for (const m of parts.methods) {
    const converted = convertMethodDose(m, doseTo, phantom, changed.beam.energy);
    out.set(
      m.id,
      converted.points.map((p) => p.cf),
    );
  }
  return out;
}

export function cfSweepRequest(req: SweepRequest): SweepAnswer {
  const checked = checkRequest(req);
  if (!checked.ok) return checked;
  const { c, x, energies } = checked;
  const doseTo = resolveDoseTo(req.options?.doseTo, c.check?.doseTo);
  const typeA = req.options?.typeA;
  const notes: string[] = [
    'Monte Carlo is not swept: a run per value would take minutes; run it on the case itself.',
  ];
  const waterFor = (e: BeamEnergy): WaterSourceSpec =>
    e === c.beam.energy ? req.water : { kind: 'modelled' };
  if (energies.some((e) => e !== c.beam.energy) && (c.waterData || req.water.kind === 'table'))
    notes.push(
      `Energies other than the case's (${c.beam.energy}) read the modelled beam's water data.`,
    );
  if (energies.includes('18MV'))
    notes.push('18 MV uses an approximate stand-in spectrum (tuned on PDD(10) only).');
  const series = new Map<string, SweepSeries>();
  // An energy sweep has one series per method (its x values are the energies).
  const seriesEnergy = (e: BeamEnergy) => (req.variable === 'energy' ? 'each' : e);
  const record = (
    energy: BeamEnergy,
    cfs: Map<string, (number | null)[]>,
    index: (k: number) => number,
  ) => {
    for (const [id, values] of cfs) {
      const key = `${id}|${seriesEnergy(energy)}`;
      let s = series.get(key);
      if (!s) {
        s = {
          methodId: id,
          label: isMethodId(id) ? methodInfo(id).label : id,
          energy: seriesEnergy(energy),
          cf: new Float64Array(x.length).fill(Number.NaN),
        };
        series.set(key, s);
      }
      const cf = s.cf;
      values.forEach((v, k) => {
        if (v !== null && Number.isFinite(v)) cf[index(k)] = v;
      });
    }
  };
  const run = (
    changed: LaminaCase,
    depths: ArrayLike<number>,
    energy: BeamEnergy,
    index: (k: number) => number,
  ) => record(energy, cfsAt(changed, depths, waterFor(energy), doseTo, typeA), index);
  energies.forEach((energy, e) => {
    const base: LaminaCase = { ...c, beam: { ...c.beam, energy } };
    if (req.variable === 'depth') run(base, x, energy, (k) => k);
    else if (req.variable === 'energy') run(base, [req.depthCm], energy, () => e);
    else
      x.forEach((value, k) => {
        const changed: LaminaCase =
          req.variable === 'field'
            ? { ...base, beam: { ...base.beam, fieldXCm: value, fieldYCm: value } }
            : {
                ...base,
                layers: base.layers.map((l, j) =>
                  j === req.layerIndex ? { ...l, densityGPerCm3: value } : l,
                ),
              };
        run(changed, [req.depthCm], energy, () => k);
      });
  });
  const ordered = [...series.values()].sort(
    (a, b) => methodOrder(a.methodId) - methodOrder(b.methodId),
  );
  return {
    ok: true,
    result: {
      variable: req.variable,
      xLabel: checked.xLabel,
      x,
      ...(req.variable === 'energy' ? { xNames: [...energies] } : {}),
      conditions: checked.conditions,
      doseTo,
      series: ordered,
      notes,
    },
  };
}
