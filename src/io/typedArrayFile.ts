// The binary form of the generated data (src/engine/data/generated/*.bin): a JSON document whose
// typed arrays are stored after it as little-endian binary. Written by the generators, read by the
// same code in the page's workers and in Node. Layout:
//   bytes 0–3   ASCII "LMNA"
//   bytes 4–7   header length H in bytes (uint32, little-endian)
//   bytes 8…    header: UTF-8 JSON, padded with spaces so that the data start (8 + H) is a multiple of 8
//   data        the arrays, each at an offset (from the data start) that is a multiple of 8
// Header: { "format": "lamina.typedArrays", "version": 1,
//           "arrays": [{ "type": "float32" | "float64", "offset": bytes, "length": elements }, …],
//           "document": the document, each typed array replaced by { "$typedArray": index } }.
// Plain number arrays stay in the JSON header (exact decimal values, e.g. grids).

export const TYPED_ARRAY_FILE_FORMAT = 'lamina.typedArrays';
export const TYPED_ARRAY_FILE_VERSION = 1;
const MAGIC = 'LMNA';

type StoredType = 'float32' | 'float64';

interface ArrayDescriptor {
  type: StoredType;
  offset: number;
  length: number;
}

interface Header {
  format: string;
  version: number;
  arrays: ArrayDescriptor[];
  document: unknown;
}

const BYTES: Record<StoredType, number> = { float32: 4, float64: 8 };
const align8 = (n: number) => Math.ceil(n / 8) * 8;

/** The document as bytes: Float32Array and Float64Array values go to the binary part. */
export function encodeTypedArrayFile(document: unknown): Uint8Array {
  const arrays: { type: StoredType; values: Float32Array | Float64Array; offset: number }[] = [];
  let dataBytes = 0;
  const replace = (_key: string, value: unknown): unknown => {
    if (!(value instanceof Float32Array || value instanceof Float64Array)) return value;
    const type: StoredType = value instanceof Float32Array ? 'float32' : 'float64';
    arrays.push({ type, values: value, offset: dataBytes });
    dataBytes = align8(dataBytes + value.length * BYTES[type]);
    return { $typedArray: arrays.length - 1 };
  };
  const documentJson = JSON.stringify(document, replace);
  const descriptors: ArrayDescriptor[] = arrays.map(({ type, offset, values }) => ({
    type,
    offset,
    length: values.length,
  }));
  const headerText = `{"format":"${TYPED_ARRAY_FILE_FORMAT}","version":${TYPED_ARRAY_FILE_VERSION},"arrays":${JSON.stringify(descriptors)},"document":${documentJson}}`;
  const headerBytes = new TextEncoder().encode(headerText);
  const dataStart = align8(8 + headerBytes.length);
  const out = new Uint8Array(dataStart + dataBytes);
  out.set(new TextEncoder().encode(MAGIC), 0);
  const view = new DataView(out.buffer);
  view.setUint32(4, dataStart - 8, true);
  out.set(headerBytes, 8);
  out.fill(0x20, 8 + headerBytes.length, dataStart);
  for (const a of arrays) {
    const at = dataStart + a.offset;
    if (a.type === 'float32') a.values.forEach((x, i) => view.setFloat32(at + 4 * i, x, true));
    else a.values.forEach((x, i) => view.setFloat64(at + 8 * i, x, true));
  }
  return out;
}

const LITTLE_ENDIAN_HOST = new Uint8Array(new Uint16Array([1]).buffer)[0] === 1;

/** One stored array as a typed array of its own (a copy: the file's bytes may be reused). */
function readArray(
  bytes: Uint8Array,
  view: DataView,
  at: number,
  a: ArrayDescriptor,
): Float32Array | Float64Array {
  const size = BYTES[a.type];
  if (LITTLE_ENDIAN_HOST) {
    // Uint8Array's slice copies (a Node Buffer's own slice would not).
    const copy = Uint8Array.prototype.slice.call(bytes, at, at + a.length * size).buffer;
    return a.type === 'float32' ? new Float32Array(copy) : new Float64Array(copy);
  }
  const out = a.type === 'float32' ? new Float32Array(a.length) : new Float64Array(a.length);
  for (let k = 0; k < a.length; k++)
    out[k] =
      a.type === 'float32' ? view.getFloat32(at + 4 * k, true) : view.getFloat64(at + 8 * k, true);
  return out;
}

/** The document of a typed-array file, with its typed arrays restored; throws on a damaged file. */
export function decodeTypedArrayFile(bytes: Uint8Array, name = 'typed-array file'): unknown {
  const fail = (why: string): never => {
    throw new Error(`${name}: ${why}`);
  };
  if (bytes.length < 8 || new TextDecoder().decode(bytes.subarray(0, 4)) !== MAGIC)
    fail(`not a ${TYPED_ARRAY_FILE_FORMAT} file (no "${MAGIC}" signature)`);
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  const headerLength = view.getUint32(4, true);
  const dataStart = 8 + headerLength;
  if (dataStart > bytes.length) fail('header runs past the end of the file');
  let header: Header;
  try {
    header = JSON.parse(new TextDecoder().decode(bytes.subarray(8, dataStart))) as Header;
  } catch (e) {
    return fail(`header is not JSON (${(e as Error).message})`);
  }
  if (header.format !== TYPED_ARRAY_FILE_FORMAT || header.version !== TYPED_ARRAY_FILE_VERSION)
    fail(`unsupported format ${String(header.format)} version ${String(header.version)}`);
  const arrays = header.arrays.map((a, i) => {
    const size = BYTES[a.type];
    if (size === undefined) return fail(`array ${i}: unknown type ${String(a.type)}`);
    const at = dataStart + a.offset;
    if (!(Number.isInteger(a.length) && a.length >= 0) || at + a.length * size > bytes.length)
      fail(`array ${i}: runs past the end of the file`);
    return readArray(bytes, view, at, a);
  });
  const restore = (value: unknown): unknown => {
    if (Array.isArray(value)) return value.map(restore);
    if (value === null || typeof value !== 'object') return value;
    const ref = (value as { $typedArray?: unknown }).$typedArray;
    if (ref !== undefined) {
      const a = typeof ref === 'number' ? arrays[ref] : undefined;
      return a ?? fail(`reference to a missing array ${JSON.stringify(ref)}`);
    }
    return Object.fromEntries(Object.entries(value).map(([k, v]) => [k, restore(v)]));
  };
  return restore(header.document);
}
