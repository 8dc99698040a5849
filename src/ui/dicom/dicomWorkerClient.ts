// The page's handle on the DICOM import worker: started for an import and ended after it, so
// the CT it read leaves memory with it.
import * as Comlink from 'comlink';
import type { DicomImportApi, NamedBlob } from '../../dicom/dicomImportApi';
import type { DicomImportResult, ImportProgress } from '../../dicom/importDicom';
import { superviseWorker } from '../../compute/workerSupervisor';

const importWorker = superviseWorker<DicomImportApi>(
  () =>
    new Worker(new URL('../../../workers/dicom.worker.ts', import.meta.url), {
      type: 'module',
      name: 'lamina-dicom',
    }),
  'DICOM import',
);

export async function importInWorker(
  files: readonly NamedBlob[],
  onProgress: (p: ImportProgress) => void,
): Promise<DicomImportResult> {
  try {
    return await importWorker.api().importFiles(files, Comlink.proxy(onProgress));
  } finally {
    importWorker.terminate();
  }
}
