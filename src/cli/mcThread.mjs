// Boot file of a Monte Carlo worker thread of the command line (src/cli/mcThreads.ts). Node 20
// worker threads cannot start from a .ts file, so this plain module registers tsx's loader and
// imports the TypeScript worker. A failure to load is reported on the task port, so the waiting
// main thread hears of it instead of waiting for an answer that never comes.
import { workerData } from 'node:worker_threads';
import { register } from 'tsx/esm/api';

try {
  register();
  await import('./mcThreadWorker.ts');
} catch (e) {
  const { port, signal } = workerData;
  port.postMessage({ error: `Monte Carlo thread failed to start: ${e?.message ?? e}` });
  Atomics.add(signal, 0, 1);
  Atomics.notify(signal, 0);
}
