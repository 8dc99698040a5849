// Reading single DICOM Part 10 files: the file layout of PS3.10 7.1 (preamble, "DICM", meta group)
// and the transfer syntaxes of PS3.5 / PS3.6 Annex A; every refusal names the problem.
import { describe, expect, it } from 'vitest';
import { readDicomFile } from '../../../src/dicom/readPart10';
import { TAG } from '../../../src/dicom/tags';
import { writeRtPlan } from '../../helpers/dicomPhantom';
import { ds, str, us, ow, writePart10 } from '../../helpers/dicomWriter';

const CT = '1.2.840.10008.5.1.4.1.1.2';

function ctFile(syntax: 'implicit' | 'explicit', transferSyntaxUid?: string) {
  const pixels = new Uint8Array(4 * 4 * 2);
  return writePart10(
    [
      str(0x0020000e, 'UI', '2.25.1'),
      ds(0x00200032, 0, 0, 0),
      us(0x00280010, 4),
      us(0x00280011, 4),
      ow(0x7fe00010, pixels),
    ],
    {
      syntax,
      sopClassUid: CT,
      sopInstanceUid: '2.25.2',
      ...(transferSyntaxUid ? { transferSyntaxUid } : {}),
    },
  );
}

describe('readDicomFile', () => {
  it.each(['implicit', 'explicit'] as const)('reads a %s VR little endian file', (syntax) => {
    const r = readDicomFile('a.dcm', ctFile(syntax));
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.file.sopClassUid).toBe(CT);
    // PS3.6 Annex A: 1.2.840.10008.1.2 Implicit VR LE, 1.2.840.10008.1.2.1 Explicit VR LE.
    expect(r.file.transferSyntaxUid).toBe(
      syntax === 'implicit' ? '1.2.840.10008.1.2' : '1.2.840.10008.1.2.1',
    );
    expect(r.file.dataSet.uint16(TAG.rows)).toBe(4);
    expect(r.file.dataSet.string(TAG.seriesInstanceUid)).toBe('2.25.1');
  });

  it('refuses a file too short for the preamble', () => {
    const r = readDicomFile('x', new Uint8Array(50));
    expect(r).toMatchObject({
      ok: false,
      message: expect.stringContaining('too short for a DICOM Part 10 file (50 bytes'),
    });
  });

  it('refuses a file without "DICM" after the preamble', () => {
    const bytes = ctFile('explicit');
    bytes[129] = 0x58;
    expect(readDicomFile('x', bytes)).toMatchObject({
      ok: false,
      message: expect.stringContaining('no "DICM"'),
    });
  });

  it('refuses a file cut inside its meta information', () => {
    const r = readDicomFile('x', ctFile('explicit').slice(0, 150));
    expect(r).toMatchObject({
      ok: false,
      message: expect.stringContaining('file meta information cannot be read'),
    });
  });

  it.each([
    // PS3.6 Annex A names.
    ['1.2.840.10008.1.2.4.90', 'JPEG 2000 Image Compression (Lossless Only)'],
    ['1.2.840.10008.1.2.4.70', 'JPEG Lossless, Non-Hierarchical, First-Order Prediction'],
    ['1.2.840.10008.1.2.5', 'RLE Lossless'],
    ['1.2.840.10008.1.2.1.99', 'Deflated Explicit VR Little Endian'],
    ['1.2.840.10008.1.2.2', 'Explicit VR Big Endian (retired)'],
    ['1.2.3.4', 'not a transfer syntax Lamina knows'],
  ])('refuses transfer syntax %s naming it (%s)', (uid, name) => {
    const r = readDicomFile('x', ctFile('explicit', uid));
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.message).toContain(`transfer syntax ${uid} (${name}) is not read by Lamina`);
    expect(r.message).toContain('Implicit VR Little Endian (1.2.840.10008.1.2)');
  });

  it.each(['implicit', 'explicit'] as const)(
    'refuses a %s file cut inside its pixel data',
    (syntax) => {
      const bytes = ctFile(syntax);
      const r = readDicomFile('cut.dcm', bytes.slice(0, bytes.length - 6));
      expect(r.ok).toBe(false);
      if (r.ok) return;
      expect(r.message).toMatch(/truncated/);
    },
  );

  it('refuses an RT Plan cut inside a sequence', () => {
    const plan = writeRtPlan({
      label: 'P',
      patientPosition: 'HFS',
      beams: [{ number: 1, name: 'A', energyMV: 6, gantryDeg: 0, isoMm: [0, 0, 0] }],
      undefinedLengthSequences: true,
    }).bytes;
    const r = readDicomFile('cut.dcm', plan.slice(0, Math.floor(plan.length * 0.6)));
    expect(r.ok).toBe(false);
  });
});
