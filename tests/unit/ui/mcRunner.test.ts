// The page's Monte Carlo run driver with in-process workers: the store follows the run (running,
// progress with the partial result, done with the final result tied to its case key), Cancel keeps
// what was merged, a newer run's store is never overwritten by an older one, and the MC curve is
// merged into the report only while the run is current and on the report's grid.
import { describe, expect, it } from 'vitest';
import type { McWorkerHandle } from '../../../src/compute/mcPool';
import { calculateCase } from '../../../src/compute/calculateCase';
import { monteCarloCalibration } from '../../../src/compute/monteCarloCalibration';
import { runBatch } from '../../../src/engine/montecarlo/runBatch';
import type { LaminaCase } from '../../../src/io/caseSchema';
import { CASE_FORMAT, CASE_VERSION } from '../../../src/io/caseSchema';
import { useMonteCarloStore, type MonteCarloState } from '../../../src/state/monteCarloStore';
import { cancelRun, startRun, useMcForm } from '../../../src/ui/montecarlo/mcRunner';
import { partialRunNote, withMonteCarloMethod } from '../../../src/ui/montecarlo/mergeMonteCarlo';
import { cfSeries, doseSeries } from '../../../src/ui/series';

const CASE: LaminaCase = {
  format: CASE_FORMAT,
  version: CASE_VERSION,
  name: 'lung slab',
  beam: { energy: '6MV', setup: { kind: 'SSD', ssdCm: 100 }, fieldXCm: 10, fieldYCm: 10 },
  layers: [
    { materialId: 'water', thicknessCm: 3 },
    { materialId: 'lung', thicknessCm: 4 },
    { materialId: 'water', thicknessCm: 3 },
  ],
  points: [{ id: 'P', depthCm: 8 }],
};
const REPORT = calculateCase(CASE, { methods: ['water', 'pencil-beam'] });

/** In-process worker answering after `delayMs` (a macrotask, like a real worker). */
function localWorker(delayMs = 0): McWorkerHandle {
  return {
    runBatch: (task) =>
      new Promise((resolve) => setTimeout(() => resolve(runBatch(task)), delayMs)),
    dispose: () => {},
  };
}

function whenStatus(ok: (s: MonteCarloState) => boolean): Promise<MonteCarloState> {
  return new Promise((resolve) => {
    if (ok(useMonteCarloStore.getState())) return resolve(useMonteCarloStore.getState());
    const stop = useMonteCarloStore.subscribe((s) => {
      if (!ok(s)) return;
      stop();
      resolve(s);
    });
  });
}

const request = (caseKey: string, histories: number, delayMs = 0) => ({
  caseData: CASE,
  caseKey,
  histories,
  seed: 7,
  doseToWater: false,
  waterSource: 'modelled',
  depthGridCm: REPORT.depthCm,
  pool: { workers: 2, createWorker: () => localWorker(delayMs) },
  calibrate: (c: LaminaCase, source?: string) => Promise.resolve(monteCarloCalibration(c, source)),
});

describe('startRun / cancelRun', () => {
  it('startRun(...) drives the store from running to done with the result on the report grid', async () => {
    const seen: MonteCarloState[] = [];
    const stop = useMonteCarloStore.subscribe((s) => seen.push(s));
    startRun(request('key-1', 2000));
    expect(useMonteCarloStore.getState().status).toBe('running');
    expect(useMonteCarloStore.getState().caseKey).toBe('key-1');
    const end = await whenStatus((s) => s.status !== 'running');
    stop();
    expect(end.status).toBe('done');
    expect(end.caseKey).toBe('key-1');
    expect(end.error).toBeNull();
    expect(end.result?.method.curve.depthCm).toEqual(REPORT.depthCm);
    expect(end.result?.method.curve.sigmaCf).toHaveLength(REPORT.depthCm.length);
    expect(end.progress?.tasksDone).toBe(end.progress?.totalTasks);
    // Partial results arrived while running (the live curve).
    expect(seen.some((s) => s.status === 'running' && s.result !== null)).toBe(true);
    const run = useMcForm.getState().run;
    // Modelled beam: 1 cGy/MU reference and S_c(10 × 10) = 1 by definition of the normalisation.
    expect(run?.calibration.referenceDosePerMuCGy).toBe(1);
    expect(run?.calibration.collimatorScatterFactor).toBe(1);
  });

  it('cancelRun() mid-way keeps the merged estimate and reports fewer histories than planned', async () => {
    startRun(request('key-2', 50_000, 2));
    const withEstimate = await whenStatus((s) => s.result !== null);
    expect(withEstimate.status).toBe('running');
    cancelRun();
    expect(useMonteCarloStore.getState().status).toBe('cancelled');
    // The done promise settles after the workers are dropped: the status stays "cancelled".
    await new Promise((r) => setTimeout(r, 30));
    const s = useMonteCarloStore.getState();
    expect(s.status).toBe('cancelled');
    expect(s.result).not.toBeNull();
    expect(s.result!.histories).toBeLessThan(50_000);
    expect(s.caseKey).toBe('key-2');
  });

  it('a second start replaces the first: the older run never writes into the store again', async () => {
    startRun(request('old', 50_000, 2));
    startRun(request('new', 2000));
    const end = await whenStatus((s) => s.status !== 'running');
    expect(end.caseKey).toBe('new');
    expect(end.status).toBe('done');
    const histories = end.result!.histories;
    await new Promise((r) => setTimeout(r, 30));
    expect(useMonteCarloStore.getState().caseKey).toBe('new');
    expect(useMonteCarloStore.getState().result!.histories).toBe(histories);
  });
});

describe('withMonteCarloMethod', () => {
  it('adds the MC method to the report only while the run is current and on the same grid', async () => {
    startRun(request('merge', 2000));
    const { result } = await whenStatus((s) => s.status === 'done');
    const mc = result!.method;
    const merged = withMonteCarloMethod(REPORT, mc, true);
    expect(merged.methods.map((m) => m.id)).toEqual(['water', 'pencil-beam', 'monte-carlo']);
    expect(withMonteCarloMethod(merged, mc, true).methods).toHaveLength(3);
    // The CF and dose views draw a ±1σ band for the MC curve only.
    const cf = cfSeries(merged, []);
    expect(cf.find((c) => c.id === 'monte-carlo')?.sigma).toEqual(mc.curve.sigmaCf);
    expect(cf.find((c) => c.id === 'water')?.sigma).toBeUndefined();
    const dose = doseSeries(merged, [], 'dosePerMu');
    expect(dose.ok && dose.series.find((c) => c.id === 'monte-carlo')?.sigma).toEqual(
      mc.curve.sigmaDosePerMuCGy,
    );
    expect(withMonteCarloMethod(REPORT, mc, false)).toBe(REPORT);
    expect(withMonteCarloMethod(REPORT, null, true)).toBe(REPORT);
    expect(withMonteCarloMethod(null, mc, true)).toBeNull();
    const otherGrid = { ...REPORT, depthCm: REPORT.depthCm.map((d) => d * 1.1) };
    expect(withMonteCarloMethod(otherGrid, mc, true)).toBe(otherGrid);
    const running = withMonteCarloMethod(REPORT, mc, true, partialRunNote('running'));
    expect(running.methods.at(-1)?.label).toBe('Monte Carlo (running, partial)');
    expect(partialRunNote('cancelled')).toBe('cancelled, partial');
    expect(partialRunNote('done')).toBeNull();
    const otherPoints = { ...REPORT, points: [] };
    expect(withMonteCarloMethod(otherPoints, mc, true)).toBe(otherPoints);
  });
});
