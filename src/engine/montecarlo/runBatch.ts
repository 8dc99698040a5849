// One batch of histories of one scenario: the unit of work handed to a worker. History h of batch
// b uses the stream seeded by (runSeed, b·historiesPerBatch + h), so a batch gives the same tally
// whichever worker runs it, and scenarios run with the same seed are correlated (same photons).
import { makeSlabPhantom } from '../phantom/slabPhantom';
import { slabGeometry } from './geometry';
import { Transport, type EnergyTally, type TransportOptions } from './transport';
import { DepthDoseScorer } from './depthDoseScorer';
import { makeSpectrumSampler } from './spectrumSampler';
import { launchContaminantElectrons, pencilRay, type SourceRay } from './beamSource';
import { contaminantSourceOf } from './contaminantSource';
import { Rng } from './rng';
import { scoringGrid, type McBinning, type McScenario } from './scenario';
import { ChargedRoulette } from './chargedRoulette';
import { ForcedRay } from './forcedInteraction';
import type { VarianceReduction } from './importanceZones';

export interface BatchTask {
  scenario: McScenario;
  binning: McBinning;
  seed: number;
  batchIndex: number;
  historiesPerBatch: number;
  transport?: TransportOptions;
  /** Variance reduction (importanceZones.ts); analogue transport without it. */
  variance?: VarianceReduction;
}

export interface BatchTally {
  batchIndex: number;
  histories: number;
  caxMeV: Float64Array;
  lateralMeV: Float64Array;
  energy: EnergyTally;
  elapsedMs: number;
}

export function runBatch(task: BatchTask): BatchTally {
  const started = Date.now();
  const grid = scoringGrid(task.scenario, task.binning);
  const scorer = new DepthDoseScorer(grid);
  const phantom = makeSlabPhantom(task.scenario.layers);
  const transport = new Transport(
    slabGeometry(phantom),
    scorer,
    task.transport,
    task.variance ? new ChargedRoulette(phantom, task.variance) : undefined,
  );
  const spectrum = makeSpectrumSampler(task.scenario.energy);
  const electrons = contaminantSourceOf(task.scenario);
  const rng = new Rng(task.seed, 0);
  const ray: SourceRay = { x: 0, y: 0, u: 0, v: 0, w: 1 };
  pencilRay(ray);
  const forced = task.variance?.forcedCm.length
    ? new ForcedRay(
        transport.geometry,
        ray.x,
        ray.y,
        0,
        ray.u,
        ray.v,
        ray.w,
        0,
        task.variance.forcedCm,
      )
    : undefined;
  const first = task.batchIndex * task.historiesPerBatch;
  for (let h = 0; h < task.historiesPerBatch; h++) {
    rng.seedHistory(task.seed, first + h);
    const e = spectrum.sample(rng);
    if (forced) forced.run(transport, e, rng);
    else transport.runPhoton(e, ray.x, ray.y, 0, ray.u, ray.v, ray.w, 0, rng);
    if (electrons) launchContaminantElectrons(electrons, transport, rng);
  }
  return {
    batchIndex: task.batchIndex,
    histories: task.historiesPerBatch,
    caxMeV: scorer.caxMeV,
    lateralMeV: scorer.lateralMeV,
    energy: { ...transport.tally },
    elapsedMs: Date.now() - started,
  };
}
