// One CT Image (PS3.3 A.3) to its position, orientation, spacing and Hounsfield units. HU come
// from the stored values by the Rescale Slope and Intercept (PS3.3 C.11.1.1.2, C.8.2.1); the
// attributes read are those of the Image Plane (C.7.6.2) and Image Pixel (C.7.6.3) modules.
import type { DataSet } from './dicomParserModule';
import type { DicomFile } from './readPart10';
import { TAG } from './tags';
import type { Vec3 } from './vec3';

export interface CtSlice {
  name: string;
  seriesInstanceUid: string;
  frameOfReferenceUid: string | null;
  patientPosition: string | null;
  /** Image Position (Patient): centre of the first transmitted pixel (mm). */
  positionMm: Vec3;
  /** Direction of increasing column index (along a row). */
  rowCos: Vec3;
  /** Direction of increasing row index (down a column). */
  colCos: Vec3;
  rows: number;
  columns: number;
  /** Pixel Spacing: [between rows, between columns] (mm). */
  pixelSpacingMm: readonly [number, number];
  /** HU, row by row, rounded to integers. */
  hu: Int16Array;
}

export type CtSliceResult = { ok: true; slice: CtSlice } | { ok: false; message: string };

function numbers(ds: DataSet, tag: string, count: number): number[] | null {
  const n = ds.numStringValues(tag);
  if (n === undefined || n < count) return null;
  const out: number[] = [];
  for (let i = 0; i < count; i++) {
    const v = ds.floatString(tag, i);
    if (v === undefined || !Number.isFinite(v)) return null;
    out.push(v);
  }
  return out;
}

export function readCtSlice(file: DicomFile): CtSliceResult {
  const ds = file.dataSet;
  const fail = (message: string): CtSliceResult => ({ ok: false, message });
  const series = ds.string(TAG.seriesInstanceUid);
  if (!series) return fail('no Series Instance UID (0020,000E)');
  const frames = ds.intString(TAG.numberOfFrames);
  if (frames !== undefined && frames > 1)
    return fail(`multi-frame image (${frames} frames): Lamina reads one slice per file`);
  const samples = ds.uint16(TAG.samplesPerPixel) ?? 1;
  const photometric = ds.string(TAG.photometricInterpretation) ?? 'MONOCHROME2';
  if (samples !== 1 || photometric !== 'MONOCHROME2')
    return fail(
      `Samples per Pixel ${samples}, Photometric Interpretation ${photometric}: a CT slice must be MONOCHROME2 with one sample`,
    );
  const rows = ds.uint16(TAG.rows);
  const columns = ds.uint16(TAG.columns);
  if (!rows || !columns) return fail('no Rows (0028,0010) or Columns (0028,0011)');
  const bitsAllocated = ds.uint16(TAG.bitsAllocated);
  if (bitsAllocated !== 16)
    return fail(
      `Bits Allocated (0028,0100) is ${bitsAllocated ?? 'missing'}: Lamina reads 16-bit CT`,
    );
  const bitsStored = ds.uint16(TAG.bitsStored) ?? 16;
  if (bitsStored < 8 || bitsStored > 16)
    return fail(`Bits Stored (0028,0101) is ${bitsStored}: expected 8–16`);
  const signed = ds.uint16(TAG.pixelRepresentation) === 1;
  const position = numbers(ds, TAG.imagePositionPatient, 3);
  if (!position) return fail('no Image Position (Patient) (0020,0032) with 3 numbers');
  const orientation = numbers(ds, TAG.imageOrientationPatient, 6);
  if (!orientation) return fail('no Image Orientation (Patient) (0020,0037) with 6 numbers');
  const spacing = numbers(ds, TAG.pixelSpacing, 2);
  if (!spacing || !(spacing[0]! > 0) || !(spacing[1]! > 0))
    return fail('no Pixel Spacing (0028,0030) with 2 positive numbers');
  const slope = ds.floatString(TAG.rescaleSlope) ?? 1;
  const intercept = ds.floatString(TAG.rescaleIntercept) ?? 0;
  if (!Number.isFinite(slope) || slope === 0 || !Number.isFinite(intercept))
    return fail('Rescale Slope (0028,1053) or Intercept (0028,1052) is not a usable number');
  const pixel = ds.elements[TAG.pixelData];
  if (!pixel) return fail('no Pixel Data (7FE0,0010)');
  if (pixel.encapsulatedPixelData) return fail('encapsulated (compressed) Pixel Data');
  const needed = rows * columns * 2;
  if (pixel.length < needed)
    return fail(
      `Pixel Data holds ${pixel.length} bytes, ${rows} × ${columns} 16-bit pixels need ${needed}`,
    );
  const view = new DataView(
    ds.byteArray.buffer,
    ds.byteArray.byteOffset + pixel.dataOffset,
    needed,
  );
  const hu = new Int16Array(rows * columns);
  const shift = 16 - bitsStored;
  for (let p = 0; p < hu.length; p++) {
    const raw = view.getUint16(2 * p, true);
    // Keep the stored bits only (PS3.5 8.1.1); sign-extend a signed value from its high bit.
    const stored = signed ? (raw << (16 + shift)) >> (16 + shift) : raw & (0xffff >>> shift);
    const v = Math.round(stored * slope + intercept);
    hu[p] = v < -32768 ? -32768 : v > 32767 ? 32767 : v;
  }
  return {
    ok: true,
    slice: {
      name: file.name,
      seriesInstanceUid: series,
      frameOfReferenceUid: ds.string(TAG.frameOfReferenceUid) ?? null,
      patientPosition: ds.string(TAG.patientPosition) ?? null,
      positionMm: position as unknown as Vec3,
      rowCos: orientation.slice(0, 3) as unknown as Vec3,
      colCos: orientation.slice(3, 6) as unknown as Vec3,
      rows,
      columns,
      pixelSpacingMm: [spacing[0]!, spacing[1]!],
      hu,
    },
  };
}
