// A small DICOM Part 10 writer for test fixtures: 128-byte preamble, "DICM", the file meta group
// in Explicit VR Little Endian (PS3.10 section 7.1), then the data set in Implicit or Explicit VR
// Little Endian (PS3.5 sections 7.1.2–7.1.3, 7.5 for sequences), values padded to even length
// (PS3.5 6.2: text with a space, UI with NUL, OB with 0).
export type Vr =
  | 'AE'
  | 'AS'
  | 'CS'
  | 'DA'
  | 'DS'
  | 'IS'
  | 'LO'
  | 'LT'
  | 'PN'
  | 'SH'
  | 'ST'
  | 'TM'
  | 'UI'
  | 'UT'
  | 'US'
  | 'SS'
  | 'UL'
  | 'SL'
  | 'FL'
  | 'FD'
  | 'OB'
  | 'OW'
  | 'SQ';

export type DicomItem = readonly DicomElement[];
export interface DicomElement {
  tag: number;
  vr: Vr;
  value: string | readonly number[] | Uint8Array | readonly DicomItem[];
}

export type Syntax = 'implicit' | 'explicit';
export const TS_UID: Record<Syntax, string> = {
  implicit: '1.2.840.10008.1.2',
  explicit: '1.2.840.10008.1.2.1',
};

/** VRs with a 2-byte reserved field and a 4-byte length in Explicit VR (PS3.5 Table 7.1-1). */
const LONG_VRS = new Set<Vr>(['OB', 'OW', 'SQ', 'UT']);

export const str = (tag: number, vr: Vr, value: string): DicomElement => ({ tag, vr, value });
/** Decimal String with values joined by backslash (PS3.5 6.2: at most 16 bytes each). */
export const ds = (tag: number, ...values: number[]): DicomElement => ({
  tag,
  vr: 'DS',
  value: values.map(formatDs).join('\\'),
});
export const is = (tag: number, value: number): DicomElement => ({
  tag,
  vr: 'IS',
  value: `${Math.round(value)}`,
});
export const us = (tag: number, ...values: number[]): DicomElement => ({
  tag,
  vr: 'US',
  value: values,
});
export const seq = (tag: number, items: readonly DicomItem[]): DicomElement => ({
  tag,
  vr: 'SQ',
  value: items,
});
export const ow = (tag: number, bytes: Uint8Array): DicomElement => ({
  tag,
  vr: 'OW',
  value: bytes,
});

function formatDs(v: number): string {
  for (let digits = 10; digits >= 1; digits--) {
    const s = Number(v.toPrecision(digits)).toString();
    if (s.length <= 16) return s;
  }
  return v.toExponential(6);
}

class ByteSink {
  private chunks: Uint8Array[] = [];
  length = 0;
  push(b: Uint8Array) {
    this.chunks.push(b);
    this.length += b.length;
  }
  u16(v: number) {
    const b = new Uint8Array(2);
    new DataView(b.buffer).setUint16(0, v, true);
    this.push(b);
  }
  u32(v: number) {
    const b = new Uint8Array(4);
    new DataView(b.buffer).setUint32(0, v >>> 0, true);
    this.push(b);
  }
  ascii(s: string) {
    this.push(new Uint8Array([...s].map((c) => c.charCodeAt(0))));
  }
  bytes(): Uint8Array {
    const out = new Uint8Array(this.length);
    let o = 0;
    for (const c of this.chunks) {
      out.set(c, o);
      o += c.length;
    }
    return out;
  }
}

export interface EncodeOptions {
  syntax: Syntax;
  /** Sequences and items with undefined length and delimiters (PS3.5 7.5.1), else defined lengths. */
  undefinedLengthSequences?: boolean;
}

