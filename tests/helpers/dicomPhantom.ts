// Synthetic CT series and RT Plans for tests, written as real DICOM Part 10 files by
// dicomWriter.ts: any HU function of position (phantomShapes.ts: slab stacks along a beam, boxes)
// on an axial grid, and plans with the beam parameters set explicitly. Attribute choices follow the CT Image IOD (PS3.3 A.3) and
// the RT Plan IOD (PS3.3 A.20); UIDs use the 2.25 (UUID-derived) root (PS3.5 B.2).
import { ds, is, seq, str, us, ow, writePart10, type DicomItem, type Syntax } from './dicomWriter';

export type Vec3 = readonly [number, number, number];
export type PatientPosition = 'HFS' | 'HFP' | 'FFS' | 'FFP';
export interface NamedBytes {
  name: string;
  bytes: Uint8Array;
}

const CT_IMAGE = '1.2.840.10008.5.1.4.1.1.2';
const RT_PLAN = '1.2.840.10008.5.1.4.1.1.481.5';
export const FRAME_OF_REFERENCE = '2.25.11111111111111111111111111111111111';
export const SERIES_UID = '2.25.22222222222222222222222222222222222';
const STUDY_UID = '2.25.33333333333333333333333333333333333';

export const cross = (a: Vec3, b: Vec3): Vec3 => [
  a[1] * b[2] - a[2] * b[1],
  a[2] * b[0] - a[0] * b[2],
  a[0] * b[1] - a[1] * b[0],
];
const add = (a: Vec3, b: Vec3, s = 1): Vec3 => [a[0] + s * b[0], a[1] + s * b[1], a[2] + s * b[2]];

export interface CtGrid {
  /** Centre of voxel (row 0, column 0) of slice 0 (mm, patient LPS). */
  originMm: Vec3;
  rowCos: Vec3;
  colCos: Vec3;
  columns: number;
  rows: number;
  slices: number;
  /** PixelSpacing (0028,0030): [between rows, between columns] (mm). */
  pixelSpacingMm: [number, number];
  sliceSpacingMm: number;
}

/**
 * An axial grid covering the box [minMm, maxMm] with the given orientation (row and column
 * direction cosines along ± patient axes) and spacings.
 */
export function gridCovering(
  minMm: Vec3,
  maxMm: Vec3,
  spacing: { rowMm: number; colMm: number; sliceMm: number },
  rowCos: Vec3 = [1, 0, 0],
  colCos: Vec3 = [0, 1, 0],
): CtGrid {
  const normal = cross(rowCos, colCos);
  const axis = (v: Vec3) => v.findIndex((c) => Math.abs(c) > 0.5);
  const origin: [number, number, number] = [0, 0, 0];
  const count = (v: Vec3, step: number) => {
    const k = axis(v);
    origin[k] = (v[k] as number) > 0 ? (minMm[k] as number) : (maxMm[k] as number);
    return Math.ceil(((maxMm[k] as number) - (minMm[k] as number)) / step) + 1;
  };
  const columns = count(rowCos, spacing.colMm);
  const rows = count(colCos, spacing.rowMm);
  const slices = count(normal, spacing.sliceMm);
  return {
    originMm: origin,
    rowCos,
    colCos,
    columns,
    rows,
    slices,
    pixelSpacingMm: [spacing.rowMm, spacing.colMm],
    sliceSpacingMm: spacing.sliceMm,
  };
}

export interface CtSeriesSpec {
  grid: CtGrid;
  huAt: (pMm: Vec3) => number;
  patientPosition: PatientPosition;
  syntax?: Syntax;
  /** Signed pixels with intercept 0; else unsigned with intercept −1024 (both slope 1). */
  signedPixels?: boolean;
  /** Rescale slope other than 1 (values rounded accordingly). */
  rescaleSlope?: number;
  frameOfReferenceUid?: string;
  seriesInstanceUid?: string;
  /** Write the files in a scrambled order (the reader must sort by position). */
  shuffle?: boolean;
  /** Leave out this slice index (a gap in the series). */
  omitSlice?: number;
  /** Override the orientation written in slice k (a sheared or tilted series). */
  orientationOf?: (k: number) => readonly number[];
  /** Shift the in-plane origin of slice k (gantry-tilt shear). */
  originShiftMm?: (k: number) => Vec3;
}

