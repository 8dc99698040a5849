// The imported beams to a Lamina plan (lamina.plan): one beam per RT Plan beam, each a case with
// the SAD set-up (isocentre depth along its ray), the jaw field at 100 cm, the slab path from the
// skin, the isocentre point (shared by every beam) with the planning system's MU and dose, and
// any extra points along the ray. The result is validated by the plan and case rules.
import type { BeamAnalysis, Slab } from './analyseBeam';
import type { ImportedBeam } from './importDicom';
import type { ImportSettings } from './importSettings';
import { PATIENT_POSITION_NAMES } from './iecGeometry';
import { withPlanningValues } from './planningValues';
import { distanceMm, formatVec } from './vec3';
import {
  CASE_FORMAT,
  CASE_VERSION,
  type CaseLayer,
  type CasePoint,
  type LaminaCase,
} from '../io/caseSchema';
import { validatePlan, type LaminaPlan } from '../io/planFile';
import { PLAN_FORMAT, PLAN_VERSION } from '../io/planSchema';

export const ISO_POINT_ID = 'ISO';
/** Depths and thicknesses are rounded to this (cm): 10 µm. */
const GRID_CM = 0.001;
/** A dose specification point this close to the isocentre is the isocentre (mm). */
const SAME_POINT_MM = 1;

export const SLAB_MODEL_CAUTION =
  'The slab path along one central ray simplifies the patient: lateral inhomogeneity, the body outline and obliquity are ignored.';

export interface BeamForPlan {
  beam: ImportedBeam;
  analysis: BeamAnalysis;
  /** The slabs to use (the analysis's, or as edited). */
  slabs: readonly Slab[];
}

export type AssembleResult =
  { ok: true; plan: LaminaPlan; notes: string[] } | { ok: false; problems: string[] };

const round = (v: number) => Math.round(v / GRID_CM) * GRID_CM;
const fmt = (v: number, d = 2) => Number(v.toFixed(d)).toString();

/** Layers from slabs, with slab boundaries (not thicknesses) rounded so the total stays exact. */
export function layersOf(slabs: readonly Slab[]): CaseLayer[] {
  const layers: CaseLayer[] = [];
  let top = 0;
  let roundedTop = 0;
  for (const s of slabs) {
    top += s.thicknessCm;
    const bottom = round(top);
    const t = Number((bottom - roundedTop).toFixed(6));
    roundedTop = bottom;
    if (t <= 0) continue;
    layers.push({
      materialId: s.materialId,
      thicknessCm: t,
      ...(s.densityGPerCm3 !== undefined ? { densityGPerCm3: s.densityGPerCm3 } : {}),
      label: `ρe ${s.rhoE.toFixed(3)} from CT`,
    });
  }
  return layers;
}

function notesOf(planLabel: string, item: BeamForPlan, s: ImportSettings): string {
  const { beam: b, analysis: a } = item;
  const planned =
    b.plannedSsdMm !== null ? ` (planning system: ${fmt(b.plannedSsdMm / 10)} cm)` : '';
  return [
    `Imported from the DICOM RT Plan "${planLabel}" and its CT, beam ${b.number} "${b.name}".`,
    `Gantry ${fmt(b.gantryDeg, 1)}°, couch ${fmt(b.couchDeg, 1)}°, collimator ${fmt(b.collimatorDeg, 1)}° (IEC 61217), ${b.patientPosition ? PATIENT_POSITION_NAMES[b.patientPosition] : ''}; SAD ${fmt(b.sadMm / 10)} cm; isocentre ${formatVec(b.isoMm ?? [0, 0, 0])} mm.`,
    `Skin entry at the body threshold ${s.bodyThresholdHu} HU: SSD ${fmt(a.ssdCm)} cm${planned}, isocentre depth ${fmt(a.isoDepthCm)} cm along the central ray.`,
    `Slabs from the density profile through the calibration "${s.calibration.label}" (similarity ${s.segmentation.similarityRhoE} ρe, minimum ${s.segmentation.minThicknessCm} cm).`,
    SLAB_MODEL_CAUTION,
    ...b.notes,
    ...a.notes,
  ].join('\n');
}

