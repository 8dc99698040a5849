// Node side of the generated data (CLI, tests, scripts, bench): reads the typed-array files from
// disk and installs them for the engine; reads and writes single files for the generators.
import { readFileSync, writeFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { hasGeneratedData, installGeneratedData } from '../engine/data/generatedData';
import { decodeGeneratedData, GENERATED_FILE_URLS } from './generatedDataFiles';
import { decodeTypedArrayFile, encodeTypedArrayFile } from './typedArrayFile';

/** Reads and installs the generated data (once; later calls do nothing). */
export function loadGeneratedDataFromDisk(): void {
  if (hasGeneratedData()) return;
  installGeneratedData(
    decodeGeneratedData((name) => readFileSync(fileURLToPath(GENERATED_FILE_URLS[name]))),
  );
}

/** The document of one typed-array file on disk. */
export function readTypedArrayFileSync(path: string): unknown {
  return decodeTypedArrayFile(readFileSync(path), path);
}

/** Writes a document as a typed-array file (its Float32Array/Float64Array values in binary). */
export function writeTypedArrayFileSync(path: string, document: unknown): void {
  writeFileSync(path, encodeTypedArrayFile(document));
}