/** One CT Image file per slice, values HU = huAt(voxel centre). */
export function writeCtSeries(spec: CtSeriesSpec): NamedBytes[] {
  const g = spec.grid;
  const normal = cross(g.rowCos, g.colCos);
  const slope = spec.rescaleSlope ?? 1;
  const intercept = spec.signedPixels ? 0 : -1024;
  const files: NamedBytes[] = [];
  for (let k = 0; k < g.slices; k++) {
    if (k === spec.omitSlice) continue;
    const sliceOrigin = add(
      add(g.originMm, normal, k * g.sliceSpacingMm),
      spec.originShiftMm?.(k) ?? [0, 0, 0],
    );
    const pixels = new Uint8Array(g.rows * g.columns * 2);
    const dv = new DataView(pixels.buffer);
    for (let j = 0; j < g.rows; j++)
      for (let i = 0; i < g.columns; i++) {
        const p = add(
          add(sliceOrigin, g.rowCos, i * g.pixelSpacingMm[1]),
          g.colCos,
          j * g.pixelSpacingMm[0],
        );
        const stored = Math.round((spec.huAt(p) - intercept) / slope);
        const off = (j * g.columns + i) * 2;
        if (spec.signedPixels) dv.setInt16(off, Math.max(-32768, Math.min(32767, stored)), true);
        else dv.setUint16(off, Math.max(0, Math.min(65535, stored)), true);
      }
    const uid = `2.25.4${String(k).padStart(6, '0')}${String(g.rows).padStart(4, '0')}`;
    const orientation = spec.orientationOf?.(k) ?? [...g.rowCos, ...g.colCos];
    const elements = [
      str(0x00080060, 'CS', 'CT'),
      str(0x00100010, 'PN', 'Phantom^Slab'),
      str(0x00100020, 'LO', 'PHANTOM-1'),
      ds(0x00180050, g.sliceSpacingMm),
      str(0x00185100, 'CS', spec.patientPosition),
      str(0x0020000d, 'UI', STUDY_UID),
      str(0x0020000e, 'UI', spec.seriesInstanceUid ?? SERIES_UID),
      is(0x00200013, k + 1),
      ds(0x00200032, ...sliceOrigin),
      ds(0x00200037, ...orientation),
      str(0x00200052, 'UI', spec.frameOfReferenceUid ?? FRAME_OF_REFERENCE),
      us(0x00280002, 1),
      str(0x00280004, 'CS', 'MONOCHROME2'),
      us(0x00280010, g.rows),
      us(0x00280011, g.columns),
      ds(0x00280030, ...g.pixelSpacingMm),
      us(0x00280100, 16),
      us(0x00280101, 16),
      us(0x00280102, 15),
      us(0x00280103, spec.signedPixels ? 1 : 0),
      ds(0x00281052, intercept),
      ds(0x00281053, slope),
      ow(0x7fe00010, pixels),
    ];
    files.push({
      name: `CT.${String(k + 1).padStart(4, '0')}.dcm`,
      bytes: writePart10(elements, {
        syntax: spec.syntax ?? 'explicit',
        sopClassUid: CT_IMAGE,
        sopInstanceUid: uid,
      }),
    });
  }
  if (spec.shuffle) {
    // A fixed interleave (odd slices first, then even in reverse): deterministic, not sorted.
    const odd = files.filter((_, i) => i % 2 === 1);
    const even = files.filter((_, i) => i % 2 === 0).reverse();
    return [...odd, ...even];
  }
  return files;
}

export interface PlanBeamSpec {
  number: number;
  name: string;
  energyMV: number;
  gantryDeg: number;
  couchDeg?: number;
  collimatorDeg?: number;
  isoMm: Vec3;
  sadMm?: number;
  /** Jaw positions at the isocentre plane (mm), [X1, X2] and [Y1, Y2]. */
  jawXMm?: [number, number];
  jawYMm?: [number, number];
  meterset?: number;
  doseGy?: number;
  ssdMm?: number;
  radiationType?: string;
  deliveryType?: string;
  wedges?: number;
  fluenceModeId?: string;
  mlc?: boolean;
  /** Gantry angle at the last control point (an arc when it differs). */
  finalGantryDeg?: number;
  gantryPitchDeg?: number;
}

export interface PlanSpec {
  label: string;
  patientPosition: PatientPosition;
  beams: PlanBeamSpec[];
  frameOfReferenceUid?: string;
  syntax?: Syntax;
  undefinedLengthSequences?: boolean;
  geometry?: 'PATIENT' | 'TREATMENT_DEVICE';
}

