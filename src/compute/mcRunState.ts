// Scheduling and merging of a Monte Carlo run, independent of who runs the batches: hands out
// batch tasks, merges tallies as they arrive (in any order) and reports progress with the
// current estimate and its uncertainty. Pure; the worker pool and the tests drive it.
import {
  planMonteCarlo,
  type McCaseInput,
  type McOptions,
  type McPlan,
} from '../engine/montecarlo/monteCarloPlan';
import { accumulatorsOf, batchTasksOf, type PlannedTask } from '../engine/montecarlo/runMonteCarlo';
import { finalizeMonteCarlo, type McResult } from '../engine/montecarlo/monteCarloResult';
import type { BatchAccumulator } from '../engine/montecarlo/batchStatistics';
import type { BatchTally } from '../engine/montecarlo/runBatch';

export interface McProgress {
  /** Histories finished in the case scenario, and the total planned. */
  histories: number;
  totalHistories: number;
  tasksDone: number;
  totalTasks: number;
  elapsedMs: number;
  /** Current estimate at the points of interest (null until every scenario has two batches). */
  points: {
    id: string;
    dosePerMuCGy: number | null;
    sigmaDosePerMuCGy: number;
    relativeSigma: number | null;
  }[];
  /** Current full result for a live curve with its band (null until two batches per scenario). */
  partial: McResult | null;
}

/**
 * Calibration runs (water, 10 × 10, SSD 100) already completed in this session, by energy, seed,
 * histories and binning. A run is deterministic, so reusing one gives exactly what re-running
 * it would; a heterogeneous case then simulates two scenarios instead of three.
 */
const referenceCache = new Map<string, BatchAccumulator>();

function referenceKey(plan: McPlan): string {
  const s = plan.scenarios[plan.roles.reference];
  return JSON.stringify([
    s,
    plan.seed,
    plan.batches,
    plan.historiesPerBatch,
    plan.binning,
    plan.options.transport ?? null,
    plan.variance[plan.roles.reference] ?? null,
  ]);
}

export class McRunState {
  readonly plan: McPlan;
  private readonly tasks: PlannedTask[];
  private readonly accumulators: BatchAccumulator[];
  private nextIndex = 0;
  private doneCount = 0;
  private readonly startedMs: number;

  constructor(
    c: McCaseInput,
    options: McOptions,
    private readonly depthGridCm: readonly number[],
    private readonly now: () => number = () => Date.now(),
  ) {
    this.plan = planMonteCarlo(c, options);
    this.accumulators = accumulatorsOf(this.plan);
    const { roles } = this.plan;
    const ownReference = roles.reference !== roles.case && roles.reference !== roles.water;
    const cached = ownReference ? referenceCache.get(referenceKey(this.plan)) : undefined;
    if (cached) this.accumulators[roles.reference] = cached;
    this.tasks = batchTasksOf(this.plan).filter(
      (t) => !cached || t.scenarioIndex !== roles.reference,
    );
    this.startedMs = now();
  }

  /** The next task to hand to a free worker, or undefined when all are handed out. */
  nextTask(): PlannedTask | undefined {
    return this.tasks[this.nextIndex++];
  }

  accept(scenarioIndex: number, tally: BatchTally): void {
    const acc = this.accumulators[scenarioIndex];
    if (!acc) throw new RangeError(`no scenario ${scenarioIndex}`);
    acc.add(tally);
    this.doneCount++;
    if (scenarioIndex === this.plan.roles.reference && acc.completed === this.plan.batches)
      referenceCache.set(referenceKey(this.plan), acc);
  }

  get finished(): boolean {
    return this.doneCount >= this.tasks.length;
  }

  /** Enough batches in every scenario for a result with an uncertainty. */
  get hasEstimate(): boolean {
    return this.accumulators.every((a) => a.completed >= 2);
  }

  result(): McResult {
    return finalizeMonteCarlo(this.plan, this.accumulators, this.depthGridCm);
  }

  progress(withPartial = true): McProgress {
    const partial = this.hasEstimate && withPartial ? this.result() : null;
    const caseAcc = this.accumulators[this.plan.roles.case] as BatchAccumulator;
    return {
      histories: caseAcc.histories,
      totalHistories: this.plan.batches * this.plan.historiesPerBatch,
      tasksDone: this.doneCount,
      totalTasks: this.tasks.length,
      elapsedMs: this.now() - this.startedMs,
      points: this.plan.points.map((p, i) => {
        const mp = partial?.method.points[i];
        const dose = mp?.dosePerMuCGy ?? null;
        const sigma = mp?.sigmaDosePerMuCGy ?? 0;
        return {
          id: p.id,
          dosePerMuCGy: dose,
          sigmaDosePerMuCGy: sigma,
          relativeSigma: dose ? sigma / dose : null,
        };
      }),
      partial,
    };
  }
}
