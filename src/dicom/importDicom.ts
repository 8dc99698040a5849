// Dropped files to what the slab model needs: the CT series as a volume, the RT Plan's beams, and
// for each beam the HU sampled along its central ray from the source through the isocentre. Files
// are read one at a time (only the HU of CT slices are kept), with progress. Pure: runs in the
// import worker in the page and directly on the command line.
import { beamEnergyFor } from './energyMapping';
import type { BeamEnergy } from '../engine/beam/energies';
import { assembleCtVolume, type CtVolume } from './ctVolume';
import { readCtSlice, type CtSlice } from './ctSlice';
import { jawField, type JawField } from './fieldSize';
import { sourceDirectionPatient } from './iecGeometry';
import { DEFAULT_RAY_STEP_MM, sampleRay, type RaySamples } from './rayTrace';
import { readDicomFile, sopClassName, type DicomFile } from './readPart10';
import { readRtPlan, type RtBeam, type RtPlanInfo } from './rtPlan';
import { SOP_CLASS } from './tags';
import { huAt } from './trilinear';
import { addScaled, distanceMm, formatVec, type Vec3 } from './vec3';

export interface DicomSource {
  name: string;
  read(): Promise<Uint8Array> | Uint8Array;
}

export interface ImportProgress {
  stage: 'reading' | 'tracing';
  done: number;
  total: number;
}

export interface SeriesSummary {
  seriesInstanceUid: string;
  slices: number;
  rows: number;
  columns: number;
  /** Voxel spacing along columns, rows and slices (mm). */
  spacingMm: readonly [number, number, number];
  patientPosition: string | null;
}

export interface ImportedBeam extends RtBeam {
  /** Beam id in the Lamina plan. */
  id: string;
  energy: BeamEnergy | null;
  field: JawField | null;
  /** Source position and unit direction source → isocentre (patient coordinates, mm). */
  sourceMm: Vec3 | null;
  directionPatient: Vec3 | null;
  ray: RaySamples | null;
}

export interface DicomImport {
  planLabel: string;
  fractionsPlanned: number | null;
  series: SeriesSummary;
  beams: ImportedBeam[];
  /** Files not used and beams skipped, with the reason. */
  ignored: string[];
  notes: string[];
}

export type DicomImportResult =
  { ok: true; value: DicomImport } | { ok: false; problems: string[] };

/** Isocentres closer than this are the same (mm). */
const SAME_ISOCENTRE_MM = 0.5;

function chooseSeries(
  slices: CtSlice[],
  plan: RtPlanInfo,
): { ok: true; slices: CtSlice[] } | { ok: false; message: string } {
  const bySeries = new Map<string, CtSlice[]>();
  for (const s of slices)
    bySeries.set(s.seriesInstanceUid, [...(bySeries.get(s.seriesInstanceUid) ?? []), s]);
  let candidates = [...bySeries.values()];
  if (candidates.length > 1 && plan.frameOfReferenceUid)
    candidates = candidates.filter((c) => c[0]?.frameOfReferenceUid === plan.frameOfReferenceUid);
  if (candidates.length === 1) return { ok: true, slices: candidates[0] as CtSlice[] };
  const list = [...bySeries.entries()].map(([uid, s]) => `${uid} (${s.length} slices)`).join(', ');
  return {
    ok: false,
    message:
      candidates.length === 0
        ? `no CT series shares the plan's Frame of Reference UID (series: ${list})`
        : `several CT series (${list}): drop only the planning CT`,
  };
}

function traceBeam(b: RtBeam, volume: CtVolume, ctPosition: string | null): ImportedBeam {
  const base: ImportedBeam = {
    ...b,
    id: `beam-${b.number}`,
    energy: null,
    field: null,
    sourceMm: null,
    directionPatient: null,
    ray: null,
  };
  const refuse = (why: string): ImportedBeam => ({ ...base, refusal: why });
  if (b.refusal) return base;
  const energy = beamEnergyFor(b.nominalEnergyMV, b.fluenceModeId);
  if (!energy.ok) return refuse(energy.message);
  const field = jawField(b.jawXMm as [number, number], b.jawYMm as [number, number], b.sadMm);
  if (!field.ok) return refuse(field.message);
  const notes = [...b.notes];
  if (field.value.asymmetric)
    notes.push(
      `asymmetric jaws (X ${b.jawXMm?.join(' / ')} mm, Y ${b.jawYMm?.join(' / ')} mm): taken as a symmetric ${field.value.xAtIsoCm.toFixed(1)} × ${field.value.yAtIsoCm.toFixed(1)} cm field; off-axis factors are not modelled`,
    );
  if (ctPosition !== null && b.patientPosition !== ctPosition)
    return refuse(
      `the plan's patient position ${b.patientPosition} differs from the CT's ${ctPosition}`,
    );
  const iso = b.isoMm as Vec3;
  if (Number.isNaN(huAt(volume, iso)))
    return refuse(`isocentre ${formatVec(iso)} mm lies outside the CT volume`);
  const toSource = sourceDirectionPatient(b.gantryDeg, b.couchDeg, b.patientPosition!);
  const sourceMm = addScaled(iso, toSource, b.sadMm);
  const dir: Vec3 = [-toSource[0], -toSource[1], -toSource[2]];
  const ray = sampleRay(volume, sourceMm, dir, DEFAULT_RAY_STEP_MM);
  if (!ray) return refuse('the central ray misses the CT volume');
  return {
    ...base,
    notes,
    energy: energy.energy,
    field: field.value,
    sourceMm,
    directionPatient: dir,
    ray,
  };
}

