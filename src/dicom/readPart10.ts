// One DICOM Part 10 file to a parsed data set, or a message saying why not. The file layout (a
// 128-byte preamble, "DICM", the file meta group in Explicit VR Little Endian) is DICOM PS3.10
// section 7.1; the element encodings are PS3.5 section 7. Parsing is dicom-parser's.
import { parseDicom, readPart10Header, type DataSet } from './dicomParserModule';
import { SOP_CLASS_NAMES, TAG } from './tags';
import { isSupportedTransferSyntax, unsupportedTransferSyntaxMessage } from './transferSyntax';

export interface DicomFile {
  name: string;
  dataSet: DataSet;
  sopClassUid: string;
  transferSyntaxUid: string;
}

export type DicomFileResult =
  { ok: true; file: DicomFile } | { ok: false; name: string; message: string };

const PREAMBLE_BYTES = 128;
const UNDEFINED_LENGTH = 0xffffffff;

/** dicom-parser throws strings, Errors or { exception, dataSet }: one readable line. */
function reasonOf(e: unknown): string {
  if (typeof e === 'string') return e;
  if (e instanceof Error) return e.message;
  if (typeof e === 'object' && e !== null && 'exception' in e) return reasonOf(e.exception);
  return String(e);
}

export function tagLabel(key: string): string {
  return `(${key.slice(1, 5).toUpperCase()},${key.slice(5, 9).toUpperCase()})`;
}

/** The first top-level element whose value runs past the end of the file, if any. */
function overrun(ds: DataSet, size: number): string | null {
  for (const [key, el] of Object.entries(ds.elements)) {
    if (el.length === UNDEFINED_LENGTH || el.hadUndefinedLength) continue;
    if (el.dataOffset + el.length > size)
      return `element ${tagLabel(key)} needs ${el.length} bytes but the file ends ${Math.max(0, size - el.dataOffset)} bytes into it`;
  }
  return null;
}

export function sopClassName(uid: string): string {
  return SOP_CLASS_NAMES[uid] ?? 'an object Lamina does not read';
}

export function readDicomFile(name: string, bytes: Uint8Array): DicomFileResult {
  const fail = (message: string): DicomFileResult => ({ ok: false, name, message });
  if (bytes.length < PREAMBLE_BYTES + 4)
    return fail(
      `too short for a DICOM Part 10 file (${bytes.length} bytes; PS3.10 7.1: 128-byte preamble, then "DICM")`,
    );
  const prefix = String.fromCharCode(...bytes.subarray(PREAMBLE_BYTES, PREAMBLE_BYTES + 4));
  if (prefix !== 'DICM')
    return fail('not a DICOM Part 10 file: no "DICM" after the 128-byte preamble (PS3.10 7.1)');
  let meta: DataSet;
  try {
    meta = readPart10Header(bytes);
  } catch (e) {
    return fail(`file meta information cannot be read (truncated or damaged): ${reasonOf(e)}`);
  }
  const ts = meta.string(TAG.transferSyntaxUid);
  if (!ts) return fail('file meta information has no Transfer Syntax UID (0002,0010)');
  if (!isSupportedTransferSyntax(ts)) return fail(unsupportedTransferSyntaxMessage(ts));
  let ds: DataSet;
  try {
    ds = parseDicom(bytes);
  } catch (e) {
    return fail(`data set truncated or damaged: ${reasonOf(e)}`);
  }
  const cut = overrun(ds, bytes.length);
  if (cut) return fail(`file is truncated: ${cut}`);
  const sopClassUid = ds.string(TAG.sopClassUid) ?? meta.string(TAG.mediaStorageSopClassUid);
  if (!sopClassUid)
    return fail('no SOP Class UID (0008,0016) or (0002,0002): cannot tell what the file holds');
  return { ok: true, file: { name, dataSet: ds, sopClassUid, transferSyntaxUid: ts } };
}
