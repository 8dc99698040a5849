// Monte Carlo engine speed: histories per second per core (6 MV, 10 × 10 cm², SSD 100, 30 cm of
// water, the central-axis scoring used by the method), and the time to reach 1 % (1σ) at 10 cm
// depth on 2 cores: the same run on two Node worker threads (the batch scheme of the page's pool),
// timed, with σ ∝ 1/√N: t(1 %) = t_run · (σ_run / 1 %)².
import { Worker } from 'node:worker_threads';
import { McRunState } from '../src/compute/mcRunState';
import { runBatch, type BatchTally, type BatchTask } from '../src/engine/montecarlo/runBatch';
import { DEFAULT_BINNING } from '../src/engine/montecarlo/scenario';
import type { McCaseInput } from '../src/engine/montecarlo/monteCarloPlan';
import type { BenchFigure } from './lib/row';

export const repeats = 1;

const WATER_6MV: McCaseInput = {
  beam: { energy: '6MV', setup: { kind: 'SSD', ssdCm: 100 }, fieldXCm: 10, fieldYCm: 10 },
  layers: [{ materialId: 'water', thicknessCm: 30 }],
  points: [{ id: 'd10', depthCm: 10 }],
};

export async function run(): Promise<BenchFigure[]> {
  const scenario = {
    energy: '6MV' as const,
    ssdCm: 100,
    fieldXCm: 10,
    fieldYCm: 10,
    layers: [{ materialId: 'water' as const, thicknessCm: 30 }],
  };
  // Warm-up (table construction, JIT).
  runBatch({ scenario, binning: DEFAULT_BINNING, seed: 1, batchIndex: 0, historiesPerBatch: 5000 });
  const n = 100000;
  const t0 = performance.now();
  runBatch({ scenario, binning: DEFAULT_BINNING, seed: 2, batchIndex: 0, historiesPerBatch: n });
  const perCore = n / ((performance.now() - t0) / 1000);
  const { seconds, rel, histories } = await twoThreadRun();
  const toOnePercent = seconds * (rel / 0.01) ** 2;
  return [
    {
      name: 'MC histories per second per core (6 MV, 10×10, water)',
      value: Math.round(perCore),
      unit: 'histories/s',
    },
    {
      name: 'MC time to 1 % (1σ) at 10 cm, 6 MV 10×10 water, 2 cores',
      value: Math.round(toOnePercent * 10) / 10,
      unit: 's',
      note: `${histories} histories on 2 worker threads in ${seconds.toFixed(1)} s: 1σ ${(100 * rel).toFixed(2)} % (0.25 cm bins, incl. d_max calibration); target ≤ 30 s`,
    },
  ];
}

function call(w: Worker, task: BatchTask): Promise<BatchTally> {
  return new Promise<BatchTally>((resolve, reject) => {
    const onMessage = (t: BatchTally): void => {
      w.off('error', onError);
      resolve(t);
    };
    const onError = (e: unknown): void => {
      w.off('message', onMessage);
      reject(e instanceof Error ? e : new Error(String(e)));
    };
    w.once('message', onMessage);
    w.once('error', onError);
    w.postMessage(task);
  });
}

/** Runs the water case on two worker threads through the pool's run state; wall time and σ. */
async function twoThreadRun(): Promise<{ seconds: number; rel: number; histories: number }> {
  const histories = 400000;
  const state = new McRunState(WATER_6MV, { histories, seed: 3 }, [10]);
  const threads = [0, 1].map(() => new Worker(new URL('./montecarloThread.mjs', import.meta.url)));
  // Warm-up: each thread loads the engine and runs a small batch before the clock starts.
  const { scenarios, binning } = state.plan;
  await Promise.all(
    threads.map((w) =>
      call(w, {
        scenario: scenarios[0]!,
        binning,
        seed: 99,
        batchIndex: 0,
        historiesPerBatch: 2000,
      }),
    ),
  );
  const t0 = performance.now();
  await Promise.all(
    threads.map(async (w) => {
      for (let t = state.nextTask(); t; t = state.nextTask())
        state.accept(t.scenarioIndex, await call(w, t.task));
    }),
  );
  const seconds = (performance.now() - t0) / 1000;
  await Promise.all(threads.map((w) => w.terminate()));
  const p = state.result().method.points[0];
  return { seconds, rel: (p?.sigmaDosePerMuCGy ?? NaN) / (p?.dosePerMuCGy ?? NaN), histories };
}
