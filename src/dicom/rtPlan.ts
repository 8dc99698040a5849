// RT Plan (PS3.3 A.20) to the beams Lamina can follow: per beam the first control point's energy,
// gantry, collimator and couch angles, isocentre and jaws (RT Beams module, C.8.8.14), the
// patient position from the Patient Setup Sequence (C.8.8.12) and the meterset and dose from the
// first fraction group (RT Fraction Scheme, C.8.8.13). Anything Lamina cannot model — arcs and
// other dynamic beams, wedges, compensators, blocks, boli, non-photon beams, tilted couch tops —
// refuses that beam with the reason; setup beams are skipped.
import type { DataSet } from './dicomParserModule';
import { isPatientPosition, type PatientPosition } from './iecGeometry';
import type { DicomFile } from './readPart10';
import { TAG } from './tags';
import type { Vec3 } from './vec3';

export interface RtBeam {
  number: number;
  name: string;
  /** Why this beam cannot be checked; null when it can. */
  refusal: string | null;
  notes: string[];
  nominalEnergyMV: number | null;
  fluenceModeId: string | null;
  patientPosition: PatientPosition | null;
  sadMm: number;
  gantryDeg: number;
  couchDeg: number;
  collimatorDeg: number;
  isoMm: Vec3 | null;
  /** Jaw positions at the isocentre plane (mm): [X1, X2], [Y1, Y2]. */
  jawXMm: readonly [number, number] | null;
  jawYMm: readonly [number, number] | null;
  hasMlc: boolean;
  /** The planning system's SSD (300A,0130), when given (mm). */
  plannedSsdMm: number | null;
  /** Beam Meterset from the fraction group (MU per fraction). */
  meterset: number | null;
  /** Beam Dose from the fraction group (Gy per fraction at the dose specification point). */
  doseGy: number | null;
  doseSpecificationPointMm: Vec3 | null;
}

export interface RtPlanInfo {
  label: string;
  frameOfReferenceUid: string | null;
  fractionsPlanned: number | null;
  beams: RtBeam[];
  /** Beams not meant for treatment (setup beams), skipped. */
  skipped: string[];
  notes: string[];
}

export type RtPlanResult = { ok: true; plan: RtPlanInfo } | { ok: false; message: string };

const items = (ds: DataSet, tag: string): DataSet[] =>
  (ds.elements[tag]?.items ?? [])
    .map((i) => i.dataSet)
    .filter((d): d is DataSet => d !== undefined);

function vec(ds: DataSet, tag: string): Vec3 | null {
  if ((ds.numStringValues(tag) ?? 0) < 3) return null;
  const v = [0, 1, 2].map((i) => ds.floatString(tag, i));
  return v.every((x) => x !== undefined && Number.isFinite(x)) ? (v as unknown as Vec3) : null;
}

function pair(ds: DataSet, tag: string): [number, number] | null {
  if ((ds.numStringValues(tag) ?? 0) !== 2) return null;
  const a = ds.floatString(tag, 0);
  const b = ds.floatString(tag, 1);
  return a !== undefined && b !== undefined && Number.isFinite(a) && Number.isFinite(b)
    ? [a, b]
    : null;
}

/** An angle from a DS or FL element; implicit VR files carry no VR, so the dictionary's VR (PS3.6) is given. */
function angle(ds: DataSet, tag: string, dictionaryVr: 'FL' | 'DS'): number | undefined {
  const el = ds.elements[tag];
  if (!el || el.length === 0) return undefined;
  return (el.vr ?? dictionaryVr) === 'FL' ? ds.float(tag) : ds.floatString(tag);
}

interface Jaws {
  x: [number, number] | null;
  y: [number, number] | null;
  mlc: string | null;
}

function jawsOf(cp: DataSet): Jaws {
  const out: Jaws = { x: null, y: null, mlc: null };
  for (const d of items(cp, TAG.beamLimitingDevicePositionSequence)) {
    const type = d.string(TAG.rtBeamLimitingDeviceType) ?? '';
    const p = pair(d, TAG.leafJawPositions);
    if (type === 'X' || type === 'ASYMX') out.x = p;
    else if (type === 'Y' || type === 'ASYMY') out.y = p;
    else if (type.startsWith('MLC')) out.mlc = d.string(TAG.leafJawPositions) ?? '';
  }
  return out;
}

/** An angle in [0, 360) degrees. */
const wrapDeg = (deg: number) => ((deg % 360) + 360) % 360;

