// Node worker thread for bench/montecarlo.bench.ts: runs Monte Carlo batch tasks (TypeScript
// loaded through tsx's ESM hook; see the toolchain notes on worker_threads under tsx).
import { register } from 'tsx/esm/api';
import { parentPort } from 'node:worker_threads';

register();
const { runBatch } = await import('../src/engine/montecarlo/runBatch.ts');
parentPort.on('message', (task) => parentPort.postMessage(runBatch(task)));
