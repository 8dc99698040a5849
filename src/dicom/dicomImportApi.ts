// The import worker's API: files in (File objects, read inside the worker one at a time), the
// import out with each ray's samples transferred. Progress goes back through a callback.
import * as Comlink from 'comlink';
import { importDicom, type DicomImportResult, type ImportProgress } from './importDicom';

/** A dropped file: its path in the dropped folder (or name) and its contents. */
export interface NamedBlob {
  name: string;
  blob: Blob;
}

export const dicomImportApi = {
  async importFiles(
    files: readonly NamedBlob[],
    onProgress?: (p: ImportProgress) => void,
  ): Promise<DicomImportResult> {
    const r = await importDicom(
      files.map((f) => ({
        name: f.name,
        read: async () => new Uint8Array(await f.blob.arrayBuffer()),
      })),
      onProgress,
    );
    if (!r.ok) return r;
    const buffers = r.value.beams.flatMap((b) => (b.ray ? [b.ray.hu.buffer as ArrayBuffer] : []));
    return Comlink.transfer(r, buffers);
  },
};

export type DicomImportApi = typeof dicomImportApi;
