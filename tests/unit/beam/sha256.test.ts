import { createHash } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { sha256Hex, utf8Bytes } from '../../../src/engine/util/sha256';

describe('sha256Hex', () => {
  it('sha256Hex("abc") equals the FIPS 180-2 one-block example', () => {
    // FIPS 180-2, appendix B.1: SHA-256("abc")
    expect(sha256Hex('abc')).toBe(
      'ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad',
    );
  });

  it('sha256Hex of the 448-bit message equals the FIPS 180-2 two-block example', () => {
    // FIPS 180-2, appendix B.2
    expect(sha256Hex('abcdbcdecdefdefgefghfghighijhijkijkljklmklmnlmnomnopnopq')).toBe(
      '248d6a61d20638b8e5c026930c3e6039a33ce45964ff2167f6ecedd419db06c1',
    );
  });

  it('sha256Hex agrees with node:crypto on empty, multi-block and non-ASCII text', () => {
    const texts = ['', 'x'.repeat(1000), 'depth,ρ̃ = 0.6 — µ/ρ 😀\r\n'.repeat(7)];
    for (const t of texts)
      expect(sha256Hex(t)).toBe(createHash('sha256').update(t, 'utf8').digest('hex'));
  });

  it('utf8Bytes encodes like Buffer.from(text, "utf8")', () => {
    const t = 'a é € 😀';
    expect(Array.from(utf8Bytes(t))).toEqual(Array.from(Buffer.from(t, 'utf8')));
  });
});
