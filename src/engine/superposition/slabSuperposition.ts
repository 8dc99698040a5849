// Point-kernel superposition in a slab phantom with rectilinear (3-D) density scaling.
// Sources: Mackie, Scrimger & Battista, Med. Phys. 12, 188 (1985); Ahnesjö, Med. Phys. 16, 577
// (1989). With the Jacobian of densityScaling.ts and slab geometry, the lateral integral over a
// source plane at depth z′ becomes the water kernel integrated over the field scaled by the mean
// density ρ̄ between z′ and z, at the radiological offset ζ = d′(z) − d′(z′):
//   D(x, z) = (ρ_e/ρ)(z) · ∫ T_e(z′) · s(z′, z) · K_t(ζ; ρ̄·[x − X_z, x + X_z] × ρ̄·[−Y_z, Y_z]) dd′(z′)
// K is read from the quadrant table C(ζ, U, V) (energy below ζ over the quadrant [0,U]×[0,V]):
// each source cell [a, b] contributes T_e(centre)·[C(ζ(a)) − C(ζ(b))] over the scaled rectangle,
// which integrates the kernel's 1/r² singularity exactly. TERMA is taken on the central axis and
// uniform across the geometric field at each depth (sharp field edges, no penumbra model).
// Kernel tilt (divergence): every kernel points along its ray from the source. To first order in
// the ray angle a tilt is a shear, which carries the source at lateral X on plane z′ to
// X·(f + z)/(f + z′) on the dose plane: the source plane is integrated over the field projected
// to the dose depth (X_z, Y_z), with its energy spread over that larger area,
// s(z′, z) = ((f + z′)/(f + z))² (ours; exact for a parallel beam, where s = 1 and nothing tilts).
// Kernel hardening: the kernel of a source cell is K(t) ≈ K(0) + f(t)·[K(t_ref) − K(0)] with t the
// cell's radiological depth (kernelHardening.ts); TERMA is hardened bin by bin (terma.ts).
import {
  quadrantSlabAtPositions,
  quadrantSlabMixedAtPositions,
  type QuadrantTable,
} from '../kernels/quadrant';
import { hardeningMixAt, type HardeningMix } from '../kernels/kernelHardening';
import type { KernelComponent } from '../kernels/pointKernelTable';
import { termaAlongRay } from '../kernels/terma';
import type { Spectrum } from '../kernels/spectrum';
import { FIELD_DEFINITION_DISTANCE_CM } from '../beam/geometry';
import { layerIndexAtDepth, radiologicalDepthCm, type SlabPhantom } from '../phantom/slabPhantom';
import { meanDensityBetween } from './densityScaling';

export interface SlabBeam {
  /** Source-to-surface distance (cm); Infinity for a parallel beam. */
  ssdCm: number;
  /** Field width and length (cm) at 100 cm from the source (parallel beam: everywhere). */
  fieldXCm: number;
  fieldYCm: number;
}

/** The kernel of the superposition: K(0) and, optionally, its hardening with depth. */
export interface SuperpositionKernel {
  /** Quadrant table of the kernel released at the surface, K(0). */
  table: QuadrantTable;
  /** K(t_ref) − K(0) on the table's grids and the mixing fraction f(t). */
  hardening?: { delta: Float64Array; mix: HardeningMix };
}

export interface SuperpositionOptions {
  /** Largest source-cell thickness (cm); cells never straddle an interface. Default 0.2. */
  cellStepCm?: number;
  /** Radiological distance (cm) beyond which merged groups of cells are used. Default 3. */
  groupNearCm?: number;
  /** Only the TERMA released in this layer (index from the surface): dose by layer of origin. */
  sourceLayerIndex?: number;
  /** Kernel part to superpose (typeBDose.ts): total (default), primary or scatter. */
  kernelComponent?: KernelComponent;
}

/** Half-widths of the field at a depth (cm). */
export function halfFieldAtDepthCm(beam: SlabBeam, depthCm: number): [number, number] {
  const scale = Number.isFinite(beam.ssdCm)
    ? (beam.ssdCm + depthCm) / FIELD_DEFINITION_DISTANCE_CM
    : 1;
  return [0.5 * beam.fieldXCm * scale, 0.5 * beam.fieldYCm * scale];
}

/** Source cells of a phantom: per cell top, bottom, centre, their radiological depths, layer. */
export interface SourceCells {
  count: number;
  topCm: Float64Array;
  bottomCm: Float64Array;
  centreCm: Float64Array;
  radTopCm: Float64Array;
  radBottomCm: Float64Array;
  radCentreCm: Float64Array;
  density: Float64Array;
  /** Index of the layer holding each cell. */
  layer: Int32Array;
}

