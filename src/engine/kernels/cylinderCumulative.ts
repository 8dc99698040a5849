// Cylinder-cumulative form of a point kernel: Q(ζ, S) = fraction of the energy released at the
// origin that is deposited at axial offsets below ζ (along the beam, radiological cm) and within
// a lateral radius S (radiological cm). Every slab integral of the kernel the superposition and
// pencil-beam engines need follows from it: a slab of sources between two axial offsets over a
// disc gives Q(ζ₂, S) − Q(ζ₁, S), and rectangles follow by an azimuthal quadrature (quadrant.ts).
//
// Within a polar bin the energy is spread uniformly over solid angle and, within a radial bin,
// uniformly in r (so the cumulative energy along a ray is piecewise linear in r).
import { bracketIndex } from '../units';
import { makeSinhGrid, type SinhGrid } from './sinhGrid';
import {
  kernelBins,
  polarBinSolidAngleSr,
  type KernelComponent,
  type PointKernelTable,
} from './pointKernelTable';

export interface CylinderCumulative {
  /** Axial offsets ζ (cm), mirrored about 0. */
  zeta: SinhGrid;
  /** Lateral radii S (cm) from 0. */
  radius: SinhGrid;
  /** Q at the nodes, index = iζ · nRadius + iS. */
  values: Float64Array;
  /** Energy fraction inside the kernel's extent for this component (Q at +∞, ∞). */
  totalFraction: number;
}

export interface CylinderGridOptions {
  extentCm?: number;
  zetaSteps?: number;
  radiusSteps?: number;
  /** Angular sub-samples per polar bin. */
  polarSubsamples?: number;
}

/** Builds Q(ζ, S) on sinh grids (defaults: ±60 cm with 60 steps a side, 0–60 cm with 56 steps). */
export function cylinderCumulative(
  table: PointKernelTable,
  component: KernelComponent,
  options: CylinderGridOptions = {},
): CylinderCumulative {
  const extent = options.extentCm ?? 60;
  const zeta = makeSinhGrid(extent, options.zetaSteps ?? 60, 6, true);
  const radius = makeSinhGrid(extent, options.radiusSteps ?? 56, 5);
  const sub = options.polarSubsamples ?? 8;
  const bins = kernelBins(table, component);
  const edges = table.radialEdgesCm;
  const nR = edges.length;
  const nPolar = table.polarBins;
  // Radial nodes with r = 0 prepended, and cumulative energy per polar bin at those nodes.
  const rNodes = new Float64Array(nR + 1);
  rNodes.set(edges, 1);
  const cumulative = new Float64Array(nPolar * (nR + 1));
  let totalFraction = 0;
  for (let j = 0; j < nPolar; j++) {
    let c = 0;
    for (let i = 0; i < nR; i++) {
      c += bins[j * nR + i] as number;
      cumulative[j * (nR + 1) + i + 1] = c;
    }
    totalFraction += c;
  }
  const rMax = rNodes[nR] as number;
  const nZ = zeta.nodes.length;
  const nS = radius.nodes.length;
  const values = new Float64Array(nZ * nS);
  const energyWithin = (j: number, r: number): number => {
    const base = j * (nR + 1);
    if (r >= rMax) return cumulative[base + nR] as number;
    if (r <= 0) return 0;
    const i = bracketIndex(rNodes, r);
    const r0 = rNodes[i] as number;
    const c0 = cumulative[base + i] as number;
    const c1 = cumulative[base + i + 1] as number;
    return c0 + ((c1 - c0) * (r - r0)) / ((rNodes[i + 1] as number) - r0);
  };
  for (let j = 0; j < nPolar; j++) {
    const binSr = polarBinSolidAngleSr(j, nPolar);
    if (binSr <= 0) continue;
    for (let m = 0; m < sub; m++) {
      const thetaA = ((j + m / sub) * Math.PI) / nPolar;
      const thetaB = ((j + (m + 1) / sub) * Math.PI) / nPolar;
      const weight = (2 * Math.PI * (Math.cos(thetaA) - Math.cos(thetaB))) / binSr;
      const theta = 0.5 * (thetaA + thetaB);
      const sinT = Math.sin(theta);
      const cosT = Math.cos(theta);
      for (let iz = 0; iz < nZ; iz++) {
        const z0 = zeta.nodes[iz] as number;
        // Along this ray the points with axial offset < ζ0 are r ∈ [rIn, rAxial).
        let rIn = 0;
        let rAxial = Infinity;
        if (cosT > 1e-12) rAxial = z0 > 0 ? z0 / cosT : 0;
        else if (cosT < -1e-12 && z0 < 0) rIn = z0 / cosT;
        else if (Math.abs(cosT) <= 1e-12 && z0 <= 0) rAxial = 0;
        if (rAxial <= rIn) continue;
        const eIn = energyWithin(j, rIn);
        const row = iz * nS;
        for (let is = 1; is < nS; is++) {
          const rLateral = sinT > 1e-12 ? (radius.nodes[is] as number) / sinT : Infinity;
          const rOut = Math.min(rAxial, rLateral);
          if (rOut > rIn)
            values[row + is] =
              (values[row + is] as number) + weight * (energyWithin(j, rOut) - eIn);
        }
      }
    }
  }
  return { zeta, radius, values, totalFraction };
}

/** Q(ζ, S) by bilinear interpolation on the grid (clamped at the grid's ends). */
export function cylinderAt(q: CylinderCumulative, zetaCm: number, radiusCm: number): number {
  const nS = q.radius.nodes.length;
  const pz = q.zeta.position(zetaCm);
  const ps = q.radius.position(radiusCm);
  const iz = Math.min(Math.floor(pz), q.zeta.nodes.length - 2);
  const is = Math.min(Math.floor(ps), nS - 2);
  const tz = pz - iz;
  const ts = ps - is;
  const v = q.values;
  const a = iz * nS + is;
  const b = a + nS;
  return (
    (1 - tz) * ((1 - ts) * (v[a] as number) + ts * (v[a + 1] as number)) +
    tz * ((1 - ts) * (v[b] as number) + ts * (v[b + 1] as number))
  );
}
