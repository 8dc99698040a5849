// Pencil-beam kernel of a beam in water, derived from its point kernel: the dose at depth d and
// lateral radius s from an infinitesimally narrow beam, stored as the radial cumulative
// P(d, S) = ∫₀^S p(d, s)·2πs ds (Q: cylinder-cumulative point kernel, T_w: water TERMA of a
// parallel beam per energy bin, source cells [a, b]).
// The kernel is divergent for the reference SSD f (100 cm), as kernels derived from SSD-100 water
// data are (Ahnesjö, Saxner & Trepp, Med. Phys. 19, 263 (1992), from memory): with lateral
// coordinates measured in the plane of the dose depth d, a source plane at z′ is seen shrunk by
// k = (f + z′)/(f + d), so its contribution within S is Q(·, k·S), and its TERMA carries the
// inverse-square factor w_IS = ((f + d)/(f + z′))² relative to the dose depth. At SSD 100 in
// water this reproduces the divergent superposition exactly (up to interpolation).
//   P(d, S) = Σ_cells T_w(z′)·w_IS·[Q(d − a, k·S) − Q(d − b, k·S)]
import { bracketIndex } from '../units';
import { cylinderAt, type CylinderCumulative } from '../kernels/cylinderCumulative';
import { termaAlongRay } from '../kernels/terma';
import type { Spectrum } from '../kernels/spectrum';
import { waterPhantom } from '../phantom/slabPhantom';
import { sourceCells } from './slabSuperposition';

export interface PencilKernelTable {
  /** Depths (cm of water), ascending. */
  depthsCm: Float64Array;
  /** Lateral radii (cm), ascending from 0. */
  radiiCm: Float64Array;
  /** P(d, S) per unit energy fluence (cm²/g · cm²), index iDepth · nRadii + iRadius. */
  values: Float64Array;
  referenceSsdCm: number;
}

export interface PencilKernelOptions {
  cellStepCm?: number;
  /** Thickness of the water phantom the kernel is computed in (cm). */
  phantomDepthCm?: number;
  referenceSsdCm?: number;
}

export function buildPencilKernel(
  q: CylinderCumulative,
  spectrum: Spectrum,
  depthsCm: ArrayLike<number>,
  radiiCm: ArrayLike<number>,
  options: PencilKernelOptions = {},
): PencilKernelTable {
  const ref = options.referenceSsdCm ?? 100;
  const phantom = waterPhantom(options.phantomDepthCm ?? 80);
  const cells = sourceCells(phantom, options.cellStepCm ?? 0.1);
  const terma = termaAlongRay(phantom, spectrum, cells.centreCm, { ssdCm: Infinity });
  const extent = q.zeta.nodes[q.zeta.nodes.length - 1] as number;
  const nD = depthsCm.length;
  const nR = radiiCm.length;
  const values = new Float64Array(nD * nR);
  for (let id = 0; id < nD; id++) {
    const d = depthsCm[id] as number;
    for (let c = 0; c < cells.count; c++) {
      const hi = d - (cells.topCm[c] as number);
      const lo = d - (cells.bottomCm[c] as number);
      if (lo >= extent || hi <= -extent) continue;
      const k = (ref + (cells.centreCm[c] as number)) / (ref + d);
      const w = (terma[c] as number) / (k * k);
      for (let ir = 1; ir < nR; ir++) {
        const s = k * (radiiCm[ir] as number);
        values[id * nR + ir] =
          (values[id * nR + ir] as number) + w * (cylinderAt(q, hi, s) - cylinderAt(q, lo, s));
      }
    }
  }
  return {
    depthsCm: Float64Array.from(depthsCm),
    radiiCm: Float64Array.from(radiiCm),
    values,
    referenceSsdCm: ref,
  };
}

/** P(d, S) by bilinear interpolation (clamped to the table's depth and radius ranges). */
export function pencilRadialAt(t: PencilKernelTable, depthCm: number, radiusCm: number): number {
  const nR = t.radiiCm.length;
  const id = bracketIndex(t.depthsCm, depthCm);
  const ir = bracketIndex(t.radiiCm, radiusCm);
  const d0 = t.depthsCm[id] as number;
  const d1 = t.depthsCm[id + 1] as number;
  const r0 = t.radiiCm[ir] as number;
  const r1 = t.radiiCm[ir + 1] as number;
  const td = Math.min(Math.max((depthCm - d0) / (d1 - d0), 0), 1);
  const tr = Math.min(Math.max((radiusCm - r0) / (r1 - r0), 0), 1);
  const v = t.values;
  const a = id * nR + ir;
  const b = a + nR;
  return (
    (1 - td) * ((1 - tr) * (v[a] as number) + tr * (v[a + 1] as number)) +
    td * ((1 - tr) * (v[b] as number) + tr * (v[b + 1] as number))
  );
}
