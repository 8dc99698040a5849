// Monte Carlo engine speed, through the command line's threaded runner (src/cli/mcThreads.ts, the
// page pool's batch scheme on Node worker threads):
// - histories per second per core: 6 MV, 10 × 10 cm², SSD 100, 30 cm of water, one batch; and the
//   whole mid-lung case (its case, water and calibration runs) on one thread;
// - time to 1 % (1σ) of dose per MU at a point mid-lung: 18 MV, 5 × 5 cm², SSD 100, 5 cm water,
//   10 cm lung (0.26 g/cm³), 15 cm water, point at 10 cm, on all cores; with σ ∝ 1/√N,
//   t(1 %) = t_run · (σ_run / 1 %)², σ² averaged over two runs of different seeds;
// - the CPU time to 1 % on one thread (CPU seconds of the process: steadier than wall time when
//   others load the machine; divided by the cores it is the wall time on an idle machine);
// - thread scaling: the same run on 1 thread against all cores;
// - time to 1 % at 10 cm for 6 MV 10 × 10 water on 2 threads (the earlier figure).
// Each figure's note carries the load average at the time: the machine is shared.
import { cpus, loadavg } from 'node:os';
import {
  closeMonteCarloThreads,
  defaultMonteCarloThreads,
  threadedMonteCarlo,
} from '../src/cli/mcThreads';
import { modelledWaterData } from '../src/engine/beam/modelledBeam';
import type { McCaseInput, McOptions } from '../src/engine/montecarlo/monteCarloPlan';
import type { McResult } from '../src/engine/montecarlo/monteCarloResult';
import { runBatch } from '../src/engine/montecarlo/runBatch';
import { DEFAULT_BINNING } from '../src/engine/montecarlo/scenario';
import type { BenchFigure } from './lib/row';

export const repeats = 1;

export const MID_LUNG_18MV: McCaseInput = {
  beam: { energy: '18MV', setup: { kind: 'SSD', ssdCm: 100 }, fieldXCm: 5, fieldYCm: 5 },
  layers: [
    { materialId: 'water', thicknessCm: 5 },
    { materialId: 'lung', thicknessCm: 10, densityGPerCm3: 0.26 },
    { materialId: 'water', thicknessCm: 15 },
  ],
  points: [{ id: 'mid-lung', depthCm: 10 }],
};

const WATER_6MV: McCaseInput = {
  beam: { energy: '6MV', setup: { kind: 'SSD', ssdCm: 100 }, fieldXCm: 10, fieldYCm: 10 },
  layers: [{ materialId: 'water', thicknessCm: 30 }],
  points: [{ id: 'd10', depthCm: 10 }],
};

/** Histories of each timed mid-lung run; 30 batches keep the σ estimate within about ±13 %. */
const MID_LUNG_HISTORIES = 300000;
const MID_LUNG_BATCHES = 30;

function load(): string {
  return `load average ${loadavg()
    .map((l) => l.toFixed(2))
    .join(' ')} on ${cpus().length} cores`;
}

/** Wall time (s) and relative 1σ of dose per MU at the first point of a run. */
function timed(
  threads: number,
  c: McCaseInput,
  options: McOptions,
): { seconds: number; cpuSeconds: number; rel: number; result: McResult } {
  const cpu0 = process.cpuUsage();
  const t0 = performance.now();
  const result = threadedMonteCarlo(threads)(c, options, [c.points[0]!.depthCm]);
  const seconds = (performance.now() - t0) / 1000;
  const cpu = process.cpuUsage(cpu0);
  const p = result.method.points[0];
  return {
    seconds,
    cpuSeconds: (cpu.user + cpu.system) / 1e6,
    rel: (p?.sigmaDosePerMuCGy ?? NaN) / (p?.dosePerMuCGy ?? NaN),
    result,
  };
}

