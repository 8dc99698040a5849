import { describe, expect, it } from 'vitest';
import * as Comlink from 'comlink';
import { startMonteCarlo, type McWorkerHandle } from '../../../src/compute/mcPool';
import { McRunState, type McProgress } from '../../../src/compute/mcRunState';
import { runBatch, type BatchTally, type BatchTask } from '../../../src/engine/montecarlo/runBatch';
import { runMonteCarlo } from '../../../src/engine/montecarlo/runMonteCarlo';
import type { McCaseInput } from '../../../src/engine/montecarlo/monteCarloPlan';

const CASE: McCaseInput = {
  beam: { energy: '6MV', setup: { kind: 'SSD', ssdCm: 100 }, fieldXCm: 10, fieldYCm: 10 },
  layers: [
    { materialId: 'water', thicknessCm: 4 },
    { materialId: 'lung', thicknessCm: 4, densityGPerCm3: 0.26 },
    { materialId: 'water', thicknessCm: 4 },
  ],
  points: [{ id: 'P', depthCm: 10 }],
};
const GRID = Array.from({ length: 13 }, (_, i) => i);
const OPTIONS = { histories: 3000, seed: 5, batches: 10 };

/** In-process worker answering after a variable delay, so results arrive out of order. */
function delayedWorker(delays: number[]): McWorkerHandle {
  let k = 0;
  return {
    runBatch: (task) =>
      new Promise((resolve) =>
        setTimeout(() => resolve(runBatch(task)), delays[k++ % delays.length]),
      ),
    dispose: () => {},
  };
}

/** A worker reached through comlink over a MessageChannel (the browser path, in Node). */
function channelWorker(): McWorkerHandle {
  const { port1, port2 } = new MessageChannel();
  Comlink.expose({ runBatch: (task: BatchTask) => runBatch(task) }, port1);
  const remote = Comlink.wrap<{ runBatch(task: BatchTask): BatchTally }>(port2);
  return {
    runBatch: (task) => remote.runBatch(task),
    dispose: () => {
      port1.close();
      port2.close();
    },
  };
}

describe('startMonteCarlo', () => {
  it('startMonteCarlo(...) with 3 workers and out-of-order arrivals equals the single-threaded run', async () => {
    const progress: McProgress[] = [];
    const delays = [[3, 0, 1], [0, 2], [1]];
    let w = 0;
    const run = startMonteCarlo(CASE, OPTIONS, (p) => progress.push(p), {
      workers: 3,
      depthGridCm: GRID,
      createWorker: () => delayedWorker(delays[w++]!),
    });
    const result = await run.done;
    const reference = runMonteCarlo(CASE, OPTIONS, GRID);
    expect(result.method).toEqual(reference.method);
    expect(progress.at(-1)!.tasksDone).toBe(progress.at(-1)!.totalTasks);
    expect(progress.at(-1)!.points[0]!.relativeSigma).toBeGreaterThan(0);
    // Histories never decrease as batches arrive.
    for (let i = 1; i < progress.length; i++)
      expect(progress[i]!.histories).toBeGreaterThanOrEqual(progress[i - 1]!.histories);
  });

  it('startMonteCarlo(...) over comlink MessageChannels gives the same result', async () => {
    const run = startMonteCarlo(CASE, OPTIONS, () => {}, {
      workers: 2,
      depthGridCm: GRID,
      createWorker: channelWorker,
    });
    const result = await run.done;
    expect(result.method).toEqual(runMonteCarlo(CASE, OPTIONS, GRID).method);
  });

  it('cancel() stops the run; done resolves with the batches merged so far', async () => {
    let disposed = 0;
    const holder: { run?: ReturnType<typeof startMonteCarlo> } = {};
    const run = startMonteCarlo(
      CASE,
      { ...OPTIONS, histories: 20000, batches: 40 },
      (p) => {
        if (p.partial && p.tasksDone >= 12) holder.run?.cancel();
      },
      {
        workers: 2,
        depthGridCm: GRID,
        createWorker: () => ({ ...delayedWorker([0]), dispose: () => void disposed++ }),
      },
    );
    holder.run = run;
    const result = await run.done;
    expect(result.batchesDone).toBeLessThan(40);
    expect(result.batchesDone).toBeGreaterThanOrEqual(2);
    expect(disposed).toBe(2);
  });

  it('cancel() before any estimate rejects done', async () => {
    const run = startMonteCarlo(CASE, OPTIONS, () => {}, {
      workers: 1,
      depthGridCm: GRID,
      createWorker: () => delayedWorker([5]),
    });
    run.cancel();
    await expect(run.done).rejects.toThrow(/cancelled/);
  });

  it('McRunState reuses a finished calibration run: a second run simulates 2 of 3 scenarios and gives the same result', () => {
    const options = { histories: 1000, seed: 321, batches: 10 };
    const drive = (state: McRunState) => {
      for (let t = state.nextTask(); t; t = state.nextTask())
        state.accept(t.scenarioIndex, runBatch(t.task));
      return state;
    };
    const first = drive(new McRunState(CASE, options, GRID));
    const second = drive(new McRunState(CASE, options, GRID));
    expect(first.plan.scenarios).toHaveLength(3);
    expect(first.progress(false).totalTasks).toBe(30);
    expect(second.progress(false).totalTasks).toBe(20);
    expect(second.result().method).toEqual(first.result().method);
  });

  it('McRunState.progress() has no estimate until every scenario has two batches', () => {
    const s = new McRunState(CASE, OPTIONS, GRID);
    expect(s.progress().partial).toBeNull();
    const first = s.nextTask()!;
    s.accept(first.scenarioIndex, runBatch(first.task));
    expect(s.hasEstimate).toBe(false);
    expect(s.progress().points[0]!.dosePerMuCGy).toBeNull();
  });
});
