// Merging batch tallies as they arrive and the batch estimate of the mean and its standard error
// (n ≥ 10 batches): s_x̄ = √[Σ(x_b − x̄)² / (n(n − 1))] with x_b the per-history mean of batch b;
// unknown (NaN) in a bin where fewer than two batches scored.
// Sums run in batch order, so the result does not depend on which worker finished first.
import type { BatchTally } from './runBatch';
import type { EnergyTally } from './transport';

export interface BinStatistics {
  /** Mean energy per history in each bin (MeV). */
  mean: Float64Array;
  /** Standard error of that mean (MeV); NaN where fewer than two batches scored. */
  sigma: Float64Array;
}

export class BatchAccumulator {
  private readonly tallies: (BatchTally | undefined)[];
  private count = 0;

  constructor(readonly batches: number) {
    this.tallies = new Array<BatchTally | undefined>(batches).fill(undefined);
  }

  /** Adds one batch (ignores a batch index seen before). */
  add(t: BatchTally): void {
    if (t.batchIndex < 0 || t.batchIndex >= this.batches)
      throw new RangeError(`batch ${t.batchIndex} out of range`);
    if (this.tallies[t.batchIndex]) return;
    this.tallies[t.batchIndex] = t;
    this.count++;
  }

  get completed(): number {
    return this.count;
  }

  get histories(): number {
    let n = 0;
    for (const t of this.tallies) if (t) n += t.histories;
    return n;
  }

  private done(): BatchTally[] {
    return this.tallies.filter((t): t is BatchTally => t !== undefined);
  }

  /** Mean and standard error per bin of the central-axis deposits. */
  caxStatistics(): BinStatistics {
    return statistics(this.done().map((t) => ({ values: t.caxMeV, histories: t.histories })));
  }

  /**
   * Mean and batch standard error of a linear combination Σ wᵢ·(deposit per history in bin i) of
   * the central-axis bins, taken batch by batch (so correlations between bins are counted).
   */
  caxLinearStatistics(weights: Float64Array): { mean: number; sigma: number } {
    const s = statistics(
      this.done().map((t) => {
        let sum = 0;
        for (let i = 0; i < weights.length; i++)
          sum += (weights[i] as number) * (t.caxMeV[i] as number);
        return { values: Float64Array.of(sum), histories: t.histories };
      }),
    );
    return { mean: s.mean[0] as number, sigma: s.sigma[0] as number };
  }

  /**
   * Mean and batch standard error of a·(deposit per history in bin i) + b·(same in bin j): a
   * reading between two bins, with their correlation counted. O(batches).
   */
  caxPairStatistics(i: number, a: number, j: number, b: number): { mean: number; sigma: number } {
    const s = statistics(
      this.done().map((t) => ({
        values: Float64Array.of(a * (t.caxMeV[i] as number) + b * (t.caxMeV[j] as number)),
        histories: t.histories,
      })),
    );
    return { mean: s.mean[0] as number, sigma: s.sigma[0] as number };
  }

  /** Mean per history of the lateral histogram (no uncertainty). */
  lateralMean(): Float64Array {
    const done = this.done();
    const first = done[0];
    if (!first) return new Float64Array(0);
    const out = new Float64Array(first.lateralMeV.length);
    let n = 0;
    for (const t of done) {
      n += t.histories;
      for (let i = 0; i < out.length; i++)
        out[i] = (out[i] as number) + (t.lateralMeV[i] as number);
    }
    for (let i = 0; i < out.length; i++) out[i] = (out[i] as number) / n;
    return out;
  }

  /** Summed energy book of the completed batches. */
  energy(): EnergyTally {
    const e: EnergyTally = {
      incidentMeV: 0,
      depositedMeV: 0,
      escapedMeV: 0,
      belowCutoffMeV: 0,
      weightNetMeV: 0,
    };
    for (const t of this.done()) {
      e.incidentMeV += t.energy.incidentMeV;
      e.depositedMeV += t.energy.depositedMeV;
      e.escapedMeV += t.energy.escapedMeV;
      e.belowCutoffMeV += t.energy.belowCutoffMeV;
      e.weightNetMeV += t.energy.weightNetMeV;
    }
    return e;
  }
}

/** History-weighted mean per bin and the batch standard error of it. */
export function statistics(batches: { values: Float64Array; histories: number }[]): BinStatistics {
  const nBins = batches[0]?.values.length ?? 0;
  const mean = new Float64Array(nBins);
  const sigma = new Float64Array(nBins);
  let total = 0;
  for (const b of batches) {
    total += b.histories;
    for (let i = 0; i < nBins; i++) mean[i] = (mean[i] as number) + (b.values[i] as number);
  }
  for (let i = 0; i < nBins; i++) mean[i] = total > 0 ? (mean[i] as number) / total : 0;
  for (let i = 0; i < nBins; i++) {
    // Fewer than two batches that scored in the bin: no spread to estimate σ from (a bin nobody
    // scored in would otherwise read 0 ± 0, as if exactly known).
    let scored = 0;
    for (const b of batches) if ((b.values[i] as number) !== 0) scored++;
    if (scored < 2) {
      sigma[i] = NaN;
      continue;
    }
    const n = batches.length;
    // Batches of unequal size: weight by histories (x̄ is the history-weighted mean).
    let ss = 0;
    for (const b of batches) {
      const d = (b.values[i] as number) / b.histories - (mean[i] as number);
      ss += b.histories * d * d;
    }
    sigma[i] = Math.sqrt(ss / (total * (n - 1)));
  }
  return { mean, sigma };
}
