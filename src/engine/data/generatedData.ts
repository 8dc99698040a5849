// The generated data the engine reads (kernels and modelled beams, written by the generators in
// scripts/), installed once per process or worker before the first calculation: the engine does
// no I/O itself. The page's workers fetch the files from the app's own origin
// (src/io/generatedDataFetch.ts); Node reads them from disk (src/io/generatedDataNode.ts).
import type { BeamKernelFile, PencilKernelFile } from '../kernels/kernelFiles';
import type { ModelledBeamFile } from '../beam/modelledBeamFile';

export interface GeneratedData {
  beamKernels: BeamKernelFile;
  pencilKernels: PencilKernelFile;
  modelledBeams: ModelledBeamFile;
}

let installed: GeneratedData | null = null;

/** Makes the generated data available to the engine (replaces any installed before). */
export function installGeneratedData(data: GeneratedData): void {
  installed = data;
}

export function hasGeneratedData(): boolean {
  return installed !== null;
}

/** The installed generated data; throws if none was installed (a start-up error, not user input). */
export function generatedData(): GeneratedData {
  if (!installed)
    throw new Error(
      'generated data not loaded: install it (src/io/generatedDataNode.ts in Node, src/io/generatedDataFetch.ts in a worker) before calculating',
    );
  return installed;
}
