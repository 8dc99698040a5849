// Pencil-beam kernel of a beam in water, derived from its point kernel: the dose at depth d and
// lateral radius s from an infinitesimally narrow beam, stored as the radial cumulative
// P(d, S) = ∫₀^S p(d, s)·2πs ds (Q: cylinder-cumulative point kernel, T_w: water TERMA of a
// parallel beam per energy bin, source cells [a, b]).
// Kernels tilt along the divergent rays as in the superposition (slabSuperposition.ts): to first
// order a source plane at z′ is then integrated over the field projected to the dose depth, with
// its energy spread over that area, so the pencil of a divergent beam is the parallel-beam pencil
// scaled by the inverse square at the dose depth (pencilBeam.ts applies it) — the same for every
// SSD. Each cell's kernel is hardened by its depth, K(t) ≈ K(0) + f(t)·[K(t_ref) − K(0)]
// (kernelHardening.ts):
//   P(d, S) = Σ_cells T_w(z′)·[Q_t(d − a, S) − Q_t(d − b, S)],  t = z′ (cell centre)
// In water this reproduces the tilted, hardened superposition (up to interpolation).
import { bracketIndex } from '../units';
import { cylinderAt, type CylinderCumulative } from '../kernels/cylinderCumulative';
import { hardeningMixAt, type HardeningMix } from '../kernels/kernelHardening';
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
}

export interface PencilKernelOptions {
  cellStepCm?: number;
  /** Thickness of the water phantom the kernel is computed in (cm). */
  phantomDepthCm?: number;
}

/** Cylinder-cumulative kernels released at the surface (base) and behind t_ref of water. */
export interface HardeningCylinders {
  base: CylinderCumulative;
  hardened: CylinderCumulative;
}

export function buildPencilKernel(
  q: HardeningCylinders,
  mix: HardeningMix,
  spectrum: Spectrum,
  depthsCm: ArrayLike<number>,
  radiiCm: ArrayLike<number>,
  options: PencilKernelOptions = {},
): PencilKernelTable {
  const phantom = waterPhantom(options.phantomDepthCm ?? 80);
  const cells = sourceCells(phantom, options.cellStepCm ?? 0.1);
  const terma = termaAlongRay(phantom, spectrum, cells.centreCm, { ssdCm: Infinity });
  const extent = q.base.zeta.nodes[q.base.zeta.nodes.length - 1] as number;
  const nD = depthsCm.length;
  const nR = radiiCm.length;
  const values = new Float64Array(nD * nR);
  for (let id = 0; id < nD; id++) {
    const d = depthsCm[id] as number;
    for (let c = 0; c < cells.count; c++) {
      const hi = d - (cells.topCm[c] as number);
      const lo = d - (cells.bottomCm[c] as number);
      if (lo >= extent || hi <= -extent) continue;
      const w = terma[c] as number;
      const f = hardeningMixAt(mix, cells.centreCm[c] as number);
      for (let ir = 1; ir < nR; ir++) {
        const s = radiiCm[ir] as number;
        const base = cylinderAt(q.base, hi, s) - cylinderAt(q.base, lo, s);
        const hard = cylinderAt(q.hardened, hi, s) - cylinderAt(q.hardened, lo, s);
        values[id * nR + ir] = (values[id * nR + ir] as number) + w * (base + f * (hard - base));
      }
    }
  }
  return {
    depthsCm: Float64Array.from(depthsCm),
    radiiCm: Float64Array.from(radiiCm),
    values,
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
