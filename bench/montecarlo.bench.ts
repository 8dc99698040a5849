// Monte Carlo engine speed: histories per second per core (6 MV, 10 × 10 cm², SSD 100, 30 cm of
// water, the central-axis scoring used by the method), and the time to reach 1 % (1σ) at 10 cm
// depth on 2 cores, from the measured rate and the measured uncertainty (σ ∝ 1/√N, so
// t(1 %) = t_run · (σ_run / 1 %)² / cores; assumes linear scaling over workers, which the batch
// scheme allows: batches are independent and merge cost is negligible).
import { runMonteCarlo } from '../src/engine/montecarlo/runMonteCarlo';
import { runBatch } from '../src/engine/montecarlo/runBatch';
import { DEFAULT_BINNING } from '../src/engine/montecarlo/scenario';
import type { McCaseInput } from '../src/engine/montecarlo/monteCarloPlan';
import type { BenchFigure } from './lib/row';

export const repeats = 1;

const WATER_6MV: McCaseInput = {
  beam: { energy: '6MV', setup: { kind: 'SSD', ssdCm: 100 }, fieldXCm: 10, fieldYCm: 10 },
  layers: [{ materialId: 'water', thicknessCm: 30 }],
  points: [{ id: 'd10', depthCm: 10 }],
};

export function run(): Promise<BenchFigure[]> {
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

  const histories = 200000;
  const t1 = performance.now();
  const r = runMonteCarlo(WATER_6MV, { histories, seed: 3 }, [10]);
  const seconds = (performance.now() - t1) / 1000;
  const p = r.method.points[0];
  const rel = (p?.sigmaDosePerMuCGy ?? NaN) / (p?.dosePerMuCGy ?? NaN);
  const cores = 2;
  const toOnePercent = (seconds * (rel / 0.01) ** 2) / cores;
  return Promise.resolve([
    {
      name: 'MC histories per second per core (6 MV, 10×10, water)',
      value: Math.round(perCore),
      unit: 'histories/s',
    },
    {
      name: 'MC time to 1 % (1σ) at 10 cm, 6 MV 10×10 water, 2 cores',
      value: Math.round(toOnePercent * 10) / 10,
      unit: 's',
      note: `from ${histories} histories in ${seconds.toFixed(1)} s on one core: 1σ ${(100 * rel).toFixed(2)} % (0.25 cm bins, incl. d_max calibration); target ≤ 30 s`,
    },
  ]);
}