/** The first reason a control point after the first changes what Lamina treats as static. */
function dynamicChange(first: DataSet, cp: DataSet, firstJaws: Jaws): string | null {
  const checks: [string, string][] = [
    [TAG.gantryAngle, 'gantry angle'],
    [TAG.patientSupportAngle, 'couch angle'],
    [TAG.beamLimitingDeviceAngle, 'collimator angle'],
    [TAG.nominalBeamEnergy, 'energy'],
  ];
  for (const [tag, what] of checks) {
    const v = cp.floatString(tag);
    const v0 = first.floatString(tag);
    if (v !== undefined && v0 !== undefined && Math.abs(wrapDeg(v) - wrapDeg(v0)) > 1e-3)
      return `${what} changes from ${v0} to ${v} between control points (an arc or dynamic beam)`;
  }
  const iso = vec(cp, TAG.isocenterPosition);
  const iso0 = vec(first, TAG.isocenterPosition);
  if (iso && iso0 && iso.some((c, i) => Math.abs(c - (iso0[i] as number)) > 1e-3))
    return 'the isocentre moves between control points';
  const j = jawsOf(cp);
  const moved = (a: [number, number] | null, b: [number, number] | null) =>
    a !== null && b !== null && (Math.abs(a[0] - b[0]) > 1e-3 || Math.abs(a[1] - b[1]) > 1e-3);
  if (moved(j.x, firstJaws.x) || moved(j.y, firstJaws.y)) return 'the jaws move during the beam';
  if (j.mlc !== null && firstJaws.mlc !== null && j.mlc !== firstJaws.mlc)
    return 'the MLC moves during the beam (IMRT or VMAT): not modelled';
  return null;
}

function readBeam(
  b: DataSet,
  positions: Map<number, string>,
  fraction: Map<number, { meterset: number | null; doseGy: number | null; spec: Vec3 | null }>,
): RtBeam {
  const number = b.intString(TAG.beamNumber) ?? NaN;
  const name = b.string(TAG.beamName) ?? `beam ${number}`;
  const refusals: string[] = [];
  const notes: string[] = [];
  const cps = items(b, TAG.controlPointSequence);
  const cp0 = cps[0];
  const radiation = b.string(TAG.radiationType) ?? '';
  if (radiation !== 'PHOTON')
    refusals.push(`Radiation Type ${radiation || '(none)'}: Lamina checks photon beams`);
  const unit = b.string(TAG.primaryDosimeterUnit);
  if (unit !== undefined && unit !== 'MU')
    refusals.push(`Primary Dosimeter Unit ${unit}: Lamina checks MU`);
  const modifiers: [string, string, string][] = [
    [TAG.numberOfWedges, 'wedge', 'wedge factors are not modelled'],
    [TAG.numberOfCompensators, 'compensator', 'compensators are not modelled'],
    [TAG.numberOfBlocks, 'block', 'block apertures are not modelled'],
    [TAG.numberOfBoli, 'bolus', 'bolus changes the surface and is not modelled'],
  ];
  for (const [tag, what, why] of modifiers) {
    const count = b.intString(tag) ?? 0;
    if (count > 0) refusals.push(`${count} ${what}${count > 1 ? 's' : ''}: ${why}`);
  }
  let fluenceModeId: string | null = null;
  for (const f of items(b, TAG.primaryFluenceModeSequence))
    if (f.string(TAG.fluenceMode) === 'NON_STANDARD')
      fluenceModeId = f.string(TAG.fluenceModeId) ?? 'NON_STANDARD';
  const setupNumber = b.intString(TAG.referencedPatientSetupNumber);
  const positionText =
    (setupNumber !== undefined ? positions.get(setupNumber) : undefined) ??
    (positions.size === 1 ? [...positions.values()][0] : undefined) ??
    null;
  const patientPosition = isPatientPosition(positionText) ? positionText : null;
  if (!patientPosition)
    refusals.push(
      positionText
        ? `patient position ${positionText}: Lamina handles HFS, HFP, FFS and FFP`
        : 'no Patient Position in the Patient Setup Sequence (300A,0180)',
    );
  const sadMm = b.floatString(TAG.sourceAxisDistance) ?? NaN;
  if (!(sadMm > 0)) refusals.push('no Source-Axis Distance (300A,00B4)');
  let gantryDeg = NaN;
  let couchDeg = 0;
  let collimatorDeg = 0;
  let isoMm: Vec3 | null = null;
  let jaws: Jaws = { x: null, y: null, mlc: null };
  let nominalEnergyMV: number | null = null;
  let plannedSsdMm: number | null = null;
  if (!cp0) refusals.push('no Control Point Sequence (300A,0111)');
  else {
    gantryDeg = cp0.floatString(TAG.gantryAngle) ?? NaN;
    if (!Number.isFinite(gantryDeg))
      refusals.push('no Gantry Angle (300A,011E) in the first control point');
    couchDeg = cp0.floatString(TAG.patientSupportAngle) ?? 0;
    collimatorDeg = cp0.floatString(TAG.beamLimitingDeviceAngle) ?? 0;
    isoMm = vec(cp0, TAG.isocenterPosition);
    if (!isoMm) refusals.push('no Isocenter Position (300A,012C) in the first control point');
    nominalEnergyMV = cp0.floatString(TAG.nominalBeamEnergy) ?? null;
    plannedSsdMm = cp0.floatString(TAG.sourceToSurfaceDistance) ?? null;
    jaws = jawsOf(cp0);
    const tilts: [string, string, 'FL' | 'DS'][] = [
      [TAG.gantryPitchAngle, 'gantry pitch', 'FL'],
      [TAG.tableTopEccentricAngle, 'table-top eccentric angle', 'DS'],
      [TAG.tableTopPitchAngle, 'table-top pitch', 'FL'],
      [TAG.tableTopRollAngle, 'table-top roll', 'FL'],
    ];
    for (const [tag, what, vr] of tilts) {
      const v = angle(cp0, tag, vr);
      if (
        v !== undefined &&
        Number.isFinite(v) &&
        Math.abs(((((v + 180) % 360) + 360) % 360) - 180) > 1e-3
      )
        refusals.push(`${what} ${v}°: not handled`);
    }
    for (const cp of cps.slice(1)) {
      const change = dynamicChange(cp0, cp, jaws);
      if (change) {
        refusals.push(change);
        break;
      }
    }
  }
  if (!jaws.x)
    refusals.push(
      'no X jaw positions (ASYMX or X) in the first control point: an MLC-only field is not handled',
    );
  if (!jaws.y) refusals.push('no Y jaw positions (ASYMY or Y) in the first control point');
  const hasMlc =
    jaws.mlc !== null ||
    items(b, TAG.beamLimitingDeviceSequence).some((d) =>
      (d.string(TAG.rtBeamLimitingDeviceType) ?? '').startsWith('MLC'),
    );
  if (hasMlc)
    notes.push(
      'MLC present: its aperture is not modelled, the field is the jaw rectangle (scatter overestimated for a shaped field)',
    );
  const fx = fraction.get(number);
  if (!fx) notes.push('the first fraction group does not list this beam: no planning MU or dose');
  return {
    number,
    name,
    refusal: refusals.length > 0 ? refusals.join('; ') : null,
    notes,
    nominalEnergyMV,
    fluenceModeId,
    patientPosition,
    sadMm,
    gantryDeg,
    couchDeg,
    collimatorDeg,
    isoMm,
    jawXMm: jaws.x,
    jawYMm: jaws.y,
    hasMlc,
    plannedSsdMm,
    meterset: fx?.meterset ?? null,
    doseGy: fx?.doseGy ?? null,
    doseSpecificationPointMm: fx?.spec ?? null,
  };
}

