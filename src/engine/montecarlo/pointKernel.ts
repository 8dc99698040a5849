// Point (energy-deposition) kernels of water by Monte Carlo: the first interaction of a photon of
// one energy is forced at the centre of a water sphere, the photon travelling along +z; the energy
// deposited is binned in spherical shells × polar cones, split into primary (charged particles
// set in motion at that first interaction) and scatter (everything else: scattered photons,
// bremsstrahlung, annihilation photons). Normalised to the incident photon energy per history.
import { Rng } from './rng';
import { sphereGeometry } from './geometry';
import { Transport, type McScorer, type TransportOptions } from './transport';

export interface PointKernelOptions {
  energyMeV: number;
  histories: number;
  seed: number;
  /** Ascending outer bin edges in water (first bin starts at 0), cm. */
  radialEdgesCm: number[];
  /** Equal-angle bins over 0–180° from the incident direction. */
  polarBins: number;
  /** Transport settings; defaults to electron cutoff 0.189 MeV and steps ≤ min(0.1 cm, first edge). */
  transport?: TransportOptions;
}

export interface PointKernelResult {
  energyMeV: number;
  histories: number;
  seed: number;
  radialEdgesCm: number[];
  polarBins: number;
  /** Fraction of the incident photon energy deposited per bin, index = polar * nRadial + radial. */
  primary: Float64Array;
  /** Everything else (scattered photons, bremsstrahlung, annihilation). */
  scatter: Float64Array;
  /** Energy leaving the water sphere of radius = last edge. */
  escapedFraction: number;
}

/** Index of the radial bin holding r: first i with r ≤ edges[i] (clamped to the last bin). */
export function radialBinIndex(edgesCm: readonly number[], rCm: number): number {
  let lo = 0;
  let hi = edgesCm.length - 1;
  if (rCm >= (edgesCm[hi] as number)) return hi;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (rCm <= (edgesCm[mid] as number)) hi = mid;
    else lo = mid + 1;
  }
  return lo;
}

function validate(opts: PointKernelOptions): void {
  const e = opts.radialEdgesCm;
  if (!(opts.energyMeV > 0 && opts.energyMeV <= 20))
    throw new RangeError('energyMeV: must be in (0, 20]');
  if (!Number.isInteger(opts.histories) || opts.histories < 1)
    throw new RangeError('histories: must be a positive integer');
  if (!Number.isInteger(opts.polarBins) || opts.polarBins < 1)
    throw new RangeError('polarBins: must be a positive integer');
  if (e.length === 0 || !(e[0]! > 0))
    throw new RangeError('radialEdgesCm: need at least one edge > 0');
  for (let i = 1; i < e.length; i++)
    if (!(e[i]! > e[i - 1]!)) throw new RangeError('radialEdgesCm: must be strictly ascending');
}

/** Simulates a water point kernel at one photon energy (deterministic for a given seed). */
export function simulatePointKernel(opts: PointKernelOptions): PointKernelResult {
  validate(opts);
  const edges = opts.radialEdgesCm;
  const nRadial = edges.length;
  const nPolar = opts.polarBins;
  const primary = new Float64Array(nRadial * nPolar);
  const scatter = new Float64Array(nRadial * nPolar);
  const radiusCm = edges[nRadial - 1] as number;
  const polarScale = nPolar / Math.PI;
  const scorer: McScorer = {
    deposit(x, y, z, _region, energyMeV, isPrimary) {
      const rho = Math.sqrt(x * x + y * y);
      const r = Math.sqrt(rho * rho + z * z);
      const ir = radialBinIndex(edges, r);
      const ip = Math.min(nPolar - 1, Math.floor(Math.atan2(rho, z) * polarScale));
      const bins = isPrimary ? primary : scatter;
      const k = ip * nRadial + ir;
      bins[k] = (bins[k] as number) + energyMeV;
    },
  };
  const transport = new Transport(
    sphereGeometry(radiusCm, { materialId: 'water', densityGPerCm3: 1 }),
    scorer,
    {
      // Water at 1 g/cm³: the mass-thickness limit equals the step length in cm.
      maxStepGPerCm2: Math.max(0.01, Math.min(0.1, edges[0] as number)),
      ...opts.transport,
    },
  );
  const rng = new Rng(opts.seed, 0);
  for (let h = 0; h < opts.histories; h++) {
    rng.seedHistory(opts.seed, h);
    transport.runForcedInteraction(opts.energyMeV, 0, 0, 0, 0, 0, 1, 0, rng);
  }
  const norm = 1 / (opts.energyMeV * opts.histories);
  for (let i = 0; i < primary.length; i++) {
    primary[i] = (primary[i] as number) * norm;
    scatter[i] = (scatter[i] as number) * norm;
  }
  return {
    energyMeV: opts.energyMeV,
    histories: opts.histories,
    seed: opts.seed,
    radialEdgesCm: [...edges],
    polarBins: nPolar,
    primary,
    scatter,
    escapedFraction: transport.tally.escapedMeV * norm,
  };
}
