// The generated data's binary form: a document with its typed arrays after a JSON header.
import { describe, expect, it } from 'vitest';
import { decodeTypedArrayFile, encodeTypedArrayFile } from '../../../src/io/typedArrayFile';

const doc = {
  format: 'test',
  grid: [0, 0.1, 0.25],
  beams: {
    '6MV': { values: Float32Array.from([0.029308, 5.3357e-7, 0, -1.5]), note: 'é ± σ' },
    '18MV': { values: Float32Array.from([1, 2, 3]) },
  },
  rows: [Float32Array.from([1.5]), Float32Array.from([2.5, 3.5])],
  exact: Float64Array.from([0.1, Math.PI, 1e-300]),
  empty: new Float64Array(0),
};

describe('encodeTypedArrayFile / decodeTypedArrayFile', () => {
  it('decode(encode(doc)) gives the document back, typed arrays with their type and values', () => {
    const back = decodeTypedArrayFile(encodeTypedArrayFile(doc)) as typeof doc;
    expect(back).toEqual(doc);
    expect(back.beams['6MV'].values).toBeInstanceOf(Float32Array);
    expect(back.exact).toBeInstanceOf(Float64Array);
    expect(back.exact[0]).toBe(0.1);
    expect(back.rows[1]).toEqual(Float32Array.from([2.5, 3.5]));
  });

  it('starts with "LMNA", the header length, a JSON header, and data on 8-byte boundaries', () => {
    const bytes = encodeTypedArrayFile(doc);
    expect(new TextDecoder().decode(bytes.subarray(0, 4))).toBe('LMNA');
    const headerLength = new DataView(bytes.buffer).getUint32(4, true);
    expect((8 + headerLength) % 8).toBe(0);
    const header = JSON.parse(new TextDecoder().decode(bytes.subarray(8, 8 + headerLength))) as {
      format: string;
      arrays: { type: string; offset: number; length: number }[];
      document: { grid: number[]; exact: unknown };
    };
    expect(header.format).toBe('lamina.typedArrays');
    expect(header.document.grid).toEqual([0, 0.1, 0.25]);
    expect(header.document.exact).toEqual({ $typedArray: 4 });
    for (const a of header.arrays) expect(a.offset % 8).toBe(0);
    // Little-endian Float32 of the first value, read straight from the bytes.
    const first = header.arrays[0]!;
    expect(new DataView(bytes.buffer).getFloat32(8 + headerLength + first.offset, true)).toBe(
      Math.fround(0.029308),
    );
  });

  it('reads bytes that sit at an odd offset of a larger buffer (as Node file buffers may)', () => {
    const bytes = encodeTypedArrayFile(doc);
    const shifted = new Uint8Array(bytes.length + 3);
    shifted.set(bytes, 3);
    expect(decodeTypedArrayFile(shifted.subarray(3))).toEqual(doc);
    // A small Node Buffer shares a larger pooled ArrayBuffer: the arrays must not see the rest.
    expect(decodeTypedArrayFile(Buffer.from(bytes))).toEqual(doc);
  });

  it('names the file and the problem for damaged input', () => {
    const bytes = encodeTypedArrayFile(doc);
    expect(() => decodeTypedArrayFile(new TextEncoder().encode('{"a":1}'), 'x.bin')).toThrow(
      /^x\.bin: not a lamina\.typedArrays file/,
    );
    expect(() => decodeTypedArrayFile(bytes.subarray(0, bytes.length - 4), 'x.bin')).toThrow(
      /^x\.bin: array \d+: runs past the end of the file/,
    );
    const badHeader = Uint8Array.from(bytes);
    badHeader[8] = 0x21; // '!' where the JSON header starts
    expect(() => decodeTypedArrayFile(badHeader, 'x.bin')).toThrow(/^x\.bin: header is not JSON/);
  });
});
