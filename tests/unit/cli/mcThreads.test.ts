import { afterAll, describe, expect, it } from 'vitest';
import { closeMonteCarloThreads, threadedMonteCarlo } from '../../../src/cli/mcThreads';
import { mcOptionsOf, mcThreadsOf } from '../../../src/cli/mcArgs';
import { startMonteCarlo } from '../../../src/compute/mcPool';
import { runBatch } from '../../../src/engine/montecarlo/runBatch';
import { runMonteCarlo } from '../../../src/engine/montecarlo/runMonteCarlo';
import type { McCaseInput, McOptions } from '../../../src/engine/montecarlo/monteCarloPlan';

// Water, lung (ρ 0.26) and water again; 18 MV exercises pair production and positrons.
const CASE: McCaseInput = {
  beam: { energy: '18MV', setup: { kind: 'SSD', ssdCm: 100 }, fieldXCm: 5, fieldYCm: 5 },
  layers: [
    { materialId: 'water', thicknessCm: 5 },
    { materialId: 'lung', thicknessCm: 10, densityGPerCm3: 0.26 },
    { materialId: 'water', thicknessCm: 5 },
  ],
  points: [{ id: 'mid-lung', depthCm: 10 }],
};
const OPTIONS: McOptions = { histories: 3000, seed: 11, batches: 12, referenceDMaxCm: 3.3 };
const GRID = Array.from({ length: 41 }, (_, i) => i * 0.5);

afterAll(() => closeMonteCarloThreads());

describe('command-line Monte Carlo on worker threads', () => {
  it('threadedMonteCarlo(1) and threadedMonteCarlo(2) give the same result, bit for bit, and equal runMonteCarlo', () => {
    const one = threadedMonteCarlo(1)(CASE, OPTIONS, GRID);
    const two = threadedMonteCarlo(2)(CASE, OPTIONS, GRID);
    const three = threadedMonteCarlo(3)(CASE, OPTIONS, GRID);
    // JSON keeps every double's exact value (shortest round-trip form): equal text, equal bits.
    expect(JSON.stringify(two)).toBe(JSON.stringify(one));
    expect(JSON.stringify(three)).toBe(JSON.stringify(one));
    expect(two).toEqual(one);
    expect(JSON.stringify(runMonteCarlo(CASE, OPTIONS, GRID))).toBe(JSON.stringify(one));
    expect(one.method.points[0]!.dosePerMuCGy).toBeGreaterThan(0);
  });

  it('equals the page worker pool (startMonteCarlo) for the same inputs', async () => {
    const page = await startMonteCarlo(CASE, OPTIONS, () => {}, {
      workers: 2,
      depthGridCm: GRID,
      createWorker: () => ({
        runBatch: (task) => new Promise((resolve) => setTimeout(() => resolve(runBatch(task)))),
        dispose: () => {},
      }),
    }).done;
    const cli = threadedMonteCarlo(2)(CASE, OPTIONS, GRID);
    expect(JSON.stringify(cli)).toBe(JSON.stringify(page));
  });

  it('a different seed on two threads gives a different result (the threads do run the tasks)', () => {
    const a = threadedMonteCarlo(2)(CASE, OPTIONS, GRID);
    const b = threadedMonteCarlo(2)(CASE, { ...OPTIONS, seed: 12 }, GRID);
    expect(b.method.points[0]!.dosePerMuCGy).not.toBe(a.method.points[0]!.dosePerMuCGy);
  });

  it('a batch that throws in a thread fails the run with its message instead of hanging', () => {
    // An unknown material fails inside the thread, when the batch builds its transport tables
    // (analogue: the variance reduction's plan would look the material up on this thread first).
    const broken = {
      ...CASE,
      layers: [{ materialId: 'unobtainium', thicknessCm: 5 }],
    } as unknown as McCaseInput;
    expect(() => threadedMonteCarlo(2)(broken, { ...OPTIONS, analogue: true }, GRID)).toThrow(
      /^Monte Carlo thread: /,
    );
    // The pool is replaced after a failure: the next run works.
    expect(
      threadedMonteCarlo(2)(CASE, OPTIONS, GRID).method.points[0]!.dosePerMuCGy,
    ).toBeGreaterThan(0);
  });
});

describe('--mc-threads', () => {
  it('mcThreadsOf(...) reads an integer from 1 to 64 and defaults to the machine cores', () => {
    expect(mcThreadsOf(new Map([['mc-threads', '3']]))).toBe(3);
    expect(mcThreadsOf(new Map())).toBeGreaterThanOrEqual(1);
    for (const bad of ['0', '-2', '1.5', 'many', '65'])
      expect(() => mcThreadsOf(new Map([['mc-threads', bad]]))).toThrow(
        /--mc-threads needs an integer from 1 to 64/,
      );
  });

  it('mcOptionsOf(...) rejects --mc-threads without --mc-histories and attaches a runner', () => {
    expect(() => mcOptionsOf(new Map([['mc-threads', '2']]))).toThrow(/needs --mc-histories/);
    const { mc } = mcOptionsOf(
      new Map([
        ['mc-histories', '1000'],
        ['mc-threads', '2'],
      ]),
    );
    expect(mc).toMatchObject({ histories: 1000, seed: 1 });
    expect(typeof mc?.runner).toBe('function');
  });
});
