// Monte Carlo worker: runs batches of histories for src/compute/mcPool.ts (result buffers transferred).
import * as Comlink from 'comlink';
import { runBatch, type BatchTask } from '../src/engine/montecarlo/runBatch';

Comlink.expose({
  runBatch(task: BatchTask) {
    const tally = runBatch(task);
    return Comlink.transfer(tally, [tally.caxMeV.buffer, tally.lateralMeV.buffer]);
  },
});
