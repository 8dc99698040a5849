// A Monte Carlo worker thread of the command line: runs the batch tasks it receives on its port
// (src/engine/montecarlo/runBatch.ts, the same function as the page's workers) and answers each
// with the tally or the error, then bumps the shared signal so the blocked main thread wakes up.
import { workerData } from 'node:worker_threads';
import type { MessagePort } from 'node:worker_threads';
import { runBatch, type BatchTask } from '../engine/montecarlo/runBatch';

const { port, signal } = workerData as { port: MessagePort; signal: Int32Array };

port.on('message', (task: BatchTask) => {
  try {
    const tally = runBatch(task);
    // The tally's arrays are fresh for each batch: hand their buffers over instead of copying.
    const buffers = [tally.caxMeV.buffer, tally.lateralMeV.buffer] as ArrayBuffer[];
    port.postMessage({ tally }, buffers);
  } catch (e) {
    port.postMessage({ error: e instanceof Error ? e.message : String(e) });
  }
  Atomics.add(signal, 0, 1);
  Atomics.notify(signal, 0);
});