export function sourceCells(phantom: SlabPhantom, stepCm: number): SourceCells {
  const tops: number[] = [];
  const bottoms: number[] = [];
  const dens: number[] = [];
  const layerOf: number[] = [];
  for (const [m, layer] of phantom.layers.entries()) {
    const n = Math.max(1, Math.ceil(layer.thicknessCm / stepCm - 1e-9));
    for (let i = 0; i < n; i++) {
      tops.push(layer.topCm + (layer.thicknessCm * i) / n);
      bottoms.push(layer.topCm + (layer.thicknessCm * (i + 1)) / n);
      dens.push(layer.relativeElectronDensity);
      layerOf.push(m);
    }
  }
  const count = tops.length;
  const topCm = Float64Array.from(tops);
  const bottomCm = Float64Array.from(bottoms);
  const centreCm = Float64Array.from(tops, (t, i) => 0.5 * (t + (bottoms[i] as number)));
  const rad = (zs: Float64Array) => Float64Array.from(zs, (z) => radiologicalDepthCm(phantom, z));
  return {
    count,
    topCm,
    bottomCm,
    centreCm,
    radTopCm: rad(topCm),
    radBottomCm: rad(bottomCm),
    radCentreCm: rad(centreCm),
    density: Float64Array.from(dens),
    layer: Int32Array.from(layerOf),
  };
}

/** Source cells merged into a group (runs of up to GROUP_CELLS fine cells within one layer). */
const GROUP_CELLS = 5;
/**
 * A group is used whole for a dose depth when every part of it lies at least this radiological
 * distance away (cm); nearer groups are summed cell by cell. Far away only the slowly varying
 * scatter tail of the kernel remains, and a group's kernel is still integrated exactly over its
 * axial extent (tests/unit/superposition/sourceGroups.test.ts bounds the change).
 */
export const GROUP_NEAR_CM = 3;

interface CellGroups {
  count: number;
  /** First fine cell and number of fine cells of each group. */
  first: Int32Array;
  size: Int32Array;
  /** Group means of the per-cell source quantities. */
  terma: Float64Array;
  mix: Float64Array;
  centreCm: Float64Array;
  radCentreCm: Float64Array;
  density: Float64Array;
}

function groupCells(cells: SourceCells, terma: Float64Array, mix: Float64Array): CellGroups {
  const first: number[] = [];
  const size: number[] = [];
  for (let c = 0; c < cells.count;) {
    let n = 1;
    while (n < GROUP_CELLS && c + n < cells.count && cells.layer[c + n] === cells.layer[c]) n++;
    first.push(c);
    size.push(n);
    c += n;
  }
  const count = first.length;
  const mean = (values: Float64Array) =>
    Float64Array.from(first, (c0, k) => {
      let sum = 0;
      for (let c = c0; c < c0 + (size[k] as number); c++) sum += values[c] as number;
      return sum / (size[k] as number);
    });
  return {
    count,
    first: Int32Array.from(first),
    size: Int32Array.from(size),
    terma: mean(terma),
    mix: mean(mix),
    centreCm: Float64Array.from(first, (c0, k) => {
      const last = c0 + (size[k] as number) - 1;
      return 0.5 * ((cells.topCm[c0] as number) + (cells.bottomCm[last] as number));
    }),
    radCentreCm: Float64Array.from(first, (c0, k) => {
      const last = c0 + (size[k] as number) - 1;
      return 0.5 * ((cells.radTopCm[c0] as number) + (cells.radBottomCm[last] as number));
    }),
    density: Float64Array.from(first, (c0) => cells.density[c0] as number),
  };
}

/**
 * Dose per unit energy fluence at 100 cm (cm²/g) on the grid depthsCm × lateralCm (x across
 * the field's X side, y = 0), index iz·nx + ix. Depths inside the phantom; lateral positions are
 * geometric distances from the central axis at that depth.
 */
