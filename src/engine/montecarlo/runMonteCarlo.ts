// Single-threaded Monte Carlo run of a case (CLI, tests, and the reference for the worker pool,
// which runs the same batch tasks in parallel and merges them identically).
import { BatchAccumulator } from './batchStatistics';
import { finalizeMonteCarlo, type McResult } from './monteCarloResult';
import { planMonteCarlo, type McCaseInput, type McOptions, type McPlan } from './monteCarloPlan';
import { runBatch, type BatchTask } from './runBatch';

/** A batch task tagged with the scenario it belongs to. */
export interface PlannedTask {
  scenarioIndex: number;
  task: BatchTask;
}

/** Every batch of every scenario, batch-major (so partial results cover all scenarios evenly). */
export function batchTasksOf(plan: McPlan): PlannedTask[] {
  const out: PlannedTask[] = [];
  for (let b = 0; b < plan.batches; b++) {
    plan.scenarios.forEach((scenario, scenarioIndex) => {
      const variance = plan.variance[scenarioIndex];
      out.push({
        scenarioIndex,
        task: {
          scenario,
          binning: plan.binning,
          seed: plan.seed,
          batchIndex: b,
          historiesPerBatch: plan.historiesPerBatch,
          ...(plan.options.transport ? { transport: plan.options.transport } : {}),
          ...(variance ? { variance } : {}),
        },
      });
    });
  }
  return out;
}

export function accumulatorsOf(plan: McPlan): BatchAccumulator[] {
  return plan.scenarios.map(() => new BatchAccumulator(plan.batches));
}

export function runMonteCarlo(
  c: McCaseInput,
  options: McOptions,
  depthGridCm: readonly number[],
  onBatch?: (done: number, total: number) => void,
): McResult {
  const plan = planMonteCarlo(c, options);
  const accumulators = accumulatorsOf(plan);
  const tasks = batchTasksOf(plan);
  tasks.forEach(({ scenarioIndex, task }, i) => {
    accumulators[scenarioIndex]!.add(runBatch(task));
    onBatch?.(i + 1, tasks.length);
  });
  return finalizeMonteCarlo(plan, accumulators, depthGridCm);
}
