// Sampling binned Monte Carlo depth data on an arbitrary depth grid: linear between bin centres
// inside one layer, the bin's own value (a step) where the neighbouring centre lies across an
// interface or beyond the ends, so no dose is smeared across a density change.
import { layerIndexAtDepth, type SlabPhantom } from '../phantom/slabPhantom';

/** Index of the bin holding a depth; a depth on a bin edge belongs to the upstream bin. */
export function binOfDepth(depthCm: number, binCm: number, nBins: number): number {
  const i = Math.ceil(depthCm / binCm - 1e-9) - 1;
  return Math.min(nBins - 1, Math.max(0, i));
}

/**
 * How a depth is read from the bins: value = (1 − t)·bin i + t·bin j, linear between bin centres
 * inside one layer; j = −1 (bin i alone) where the neighbouring centre lies across an interface or
 * beyond the ends.
 */
export interface BinReading {
  i: number;
  j: number;
  t: number;
}

export function binReadings(
  phantom: SlabPhantom,
  binCm: number,
  nBins: number,
  depthsCm: readonly number[],
): BinReading[] {
  const centre = (i: number): number => (i + 0.5) * binCm;
  const layerAt = (d: number): number =>
    layerIndexAtDepth(phantom, Math.min(Math.max(d, 0), phantom.totalThicknessCm));
  return depthsCm.map((d) => {
    const i = binOfDepth(d, binCm, nBins);
    const j = d < centre(i) ? i - 1 : i + 1;
    const layer = layerAt(d);
    if (j >= 0 && j < nBins && layerAt(centre(i)) === layer && layerAt(centre(j)) === layer)
      return { i, j, t: Math.abs(d - centre(i)) / binCm };
    return { i, j: -1, t: 0 };
  });
}

/**
 * Values (and their 1σ) at each depth; `values`, `sigma` are per bin of width `binCm`. The σ is
 * interpolated like the value, which assumes neighbouring bins fully correlated (an upper bound);
 * where the batches are at hand, readingStatistics() gives the batch σ of the reading itself.
 */
export function sampleBinsAtDepths(
  phantom: SlabPhantom,
  binCm: number,
  values: readonly number[],
  sigma: readonly number[],
  depthsCm: readonly number[],
): { value: number[]; sigma: number[] } {
  const readings = binReadings(phantom, binCm, values.length, depthsCm);
  const at = (a: readonly number[], r: BinReading): number =>
    r.j < 0 ? (a[r.i] as number) : (a[r.i] as number) * (1 - r.t) + (a[r.j] as number) * r.t;
  return { value: readings.map((r) => at(values, r)), sigma: readings.map((r) => at(sigma, r)) };
}