function valueBytes(e: DicomElement, o: EncodeOptions): Uint8Array {
  const v = e.value;
  let raw: Uint8Array;
  if (e.vr === 'SQ') {
    const sink = new ByteSink();
    for (const item of v as readonly DicomItem[]) {
      const body = encodeDataSet(item, o);
      sink.u16(0xfffe);
      sink.u16(0xe000);
      if (o.undefinedLengthSequences) {
        sink.u32(0xffffffff);
        sink.push(body);
        sink.u16(0xfffe);
        sink.u16(0xe00d);
        sink.u32(0);
      } else {
        sink.u32(body.length);
        sink.push(body);
      }
    }
    return sink.bytes();
  }
  if (typeof v === 'string') {
    raw = new Uint8Array([...v].map((c) => c.charCodeAt(0)));
    if (raw.length % 2 === 1) {
      const padded = new Uint8Array(raw.length + 1);
      padded.set(raw);
      padded[raw.length] = e.vr === 'UI' ? 0 : 0x20;
      raw = padded;
    }
    return raw;
  }
  if (v instanceof Uint8Array) {
    if (v.length % 2 === 0) return v;
    const padded = new Uint8Array(v.length + 1);
    padded.set(v);
    return padded;
  }
  const nums = v as readonly number[];
  const size = { US: 2, SS: 2, UL: 4, SL: 4, FL: 4, FD: 8 }[e.vr as 'US'];
  if (!size) throw new Error(`numbers given for VR ${e.vr}`);
  raw = new Uint8Array(nums.length * size);
  const dv = new DataView(raw.buffer);
  nums.forEach((n, i) => {
    if (e.vr === 'US') dv.setUint16(i * 2, n, true);
    else if (e.vr === 'SS') dv.setInt16(i * 2, n, true);
    else if (e.vr === 'UL') dv.setUint32(i * 4, n, true);
    else if (e.vr === 'SL') dv.setInt32(i * 4, n, true);
    else if (e.vr === 'FL') dv.setFloat32(i * 4, n, true);
    else dv.setFloat64(i * 8, n, true);
  });
  return raw;
}

export function encodeDataSet(elements: readonly DicomElement[], o: EncodeOptions): Uint8Array {
  const sink = new ByteSink();
  for (const e of [...elements].sort((a, b) => a.tag - b.tag)) {
    const body = valueBytes(e, o);
    const undefinedSq = e.vr === 'SQ' && o.undefinedLengthSequences;
    sink.u16(e.tag >>> 16);
    sink.u16(e.tag & 0xffff);
    const length = undefinedSq ? 0xffffffff : body.length;
    if (o.syntax === 'explicit') {
      sink.ascii(e.vr);
      if (LONG_VRS.has(e.vr)) {
        sink.u16(0);
        sink.u32(length);
      } else {
        if (body.length > 0xffff) throw new Error(`value too long for VR ${e.vr}`);
        sink.u16(length);
      }
    } else sink.u32(length);
    sink.push(body);
    if (undefinedSq) {
      sink.u16(0xfffe);
      sink.u16(0xe0dd);
      sink.u32(0);
    }
  }
  return sink.bytes();
}

export interface Part10Options extends EncodeOptions {
  sopClassUid: string;
  sopInstanceUid: string;
  /** Transfer syntax UID written in the meta group (defaults to the one the data set is encoded in). */
  transferSyntaxUid?: string;
}

/** A whole Part 10 file: preamble, "DICM", file meta group (PS3.10 7.1), data set. */
export function writePart10(elements: readonly DicomElement[], o: Part10Options): Uint8Array {
  const metaBody = encodeDataSet(
    [
      { tag: 0x00020001, vr: 'OB', value: new Uint8Array([0, 1]) },
      str(0x00020002, 'UI', o.sopClassUid),
      str(0x00020003, 'UI', o.sopInstanceUid),
      str(0x00020010, 'UI', o.transferSyntaxUid ?? TS_UID[o.syntax]),
      str(0x00020012, 'UI', '2.25.274951823019837465201938475610293847561'),
      str(0x00020013, 'SH', 'LAMINA_TEST'),
    ],
    { syntax: 'explicit' },
  );
  const groupLength = encodeDataSet([{ tag: 0x00020000, vr: 'UL', value: [metaBody.length] }], {
    syntax: 'explicit',
  });
  const data = encodeDataSet(
    [
      str(0x00080016, 'UI', o.sopClassUid),
      str(0x00080018, 'UI', o.sopInstanceUid),
      ...elements.filter((e) => e.tag !== 0x00080016 && e.tag !== 0x00080018),
    ],
    o,
  );
  const out = new Uint8Array(128 + 4 + groupLength.length + metaBody.length + data.length);
  out.set([0x44, 0x49, 0x43, 0x4d], 128);
  out.set(groupLength, 132);
  out.set(metaBody, 132 + groupLength.length);
  out.set(data, 132 + groupLength.length + metaBody.length);
  return out;
}
