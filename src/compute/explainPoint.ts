// The factor view's calculation (worker side): every method's terms at one depth of a case,
// computed by the functions that compute the results — the type-A corrections through
// typeAAtDepth (the curves' own evaluation, which hands back the factors each method multiplied),
// the type-B engines through typeBMethodResult and their dose parts through typeBPartsAtDepth —
// with the case's water data, type-A options and dose convention resolved as for a calculation.
// The factors end with the dose-convention factor where one applies, so their product is the CF
// the report prints.
import { ssdCmOf } from '../engine/beam/geometry';
import { productOfFactors, type ExplainFactor } from '../engine/corrections/correctionExplanation';
import { TYPE_A_METHODS } from '../engine/corrections/typeAMethods';
import { typeAAtDepth } from '../engine/corrections/typeAResults';
import { doseNoteOf, layerConversionFactors } from '../engine/dose/doseConversion';
import type { DoseQuantity } from '../engine/dose/doseQuantity';
import { getMaterial } from '../engine/materials/materialLibrary';
import { methodInfo } from '../engine/methodRegistry';
import { layerIndexAtDepth, radiologicalDepthCm } from '../engine/phantom/slabPhantom';
import { typeBPartsAtDepth } from '../engine/superposition/typeBParts';
import { typeBMethodResult } from '../engine/superposition/typeBMethods';
import { validateCase } from '../io/caseFile';
import type { LaminaCase } from '../io/caseSchema';
import type { MethodExplanation, PointExplanation } from '../contract/explain';
import type { Problem } from './calcRequest';
import { phantomOfCase } from './calculateCase';
import { resolveDoseTo } from './doseConvention';
import { NEEDS_WATER_DATA, typeAGeometryOfCase, typeAOptionsForCase } from './typeAForCase';
import type { TypeAVariants } from './typeAForCase';
import { TYPE_B_METHOD_IDS } from './typeBForCase';
import { resolveWater, type WaterSourceSpec } from './waterSource';

export interface ExplainRequest {
  /** A case document (validated here). */
  case: unknown;
  water: WaterSourceSpec;
  /** Depth of the point of interest (cm), inside the phantom. */
  depthCm: unknown;
  options?: {
    doseTo?: DoseQuantity;
    typeA?: Pick<TypeAVariants, 'bathoTable' | 'etarRhoTilde' | 'etarScatterLengthCm'>;
  };
}

export type ExplainAnswer =
  { ok: true; explanation: PointExplanation } | { ok: false; problems: Problem[] };

const MONTE_CARLO_NOTE =
  'Monte Carlo: no written-out factors; its CF at the case’s points (with 1σ) is in the results once a run exists. Dose by layer where the electrons were set moving is not scored.';

/** The factor that puts a native dose in the request's convention, when it is not 1. */
function conversionFactor(
  methodId: string,
  doseTo: DoseQuantity,
  c: LaminaCase,
  layerFactors: number[],
  layerIndex: number,
): ExplainFactor | null {
  const k = layerFactors[layerIndex] ?? 1;
  if (k === 1) return null;
  const note = doseNoteOf(methodId, doseTo, c.beam.energy);
  const symbol = note.native === 'water' ? '(μ_en/ρ)_m/(μ_en/ρ)_w' : 's_w,m';
  return {
    symbol,
    label: `to ${doseTo === 'water' ? 'dose to water' : 'dose to medium'}`,
    value: k,
  };
}

function depthProblem(raw: unknown, totalCm: number): Problem | null {
  if (typeof raw !== 'number' || !Number.isFinite(raw))
    return { path: 'depthCm', message: 'depth must be a finite number (cm)' };
  if (raw < 0 || raw > totalCm)
    return {
      path: 'depthCm',
      message: `depth must lie in the phantom, 0–${totalCm.toFixed(2)} cm (got ${raw} cm)`,
    };
  return null;
}

