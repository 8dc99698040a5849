// The import worker's API over a real MessageChannel with comlink (the page runs it in a Web
// Worker): files in as Blobs, progress back through a proxy, ray samples transferred.
import { describe, expect, it, vi } from 'vitest';
import * as Comlink from 'comlink';
import { MessageChannel } from 'node:worker_threads';
import { dicomImportApi, type DicomImportApi } from '../../../src/dicom/dicomImportApi';
import type { ImportProgress } from '../../../src/dicom/importDicom';
import { boxPlanFiles } from '../../helpers/dicomFixtures';

describe('dicomImportApi over comlink', () => {
  it('imports Blobs and reports progress', async () => {
    const { port1, port2 } = new MessageChannel();
    Comlink.expose(dicomImportApi, port1 as unknown as Comlink.Endpoint);
    const remote = Comlink.wrap<DicomImportApi>(port2 as unknown as Comlink.Endpoint);
    const files = boxPlanFiles().map((f) => ({
      name: f.name,
      blob: new Blob([f.bytes as Uint8Array<ArrayBuffer>]),
    }));
    const seen: ImportProgress[] = [];
    const r = await remote.importFiles(
      files,
      Comlink.proxy((p: ImportProgress) => void seen.push(p)),
    );
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.value.beams).toHaveLength(4);
    expect(r.value.beams[0]!.ray!.hu).toBeInstanceOf(Float32Array);
    // Progress calls travel on the proxy's own channel and may land after the result.
    await vi.waitFor(() =>
      expect(seen.filter((p) => p.stage === 'reading')).toHaveLength(files.length),
    );
    port1.close();
    port2.close();
  });
});
