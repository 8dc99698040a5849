// The generated data files the engine reads (src/engine/data/generated/*.bin, typed-array files
// written by the generators) and their decoding into the engine's GeneratedData, checked for
// shape. The URLs resolve to the app's own bundled assets in the page's workers (Vite emits each
// file beside the worker script) and to the files on disk in Node.
import type { GeneratedData } from '../engine/data/generatedData';
import type { BeamKernelFile, PencilKernelFile } from '../engine/kernels/kernelFiles';
import type { ModelledBeamFile } from '../engine/beam/modelledBeamFile';
import { decodeTypedArrayFile } from './typedArrayFile';

export type GeneratedFileName = keyof GeneratedData;

/** Where each file is: literal `new URL(…, import.meta.url)` so that Vite bundles the assets. */
export const GENERATED_FILE_URLS: Record<GeneratedFileName, URL> = {
  beamKernels: new URL('../engine/data/generated/beamKernels.bin', import.meta.url),
  pencilKernels: new URL('../engine/data/generated/pencilKernels.bin', import.meta.url),
  modelledBeams: new URL('../engine/data/generated/modelledBeams.bin', import.meta.url),
};

export const GENERATED_FORMATS: Record<GeneratedFileName, string> = {
  beamKernels: 'lamina.pointKernels.beams',
  pencilKernels: 'lamina.pencilKernels',
  modelledBeams: 'lamina.modelledBeams',
};

function check(ok: boolean, file: string, why: string): void {
  if (!ok) throw new Error(`generated data ${file}: ${why}`);
}

const isLength = (a: unknown, n: number) =>
  ArrayBuffer.isView(a) && (a as Float32Array).length === n;

/** Decodes one file and checks its format and array sizes; throws naming the file. */
function decodeOne(name: GeneratedFileName, bytes: Uint8Array): unknown {
  const file = `${name}.bin`;
  const doc = decodeTypedArrayFile(bytes, file) as { format?: unknown };
  check(doc.format === GENERATED_FORMATS[name], file, `format is ${String(doc.format)}`);
  if (name === 'beamKernels') {
    const k = doc as BeamKernelFile;
    const bins = k.radialEdgesCm.length * k.polarBins;
    for (const [energy, b] of Object.entries(k.beams)) {
      check(isLength(b.primary, bins) && isLength(b.scatter, bins), file, `${energy}: bin count`);
      check(
        isLength(b.hardened?.primary, bins) && isLength(b.hardened?.scatter, bins),
        file,
        `${energy}: hardened kernel bin count`,
      );
      const mix = b.hardening;
      check(
        Array.isArray(mix?.filtrationsCm) &&
          Array.isArray(mix?.mixFractions) &&
          mix.filtrationsCm.length === mix.mixFractions.length,
        file,
        `${energy}: hardening filtrations and mixing fractions`,
      );
    }
  } else if (name === 'pencilKernels') {
    const p = doc as PencilKernelFile;
    const n = p.depthsCm.length * p.radiiCm.length;
    for (const [energy, b] of Object.entries(p.beams))
      check(isLength(b.values, n), file, `${energy}: expected ${n} values`);
  } else {
    const m = doc as ModelledBeamFile;
    for (const [energy, b] of Object.entries(m.beams)) {
      const rows = (t: unknown[]) =>
        t.length === b.fieldsCm.length && t.every((r) => isLength(r, b.depthsCm.length));
      check(rows(b.pdd) && rows(b.tmr), file, `${energy}: PDD/TMR rows do not match the grids`);
    }
  }
  return doc;
}

/** The engine's GeneratedData from the bytes of each file (`bytesOf` gives a file's bytes). */
export function decodeGeneratedData(
  bytesOf: (name: GeneratedFileName) => Uint8Array,
): GeneratedData {
  return {
    beamKernels: decodeOne('beamKernels', bytesOf('beamKernels')) as BeamKernelFile,
    pencilKernels: decodeOne('pencilKernels', bytesOf('pencilKernels')) as PencilKernelFile,
    modelledBeams: decodeOne('modelledBeams', bytesOf('modelledBeams')) as ModelledBeamFile,
  };
}
