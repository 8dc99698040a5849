// A Monte Carlo scenario (what is simulated) and its scoring grid, both plain serialisable data
// so that worker threads can receive them.
import type { BeamEnergy } from '../beam/energies';
import { fieldAtDepthCm } from '../beam/geometry';
import type { LayerSpec } from '../phantom/slabPhantom';

export interface McScenario {
  layers: LayerSpec[];
  energy: BeamEnergy;
  ssdCm: number;
  /** Field sides at 100 cm from the source (cm). */
  fieldXCm: number;
  fieldYCm: number;
  /** Parallel beam (no divergence, field sides as given at every depth); for validation. */
  parallel?: boolean;
}

export interface McBinning {
  /** Nominal depth-bin width (cm); adjusted so the bins tile the phantom exactly. */
  depthBinCm: number;
  /** Lateral bin of the deposit histogram used for planes and profiles (cm). */
  lateralBinCm: number;
  /** Lateral margin of the histogram beyond the widest half-field (cm). */
  lateralMarginCm: number;
}

export const DEFAULT_BINNING: McBinning = {
  depthBinCm: 0.25,
  lateralBinCm: 0.25,
  lateralMarginCm: 5,
};

/** The scoring grid of a scenario. */
export interface ScoringGrid {
  nDepth: number;
  depthBinCm: number;
  /** Half-widths of the field projected to each bin centre (cm). */
  halfXCm: Float64Array;
  halfYCm: Float64Array;
  nLateral: number;
  lateralBinCm: number;
  /** Left edge of the lateral histogram (cm, negative). */
  lateralStartCm: number;
}

export function scoringGrid(s: McScenario, binning: McBinning): ScoringGrid {
  const total = s.layers.reduce((sum, l) => sum + l.thicknessCm, 0);
  const nDepth = Math.max(1, Math.ceil(total / binning.depthBinCm - 1e-9));
  const dz = total / nDepth;
  const halfXCm = new Float64Array(nDepth);
  const halfYCm = new Float64Array(nDepth);
  for (let i = 0; i < nDepth; i++) {
    const zc = (i + 0.5) * dz;
    halfXCm[i] = (s.parallel ? s.fieldXCm : fieldAtDepthCm(s.fieldXCm, s.ssdCm, zc)) / 2;
    halfYCm[i] = (s.parallel ? s.fieldYCm : fieldAtDepthCm(s.fieldYCm, s.ssdCm, zc)) / 2;
  }
  const halfMax = (halfXCm[nDepth - 1] as number) + binning.lateralMarginCm;
  const nLateral = 2 * Math.ceil(halfMax / binning.lateralBinCm);
  return {
    nDepth,
    depthBinCm: dz,
    halfXCm,
    halfYCm,
    nLateral,
    lateralBinCm: binning.lateralBinCm,
    lateralStartCm: -(nLateral / 2) * binning.lateralBinCm,
  };
}