export async function run(): Promise<BenchFigure[]> {
  const cores = defaultMonteCarloThreads();
  const scenario = {
    energy: '6MV' as const,
    ssdCm: 100,
    fieldXCm: 10,
    fieldYCm: 10,
    layers: [{ materialId: 'water' as const, thicknessCm: 30 }],
  };
  // Warm-up: tables, JIT, and the worker threads started (each seed differs, so no run reuses
  // another's calibration run).
  runBatch({ scenario, binning: DEFAULT_BINNING, seed: 1, batchIndex: 0, historiesPerBatch: 5000 });
  const lungOptions = (seed: number, histories = MID_LUNG_HISTORIES): McOptions => ({
    histories,
    seed,
    batches: MID_LUNG_BATCHES,
    referenceDMaxCm: modelledWaterData('18MV').dMaxCm,
  });
  timed(1, MID_LUNG_18MV, lungOptions(90, 3000));
  timed(Math.max(2, cores), MID_LUNG_18MV, lungOptions(91, 3000));

  const n = 100000;
  const t0 = performance.now();
  runBatch({ scenario, binning: DEFAULT_BINNING, seed: 2, batchIndex: 0, historiesPerBatch: n });
  const perCore = n / ((performance.now() - t0) / 1000);

  const loadBefore = load();
  const all = timed(cores, MID_LUNG_18MV, lungOptions(101));
  const one = timed(1, MID_LUNG_18MV, lungOptions(102));
  const meanRel2 = (all.rel ** 2 + one.rel ** 2) / 2;
  const toOnePercent = all.seconds * (meanRel2 / 0.01 ** 2);
  // CPU time of the one-thread run (the process's, so it holds under a shared machine's load).
  const cpuToOnePercent = one.cpuSeconds * (meanRel2 / 0.01 ** 2);
  const water = timed(2, WATER_6MV, { histories: 400000, seed: 3 });
  const loadAfter = load();
  await closeMonteCarloThreads();
  const pct = (r: number) => `${(100 * r).toFixed(2)} %`;
  return [
    {
      name: 'MC histories per second per core (6 MV, 10×10, water)',
      value: Math.round(perCore),
      unit: 'histories/s',
      note: loadBefore,
    },
    {
      name: 'MC case histories per second per core (18 MV 5×5 mid-lung case: case, water and calibration runs)',
      value: Math.round(MID_LUNG_HISTORIES / one.seconds),
      unit: 'histories/s',
      note: `${MID_LUNG_HISTORIES} histories on 1 thread in ${one.seconds.toFixed(1)} s; ${loadBefore}`,
    },
    {
      name: `MC time to 1 % (1σ) at mid-lung, 18 MV 5×5, 5 cm water + 10 cm lung, ${cores} cores`,
      value: Math.round(toOnePercent * 10) / 10,
      unit: 's',
      note: `${MID_LUNG_HISTORIES} histories on ${cores} threads in ${all.seconds.toFixed(1)} s, 1σ ${pct(all.rel)} (seed 101; ${pct(one.rel)} with seed 102); target ≤ 10 s on 2 cores; ${loadAfter}`,
    },
    {
      name: 'MC CPU time to 1 % (1σ) at mid-lung, one thread (CPU seconds; ÷ cores = idle-machine wall time)',
      value: Math.round(cpuToOnePercent * 10) / 10,
      unit: 's',
      note: `${MID_LUNG_HISTORIES} histories on 1 thread: ${one.cpuSeconds.toFixed(1)} CPU s in ${one.seconds.toFixed(1)} s wall; ${loadAfter}`,
    },
    {
      name: `MC thread scaling 1 → ${cores} threads (mid-lung case)`,
      value: Math.round((one.seconds / all.seconds) * 100) / 100,
      unit: '×',
      note: `${one.seconds.toFixed(1)} s on 1 thread, ${all.seconds.toFixed(1)} s on ${cores}; ${loadAfter}`,
    },
    {
      name: 'MC time to 1 % (1σ) at 10 cm, 6 MV 10×10 water, 2 cores',
      value: Math.round(water.seconds * (water.rel / 0.01) ** 2 * 10) / 10,
      unit: 's',
      note: `400000 histories on 2 threads in ${water.seconds.toFixed(1)} s: 1σ ${pct(water.rel)} (0.25 cm bins, incl. d_max calibration); target ≤ 30 s; ${loadAfter}`,
    },
  ];
}