function controlPoints(b: PlanBeamSpec): DicomItem[] {
  const jaws: DicomItem[] = [
    [str(0x300a00b8, 'CS', 'ASYMX'), ds(0x300a011c, ...(b.jawXMm ?? [-50, 50]))],
    [str(0x300a00b8, 'CS', 'ASYMY'), ds(0x300a011c, ...(b.jawYMm ?? [-50, 50]))],
  ];
  if (b.mlc)
    jaws.push([
      str(0x300a00b8, 'CS', 'MLCX'),
      ds(
        0x300a011c,
        ...Array.from({ length: 4 }, () => -30),
        ...Array.from({ length: 4 }, () => 30),
      ),
    ]);
  const first: DicomItem = [
    is(0x300a0112, 0),
    ds(0x300a0114, b.energyMV),
    seq(0x300a011a, jaws),
    ds(0x300a011e, b.gantryDeg),
    str(0x300a011f, 'CS', b.finalGantryDeg !== undefined ? 'CW' : 'NONE'),
    ds(0x300a0120, b.collimatorDeg ?? 0),
    str(0x300a0121, 'CS', 'NONE'),
    ds(0x300a0122, b.couchDeg ?? 0),
    str(0x300a0123, 'CS', 'NONE'),
    ds(0x300a0125, 0),
    str(0x300a0126, 'CS', 'NONE'),
    ds(0x300a012c, ...b.isoMm),
    ...(b.ssdMm !== undefined ? [ds(0x300a0130, b.ssdMm)] : []),
    ds(0x300a0134, 0),
    ...(b.gantryPitchDeg !== undefined
      ? [{ tag: 0x300a014a, vr: 'FL' as const, value: [b.gantryPitchDeg] }]
      : []),
  ];
  const last: DicomItem = [
    is(0x300a0112, 1),
    ...(b.finalGantryDeg !== undefined ? [ds(0x300a011e, b.finalGantryDeg)] : []),
    ds(0x300a0134, 1),
  ];
  return [first, last];
}

/** One RT Plan file with the given beams, all in fraction group 1. */
export function writeRtPlan(spec: PlanSpec): NamedBytes {
  const beams: DicomItem[] = spec.beams.map((b) => [
    ...(b.fluenceModeId
      ? [
          seq(0x30020050, [
            [str(0x30020051, 'CS', 'NON_STANDARD'), str(0x30020052, 'SH', b.fluenceModeId)],
          ]),
        ]
      : []),
    str(0x300a00b2, 'SH', 'TESTLINAC'),
    str(0x300a00b3, 'CS', 'MU'),
    ds(0x300a00b4, b.sadMm ?? 1000),
    seq(0x300a00b6, [
      [str(0x300a00b8, 'CS', 'ASYMX'), is(0x300a00bc, 1)],
      [str(0x300a00b8, 'CS', 'ASYMY'), is(0x300a00bc, 1)],
      ...(b.mlc ? [[str(0x300a00b8, 'CS', 'MLCX'), is(0x300a00bc, 4)]] : []),
    ]),
    is(0x300a00c0, b.number),
    str(0x300a00c2, 'LO', b.name),
    str(0x300a00c4, 'CS', b.finalGantryDeg !== undefined ? 'DYNAMIC' : 'STATIC'),
    str(0x300a00c6, 'CS', b.radiationType ?? 'PHOTON'),
    str(0x300a00ce, 'CS', b.deliveryType ?? 'TREATMENT'),
    is(0x300a00d0, b.wedges ?? 0),
    is(0x300a00e0, 0),
    is(0x300a00ed, 0),
    is(0x300a00f0, 0),
    ds(0x300a010e, 1),
    is(0x300a0110, 2),
    seq(0x300a0111, controlPoints(b)),
    is(0x300c006a, 1),
  ]);
  const refBeams: DicomItem[] = spec.beams.map((b) => [
    ...(b.doseGy !== undefined ? [ds(0x300a0084, b.doseGy)] : []),
    ...(b.meterset !== undefined ? [ds(0x300a0086, b.meterset)] : []),
    is(0x300c0006, b.number),
  ]);
  const elements = [
    str(0x00080060, 'CS', 'RTPLAN'),
    str(0x00100010, 'PN', 'Phantom^Slab'),
    str(0x00100020, 'LO', 'PHANTOM-1'),
    str(0x0020000d, 'UI', STUDY_UID),
    str(0x0020000e, 'UI', '2.25.55555555555555555555555555555'),
    str(0x00200052, 'UI', spec.frameOfReferenceUid ?? FRAME_OF_REFERENCE),
    str(0x300a0002, 'SH', spec.label),
    str(0x300a000c, 'CS', spec.geometry ?? 'PATIENT'),
    seq(0x300a0070, [
      [
        is(0x300a0071, 1),
        is(0x300a0078, 25),
        is(0x300a0080, spec.beams.length),
        is(0x300a00a0, 0),
        seq(0x300c0004, refBeams),
      ],
    ]),
    seq(0x300a00b0, beams),
    seq(0x300a0180, [[str(0x00185100, 'CS', spec.patientPosition), is(0x300a0182, 1)]]),
  ];
  return {
    name: 'RP.plan.dcm',
    bytes: writePart10(elements, {
      syntax: spec.syntax ?? 'explicit',
      undefinedLengthSequences: spec.undefinedLengthSequences ?? false,
      sopClassUid: RT_PLAN,
      sopInstanceUid: '2.25.66666666666666666666666666666',
    }),
  };
}
