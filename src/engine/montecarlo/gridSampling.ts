// Sampling binned Monte Carlo depth data on an arbitrary depth grid: linear between bin centres
// inside one layer, the bin's own value (a step) where the neighbouring centre lies across an
// interface or beyond the ends, so no dose is smeared across a density change.
import { layerIndexAtDepth, type SlabPhantom } from '../phantom/slabPhantom';

/** Index of the bin holding a depth; a depth on a bin edge belongs to the upstream bin. */
export function binOfDepth(depthCm: number, binCm: number, nBins: number): number {
  const i = Math.ceil(depthCm / binCm - 1e-9) - 1;
  return Math.min(nBins - 1, Math.max(0, i));
}

/** Values (and their 1σ) at each depth; `values`, `sigma` are per bin of width `binCm`. */
export function sampleBinsAtDepths(
  phantom: SlabPhantom,
  binCm: number,
  values: readonly number[],
  sigma: readonly number[],
  depthsCm: readonly number[],
): { value: number[]; sigma: number[] } {
  const n = values.length;
  const centre = (i: number): number => (i + 0.5) * binCm;
  const layerAt = (d: number): number =>
    layerIndexAtDepth(phantom, Math.min(Math.max(d, 0), phantom.totalThicknessCm));
  const outV: number[] = [];
  const outS: number[] = [];
  for (const d of depthsCm) {
    const i = binOfDepth(d, binCm, n);
    const j = d < centre(i) ? i - 1 : i + 1;
    const layer = layerAt(d);
    if (j >= 0 && j < n && layerAt(centre(i)) === layer && layerAt(centre(j)) === layer) {
      const t = Math.abs(d - centre(i)) / binCm;
      outV.push((values[i] as number) * (1 - t) + (values[j] as number) * t);
      outS.push((sigma[i] as number) * (1 - t) + (sigma[j] as number) * t);
    } else {
      outV.push(values[i] as number);
      outS.push(sigma[i] as number);
    }
  }
  return { value: outV, sigma: outS };
}
