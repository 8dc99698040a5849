// The generated data files as the workers and Node read them: every beam energy present with the
// sizes the engine expects, and a wrong or damaged file named in the error.
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { BEAM_ENERGIES } from '../../../src/engine/beam/energies';
import {
  decodeGeneratedData,
  GENERATED_FILE_URLS,
  type GeneratedFileName,
} from '../../../src/io/generatedDataFiles';
import { encodeTypedArrayFile } from '../../../src/io/typedArrayFile';

const onDisk = (name: GeneratedFileName) => readFileSync(fileURLToPath(GENERATED_FILE_URLS[name]));

describe('decodeGeneratedData', () => {
  it('reads the stored files: kernels and modelled beams for every beam energy', () => {
    const d = decodeGeneratedData(onDisk);
    for (const energy of BEAM_ENERGIES) {
      const k = d.beamKernels.beams[energy];
      expect(k?.primary).toBeInstanceOf(Float32Array);
      expect(k?.primary.length).toBe(d.beamKernels.radialEdgesCm.length * d.beamKernels.polarBins);
      expect(d.pencilKernels.beams[energy]?.values.length).toBe(
        d.pencilKernels.depthsCm.length * d.pencilKernels.radiiCm.length,
      );
      const m = d.modelledBeams.beams[energy];
      expect(m?.tmr.length).toBe(m?.fieldsCm.length);
      expect(m?.tmr[0]?.length).toBe(m?.depthsCm.length);
    }
  });

  it('names the file whose format or sizes are wrong', () => {
    expect(() =>
      decodeGeneratedData((n) => (n === 'pencilKernels' ? onDisk('beamKernels') : onDisk(n))),
    ).toThrow('generated data pencilKernels.bin: format is lamina.pointKernels.beams');
    const short = encodeTypedArrayFile({
      format: 'lamina.pencilKernels',
      depthsCm: [0, 1],
      radiiCm: [0, 1],
      beams: { '6MV': { values: new Float32Array(3) } },
    });
    expect(() => decodeGeneratedData((n) => (n === 'pencilKernels' ? short : onDisk(n)))).toThrow(
      'generated data pencilKernels.bin: 6MV: expected 4 values',
    );
  });
});
