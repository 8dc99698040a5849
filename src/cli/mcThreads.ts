// Multi-threaded Monte Carlo for the command line: the run's batches go to Node worker threads
// through the page pool's scheduling (src/compute/mcRunState.ts hands out batch tasks and merges
// the tallies in batch order), so the result is identical, bit for bit, whatever the number of
// threads, and equal to the page's worker pool for the same inputs. The case calculation is
// synchronous, so the main thread blocks while the threads work: each thread answers on its own
// message port and bumps a shared counter; the main thread sleeps on that counter (Atomics.wait)
// and reads the answers with receiveMessageOnPort. Threads start on first use and are kept for
// the next run of the same process (batch mode); they do not keep the process alive.
import { availableParallelism } from 'node:os';
import {
  MessageChannel,
  receiveMessageOnPort,
  Worker,
  type MessagePort,
} from 'node:worker_threads';
import { McRunState } from '../compute/mcRunState';
import type { McRunner } from '../compute/calculateCase';
import type { BatchTally } from '../engine/montecarlo/runBatch';
import { runBatch } from '../engine/montecarlo/runBatch';
import type { PlannedTask } from '../engine/montecarlo/runMonteCarlo';

/** Threads used when none are asked for: one per core the process may use. */
export function defaultMonteCarloThreads(): number {
  return Math.max(1, availableParallelism());
}

/** A batch takes well under a second (≤ 20 000 histories); a thread silent this long is lost. */
const STALL_MS = 120_000;

interface Thread {
  worker: Worker;
  port: MessagePort;
  task: PlannedTask | undefined;
}

interface Reply {
  tally?: BatchTally;
  error?: string;
}

const signal = new Int32Array(new SharedArrayBuffer(4));
let pool: Thread[] = [];

function startThread(): Thread {
  const { port1, port2 } = new MessageChannel();
  const worker = new Worker(new URL('./mcThread.mjs', import.meta.url), {
    workerData: { port: port2, signal },
    transferList: [port2],
    name: 'lamina-mc-cli',
  });
  worker.unref();
  port1.unref();
  return { worker, port: port1, task: undefined };
}

/** Ends every thread of the pool (the next run starts new ones). */
export function closeMonteCarloThreads(): Promise<void> {
  const ending = pool.map((t) => {
    t.port.close();
    return t.worker.terminate();
  });
  pool = [];
  return Promise.all(ending).then(() => undefined);
}

function threadsOf(n: number): Thread[] {
  while (pool.length < n) pool.push(startThread());
  return pool.slice(0, n);
}

/** Runs every task of `state` on `threads`, blocking until the last tally is merged. */
function drive(state: McRunState, threads: Thread[]): void {
  const give = (t: Thread): void => {
    t.task = state.nextTask();
    if (t.task) t.port.postMessage(t.task.task);
  };
  threads.forEach(give);
  let lastAnswerMs = Date.now();
  while (threads.some((t) => t.task)) {
    const seen = Atomics.load(signal, 0);
    let answered = false;
    for (const t of threads) {
      if (!t.task) continue;
      const received = receiveMessageOnPort(t.port);
      if (!received) continue;
      answered = true;
      const { tally, error } = received.message as Reply;
      if (!tally) throw new Error(`Monte Carlo thread: ${error ?? 'answered without a tally'}`);
      state.accept(t.task.scenarioIndex, tally);
      give(t);
    }
    if (answered) {
      lastAnswerMs = Date.now();
      continue;
    }
    if (Date.now() - lastAnswerMs > STALL_MS)
      throw new Error(`Monte Carlo thread silent for ${STALL_MS / 1000} s`);
    Atomics.wait(signal, 0, seen, 1000);
  }
}

/**
 * A Monte Carlo runner for the case calculation on `threads` threads (1: in this thread, no
 * worker). Same seed, same result for any thread count.
 */
export function threadedMonteCarlo(threads: number): McRunner {
  if (!Number.isInteger(threads) || threads < 1)
    throw new RangeError('threads: must be an integer ≥ 1');
  return (c, options, depthGridCm) => {
    const state = new McRunState(c, options, depthGridCm);
    if (threads === 1) {
      for (let t = state.nextTask(); t; t = state.nextTask())
        state.accept(t.scenarioIndex, runBatch(t.task));
    } else {
      try {
        drive(state, threadsOf(threads));
      } catch (e) {
        void closeMonteCarloThreads();
        throw e;
      }
    }
    return state.result();
  };
}
