// A water point (energy-deposition) kernel as a table: the fraction of the energy released at a
// point that is deposited in each spherical-shell × polar-cone bin, primary and scatter kept
// apart. Radial bins are in radiological distance (cm of water); polar bins are equal in angle
// over 0–180° from the incident photon direction; index = polar · nRadial + radial.

export interface PointKernelTable {
  /** What the kernel is for: "2 MeV" or a beam energy such as "6MV". */
  label: string;
  /** Outer edges of the radial bins (cm); the first bin starts at 0. */
  radialEdgesCm: Float64Array;
  polarBins: number;
  /** Energy fraction deposited by the first-generation charged particles, per bin. */
  primary: Float64Array;
  /** Energy fraction deposited by everything else (scattered photons, bremsstrahlung, annihilation). */
  scatter: Float64Array;
  /** Energy fraction that left the kernel's sphere. */
  escapedFraction: number;
}

export type KernelComponent = 'total' | 'primary' | 'scatter';

/** Energy fraction per bin of one component (a new array). */
export function kernelBins(table: PointKernelTable, component: KernelComponent): Float64Array {
  if (component === 'primary') return Float64Array.from(table.primary);
  if (component === 'scatter') return Float64Array.from(table.scatter);
  const out = new Float64Array(table.primary.length);
  for (let i = 0; i < out.length; i++)
    out[i] = (table.primary[i] as number) + (table.scatter[i] as number);
  return out;
}

/** Energy fraction deposited inside the kernel's sphere (primary + scatter, all bins). */
export function depositedFraction(table: PointKernelTable): number {
  let sum = 0;
  for (let i = 0; i < table.primary.length; i++)
    sum += (table.primary[i] as number) + (table.scatter[i] as number);
  return sum;
}

/** Solid angle (sr) of polar bin j of n equal-angle bins: 2π(cos θ_j − cos θ_{j+1}). */
export function polarBinSolidAngleSr(j: number, n: number): number {
  return 2 * Math.PI * (Math.cos((j * Math.PI) / n) - Math.cos(((j + 1) * Math.PI) / n));
}

/** Throws if the table's arrays do not match its bin counts or hold negative fractions. */
export function assertKernelTable(table: PointKernelTable): void {
  const nR = table.radialEdgesCm.length;
  const size = nR * table.polarBins;
  if (table.primary.length !== size || table.scatter.length !== size)
    throw new RangeError(`kernel ${table.label}: expected ${size} bins per component`);
  for (let i = 1; i < nR; i++)
    if (!((table.radialEdgesCm[i] as number) > (table.radialEdgesCm[i - 1] as number)))
      throw new RangeError(`kernel ${table.label}: radial edges must ascend`);
  for (let i = 0; i < size; i++)
    if ((table.primary[i] as number) < 0 || (table.scatter[i] as number) < 0)
      throw new RangeError(`kernel ${table.label}: negative energy fraction in bin ${i}`);
}