export function readRtPlan(file: DicomFile): RtPlanResult {
  const ds = file.dataSet;
  const geometry = ds.string(TAG.rtPlanGeometry);
  if (geometry === 'TREATMENT_DEVICE')
    return {
      ok: false,
      message: 'RT Plan Geometry (300A,000C) is TREATMENT_DEVICE: the plan is not placed on a CT',
    };
  const beamItems = items(ds, TAG.beamSequence);
  if (beamItems.length === 0)
    return { ok: false, message: 'the RT Plan has no Beam Sequence (300A,00B0)' };
  const positions = new Map<number, string>();
  for (const s of items(ds, TAG.patientSetupSequence)) {
    const n = s.intString(TAG.patientSetupNumber);
    const p = s.string(TAG.patientPosition);
    if (n !== undefined && p) positions.set(n, p);
  }
  const notes: string[] = [];
  const groups = items(ds, TAG.fractionGroupSequence);
  if (groups.length > 1)
    notes.push(`${groups.length} fraction groups: MU and dose are read from the first`);
  const fraction = new Map<
    number,
    { meterset: number | null; doseGy: number | null; spec: Vec3 | null }
  >();
  for (const r of groups[0] ? items(groups[0], TAG.referencedBeamSequence) : []) {
    const n = r.intString(TAG.referencedBeamNumber);
    if (n === undefined) continue;
    const meterset = r.floatString(TAG.beamMeterset);
    const dose = r.floatString(TAG.beamDose);
    fraction.set(n, {
      meterset: meterset !== undefined && meterset > 0 ? meterset : null,
      doseGy: dose !== undefined && dose > 0 ? dose : null,
      spec: vec(r, TAG.beamDoseSpecificationPoint),
    });
  }
  const beams: RtBeam[] = [];
  const skipped: string[] = [];
  for (const b of beamItems) {
    const delivery = b.string(TAG.treatmentDeliveryType) ?? 'TREATMENT';
    const name = b.string(TAG.beamName) ?? `beam ${b.intString(TAG.beamNumber) ?? '?'}`;
    if (delivery !== 'TREATMENT' && delivery !== 'CONTINUATION') {
      skipped.push(`${name}: Treatment Delivery Type ${delivery}, not a treatment beam`);
      continue;
    }
    beams.push(readBeam(b, positions, fraction));
  }
  const seen = new Set<number>();
  for (const b of beams) {
    if (!Number.isInteger(b.number)) b.refusal = b.refusal ?? 'no Beam Number (300A,00C0)';
    else if (seen.has(b.number)) b.refusal = b.refusal ?? `duplicate Beam Number ${b.number}`;
    seen.add(b.number);
  }
  return {
    ok: true,
    plan: {
      label: ds.string(TAG.rtPlanLabel) ?? ds.string(TAG.rtPlanName) ?? 'RT Plan',
      frameOfReferenceUid: ds.string(TAG.frameOfReferenceUid) ?? null,
      fractionsPlanned: groups[0]?.intString(TAG.numberOfFractionsPlanned) ?? null,
      beams,
      skipped,
      notes,
    },
  };
}