export function superpositionDose(
  kernelIn: SuperpositionKernel | QuadrantTable,
  spectrum: Spectrum,
  phantom: SlabPhantom,
  beam: SlabBeam,
  depthsCm: ArrayLike<number>,
  lateralCm: ArrayLike<number>,
  options: SuperpositionOptions = {},
): Float64Array {
  const sk: SuperpositionKernel = 'values' in kernelIn ? { table: kernelIn } : kernelIn;
  const kernel = sk.table;
  const cells = sourceCells(phantom, options.cellStepCm ?? 0.2);
  const onlyLayer = options.sourceLayerIndex;
  const terma = termaAlongRay(phantom, spectrum, cells.centreCm, { ssdCm: beam.ssdCm });
  const divergent = Number.isFinite(beam.ssdCm);
  // Hardening fraction of each cell's kernel, from its radiological depth.
  const delta = sk.hardening?.delta;
  const mix = new Float64Array(cells.count);
  if (sk.hardening)
    for (let c = 0; c < cells.count; c++)
      mix[c] = hardeningMixAt(sk.hardening.mix, cells.radCentreCm[c] as number);
  const groups = groupCells(cells, terma, mix);
  const groupNear = options.groupNearCm ?? GROUP_NEAR_CM;
  const nz = depthsCm.length;
  const nx = lateralCm.length;
  const out = new Float64Array(nz * nx);
  const extent = kernel.zeta.nodes[kernel.zeta.nodes.length - 1] as number;
  const lateral = kernel.lateral;
  const g = new Float64Array(lateral.nodes.length);
  const direct = nx <= 4;
  let maxAbsLateral = 0;
  for (let ix = 0; ix < nx; ix++)
    maxAbsLateral = Math.max(maxAbsLateral, Math.abs(lateralCm[ix] as number));
  // Radiological depth of every cell boundary (cells tile the phantom: bottom c = top c + 1).
  const boundaries = new Float64Array(cells.count + 1);
  boundaries.set(cells.radTopCm);
  boundaries[cells.count] = cells.radBottomCm[cells.count - 1] as number;
  const zetaPosition = new Float64Array(cells.count + 1);
  const slab = (f: number, pHi: number, pLo: number, pU: number, pV: number): number =>
    delta
      ? quadrantSlabMixedAtPositions(kernel, delta, f, pHi, pLo, pU, pV)
      : quadrantSlabAtPositions(kernel, pHi, pLo, pU, pV);
  for (let iz = 0; iz < nz; iz++) {
    const z = depthsCm[iz] as number;
    const dz = radiologicalDepthCm(phantom, z);
    const layer = phantom.layers[layerIndexAtDepth(phantom, z)]!;
    const toMedium = layer.relativeElectronDensity / layer.densityGPerCm3;
    // Tilted kernels: every source plane is integrated over the field at the dose depth.
    const [halfX, halfY] = halfFieldAtDepthCm(beam, z);
    const row = iz * nx;
    for (let b = 0; b <= cells.count; b++)
      zetaPosition[b] = kernel.zeta.position(dz - (boundaries[b] as number));
    // One source: radiological extent [top, bottom] (boundary indices), centre, density, TERMA
    // and hardening fraction.
    const source = (
      top: number,
      bottom: number,
      zc: number,
      radC: number,
      density: number,
      t: number,
      f: number,
    ): void => {
      const zetaHi = dz - (boundaries[top] as number);
      const zetaLo = dz - (boundaries[bottom] as number);
      if (zetaLo >= extent || zetaHi <= -extent) return;
      const pHi = zetaPosition[top] as number;
      const pLo = zetaPosition[bottom] as number;
      const rhoBar = meanDensityBetween(dz, radC, z, zc, density);
      const X = rhoBar * halfX;
      const pV = lateral.position(rhoBar * halfY);
      const spread = divergent ? ((beam.ssdCm + zc) / (beam.ssdCm + z)) ** 2 : 1;
      const weight = 2 * t * toMedium * spread;
      if (direct) {
        for (let ix = 0; ix < nx; ix++) {
          const u = rhoBar * (lateralCm[ix] as number);
          const right = u + X;
          const left = u - X;
          const sRight =
            Math.sign(right) * slab(f, pHi, pLo, lateral.position(Math.abs(right)), pV);
          const sLeft =
            left === -right
              ? -sRight
              : Math.sign(left) * slab(f, pHi, pLo, lateral.position(Math.abs(left)), pV);
          out[row + ix] = (out[row + ix] as number) + weight * (sRight - sLeft);
        }
        return;
      }
      // Only the lateral nodes up to the widest offset this row needs.
      const kMax = Math.min(
        g.length - 1,
        Math.ceil(lateral.position(rhoBar * maxAbsLateral + X)) + 1,
      );
      for (let k = 0; k <= kMax; k++) g[k] = slab(f, pHi, pLo, k, pV);
      for (let ix = 0; ix < nx; ix++) {
        const u = rhoBar * (lateralCm[ix] as number);
        const sRight = signedNodeInterpolation(kernel, g, u + X);
        const sLeft = signedNodeInterpolation(kernel, g, u - X);
        out[row + ix] = (out[row + ix] as number) + weight * (sRight - sLeft);
      }
    };
    for (let k = 0; k < groups.count; k++) {
      const c0 = groups.first[k] as number;
      // Groups never straddle a layer: one test per group selects the layer of origin.
      if (onlyLayer !== undefined && cells.layer[c0] !== onlyLayer) continue;
      const c1 = c0 + (groups.size[k] as number);
      const nearest = Math.min(
        Math.abs(dz - (boundaries[c0] as number)),
        Math.abs(dz - (boundaries[c1] as number)),
      );
      const inside = dz > (boundaries[c0] as number) && dz < (boundaries[c1] as number);
      if (!inside && nearest >= groupNear) {
        source(
          c0,
          c1,
          groups.centreCm[k] as number,
          groups.radCentreCm[k] as number,
          groups.density[k] as number,
          groups.terma[k] as number,
          groups.mix[k] as number,
        );
        continue;
      }
      for (let c = c0; c < c1; c++)
        source(
          c,
          c + 1,
          cells.centreCm[c] as number,
          cells.radCentreCm[c] as number,
          cells.density[c] as number,
          terma[c] as number,
          mix[c] as number,
        );
    }
  }
  return out;
}

/** sgn(u)·g(|u|) with g tabulated on the quadrant table's lateral nodes (linear between nodes). */
function signedNodeInterpolation(kernel: QuadrantTable, g: Float64Array, u: number): number {
  const n = g.length;
  const p = kernel.lateral.position(Math.abs(u));
  const i = Math.min(Math.floor(p), n - 2);
  const t = p - i;
  return Math.sign(u) * ((1 - t) * (g[i] as number) + t * (g[i + 1] as number));
}