export function caseForBeam(
  planLabel: string,
  item: BeamForPlan,
  s: ImportSettings,
  notes: string[],
): LaminaCase {
  const { beam: b, analysis: a } = item;
  const layers = layersOf(item.slabs);
  const totalCm = layers.reduce((t, l) => t + l.thicknessCm, 0);
  const isoDepthCm = round(a.isoDepthCm);
  const points: CasePoint[] = [{ id: ISO_POINT_ID, depthCm: isoDepthCm }];
  for (const offset of s.extraPointOffsetsCm) {
    const depthCm = round(isoDepthCm + offset);
    const id = `B${b.number}${offset >= 0 ? '+' : '-'}${fmt(Math.abs(offset), 1)}`;
    if (depthCm < 0 || depthCm > totalCm + 1e-9)
      notes.push(
        `${b.name}: extra point ${id} (${fmt(depthCm)} cm deep) lies outside the slab path, left out`,
      );
    else if (!points.some((p) => p.id === id)) points.push({ id, depthCm });
  }
  let doseCGy = b.doseGy !== null ? b.doseGy * 100 : null;
  if (
    doseCGy !== null &&
    b.doseSpecificationPointMm &&
    b.isoMm &&
    distanceMm(b.doseSpecificationPointMm, b.isoMm) > SAME_POINT_MM
  ) {
    notes.push(
      `${b.name}: the planning system's beam dose is specified at ${formatVec(b.doseSpecificationPointMm)} mm, not at the isocentre: not compared (MU are)`,
    );
    doseCGy = null;
  }
  const c: LaminaCase = {
    format: CASE_FORMAT,
    version: CASE_VERSION,
    name: `${planLabel} — ${b.name}`.slice(0, 200),
    notes: notesOf(planLabel, item, s).slice(0, 5000),
    beam: {
      energy: b.energy ?? '6MV',
      setup: { kind: 'SAD', sadCm: b.sadMm / 10, isocentreDepthCm: isoDepthCm },
      fieldXCm: round(b.field?.xAt100Cm ?? 0),
      fieldYCm: round(b.field?.yAt100Cm ?? 0),
    },
    layers,
    points,
  };
  return withPlanningValues(c, ISO_POINT_ID, { mu: b.meterset, doseCGy });
}

export function assemblePlan(
  planLabel: string,
  items: readonly BeamForPlan[],
  s: ImportSettings,
): AssembleResult {
  if (items.length === 0) return { ok: false, problems: ['no beam of the plan can be checked'] };
  const bad = items.find((i) => !i.beam.energy || !i.beam.field);
  if (bad)
    return { ok: false, problems: [`${bad.beam.name}: no energy or field (the beam was refused)`] };
  const notes: string[] = [];
  const allDoses = items.every((i) => i.beam.doseGy !== null && i.beam.doseGy > 0);
  const raw = {
    format: PLAN_FORMAT,
    version: PLAN_VERSION,
    name: planLabel.slice(0, 200),
    notes: [
      `Imported from the DICOM RT Plan "${planLabel}": ${items.length} beam${items.length > 1 ? 's' : ''} at one isocentre (point ${ISO_POINT_ID}).`,
      allDoses
        ? "Beam weights are the planning system's beam doses."
        : 'Beam weights are 1 (the plan does not give every beam dose).',
      SLAB_MODEL_CAUTION,
    ].join('\n'),
    beams: items.map((i) => ({
      id: i.beam.id,
      label: i.beam.name.slice(0, 80),
      weight: allDoses ? (i.beam.doseGy as number) : 1,
      case: caseForBeam(planLabel, i, s, notes),
    })),
  };
  const v = validatePlan(raw);
  if (!v.ok)
    return {
      ok: false,
      problems: v.problems.map((p) => {
        const m = /^beams\[(\d+)\]/.exec(p.path);
        const name = m ? items[Number(m[1])]?.beam.name : undefined;
        return `${name ? `${name}: ` : ''}${p.path}: ${p.message}`;
      }),
    };
  return { ok: true, plan: v.value, notes };
}