export function explainPointRequest(req: ExplainRequest): ExplainAnswer {
  const v = validateCase(req.case);
  if (!v.ok) return v;
  const c = v.value;
  const phantom = phantomOfCase(c);
  const bad = depthProblem(req.depthCm, phantom.totalThicknessCm);
  if (bad) return { ok: false, problems: [bad] };
  const depthCm = req.depthCm as number;
  const water = resolveWater(c, req.water);
  if (!water.ok)
    return {
      ok: false,
      problems: water.problems.map((message) => ({ path: 'waterTable', message })),
    };
  const doseTo = resolveDoseTo(req.options?.doseTo, c.check?.doseTo);
  const layerIndex = layerIndexAtDepth(phantom, depthCm);
  const withConversion = (
    id: string,
    cfNative: number | null,
    nativeFactors: ExplainFactor[],
  ): Pick<MethodExplanation, 'cf' | 'product' | 'factors'> => {
    const k = conversionFactor(
      id,
      doseTo,
      c,
      layerConversionFactors(id, doseTo, phantom, c.beam.energy),
      layerIndex,
    );
    const factors = k ? [...nativeFactors, k] : nativeFactors;
    const cf = cfNative === null ? null : cfNative * (k?.value ?? 1);
    return { cf, product: cf === null ? null : productOfFactors(factors), factors };
  };
  const methods: MethodExplanation[] = [];
  const notes: string[] = [];
  const wd = water.waterData;
  const options = typeAOptionsForCase(c, req.options?.typeA ?? {});
  const geometry = typeAGeometryOfCase(c, phantom, []);
  for (const m of TYPE_A_METHODS) {
    if (!wd) {
      notes.push(`${m.label}: ${NEEDS_WATER_DATA}`);
      continue;
    }
    const e = typeAAtDepth(m, geometry, wd, depthCm, options);
    const ex = e.explanation ?? { quantities: [], factors: [] };
    methods.push({
      id: m.id,
      label: m.label,
      methodClass: methodInfo(m.id).methodClass,
      ...withConversion(m.id, e.cf, ex.factors),
      quantities: ex.quantities,
      ...(ex.bathoLayers ? { bathoLayers: ex.bathoLayers } : {}),
      flags: e.flags,
    });
  }
  const beam = {
    ssdCm: ssdCmOf(c.beam.setup),
    fieldXCm: c.beam.fieldXCm,
    fieldYCm: c.beam.fieldYCm,
  };
  for (const engine of TYPE_B_METHOD_IDS) {
    const reported = typeBMethodResult(engine, {
      energy: c.beam.energy,
      phantom,
      beam,
      depthCm: [],
      points: [{ id: 'explained', depthCm }],
    });
    const point = reported.points[0];
    const parts = typeBPartsAtDepth(engine, c.beam.energy, phantom, beam, depthCm);
    methods.push({
      id: engine,
      label: reported.label,
      methodClass: 'type B',
      ...withConversion(engine, point?.cf ?? null, [
        {
          symbol: 'D_slabs(d)/D_water(d)',
          label: 'dose in the slabs over the dose in water, same geometry',
          value: parts.dosePerMuCGy / parts.waterDosePerMuCGy,
        },
      ]),
      quantities: [
        { symbol: 'd', label: 'depth of the point', value: depthCm, unit: 'cm' },
        {
          symbol: 'D_slabs(d)',
          label: 'dose per MU in the slabs (native, dose to medium)',
          value: parts.dosePerMuCGy,
          unit: 'cGy/MU',
        },
        {
          symbol: 'D_water(d)',
          label: 'dose per MU in water of the same thickness',
          value: parts.waterDosePerMuCGy,
          unit: 'cGy/MU',
        },
      ],
      parts: {
        dosePerMuCGy: parts.dosePerMuCGy,
        waterDosePerMuCGy: parts.waterDosePerMuCGy,
        ...(parts.primary ? { primary: parts.primary } : {}),
        ...(parts.scatter ? { scatter: parts.scatter } : {}),
        ...(parts.byLayerOfOrigin ? { byLayerOfOrigin: Array.from(parts.byLayerOfOrigin) } : {}),
      },
      flags: point?.flags ?? [],
    });
  }
  notes.push(MONTE_CARLO_NOTE);
  return {
    ok: true,
    explanation: {
      depthCm,
      radiologicalDepthCm: radiologicalDepthCm(phantom, depthCm),
      layerIndex,
      layers: phantom.layers.map((l, index) => ({
        index,
        material: getMaterial(l.materialId).label,
        topCm: l.topCm,
        bottomCm: l.bottomCm,
        relativeElectronDensity: l.relativeElectronDensity,
      })),
      doseTo,
      waterData: wd?.source ?? 'no water data',
      methods,
      notes,
    },
  };
}