/** One isocentre per check: beams whose isocentre differs from the first usable beam's are refused. */
function refuseOtherIsocentres(beams: ImportedBeam[]): void {
  const first = beams.find((b) => !b.refusal && b.isoMm);
  if (!first?.isoMm) return;
  for (const b of beams)
    if (!b.refusal && b.isoMm && distanceMm(b.isoMm, first.isoMm) > SAME_ISOCENTRE_MM)
      b.refusal = `isocentre ${formatVec(b.isoMm)} mm differs from ${first.name}'s ${formatVec(first.isoMm)} mm: Lamina checks the beams of one isocentre at a time`;
}

export async function importDicom(
  sources: readonly DicomSource[],
  onProgress?: (p: ImportProgress) => void,
): Promise<DicomImportResult> {
  const problems: string[] = [];
  const ignored: string[] = [];
  const slices: CtSlice[] = [];
  const plans: { name: string; plan: RtPlanInfo }[] = [];
  for (let i = 0; i < sources.length; i++) {
    const src = sources[i] as DicomSource;
    const read = readDicomFile(src.name, await src.read());
    onProgress?.({ stage: 'reading', done: i + 1, total: sources.length });
    if (!read.ok) {
      if (read.message.startsWith('not a DICOM') || read.message.startsWith('too short'))
        ignored.push(`${src.name}: ${read.message}`);
      else problems.push(`${src.name}: ${read.message}`);
      continue;
    }
    const f: DicomFile = read.file;
    if (f.sopClassUid === SOP_CLASS.ctImage) {
      const s = readCtSlice(f);
      if (s.ok) slices.push(s.slice);
      else problems.push(`${src.name}: ${s.message}`);
    } else if (f.sopClassUid === SOP_CLASS.rtPlan) {
      const p = readRtPlan(f);
      if (p.ok) plans.push({ name: src.name, plan: p.plan });
      else problems.push(`${src.name}: ${p.message}`);
    } else if (f.sopClassUid === SOP_CLASS.enhancedCtImage || f.sopClassUid === SOP_CLASS.rtIonPlan)
      problems.push(
        `${src.name}: ${sopClassName(f.sopClassUid)} is not read by Lamina (CT Image and RT Plan only)`,
      );
    else ignored.push(`${src.name}: ${sopClassName(f.sopClassUid)} (${f.sopClassUid}), not used`);
  }
  if (plans.length > 1)
    problems.push(`several RT Plans (${plans.map((p) => p.name).join(', ')}): drop one`);
  if (plans.length === 0 && problems.length === 0) problems.push('no RT Plan among the files');
  if (slices.length === 0 && problems.length === 0) problems.push('no CT Image among the files');
  if (problems.length > 0) return { ok: false, problems };
  const plan = (plans[0] as { plan: RtPlanInfo }).plan;
  const chosen = chooseSeries(slices, plan);
  if (!chosen.ok) return { ok: false, problems: [chosen.message] };
  const vol = assembleCtVolume(chosen.slices);
  if (!vol.ok) return { ok: false, problems: [`CT series: ${vol.message}`] };
  const volume = vol.volume;
  if (
    plan.frameOfReferenceUid &&
    volume.frameOfReferenceUid &&
    plan.frameOfReferenceUid !== volume.frameOfReferenceUid
  )
    return {
      ok: false,
      problems: [
        "the RT Plan's Frame of Reference UID (0020,0052) differs from the CT's: the plan was not made on this CT",
      ],
    };
  const beams: ImportedBeam[] = [];
  plan.beams.forEach((b, i) => {
    beams.push(traceBeam(b, volume, volume.patientPosition));
    onProgress?.({ stage: 'tracing', done: i + 1, total: plan.beams.length });
  });
  refuseOtherIsocentres(beams);
  for (const b of beams) if (b.refusal) b.ray = null;
  ignored.push(...plan.skipped);
  return {
    ok: true,
    value: {
      planLabel: plan.label,
      fractionsPlanned: plan.fractionsPlanned,
      series: {
        seriesInstanceUid: volume.seriesInstanceUid,
        slices: volume.slices,
        rows: volume.rows,
        columns: volume.columns,
        spacingMm: volume.spacingMm,
        patientPosition: volume.patientPosition,
      },
      beams,
      ignored,
      notes: [...plan.notes, ...vol.notes],
    },
  };
}
