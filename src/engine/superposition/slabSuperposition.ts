// Point-kernel superposition in a slab phantom with rectilinear (3-D) density scaling.
// Sources: Mackie, Scrimger & Battista, Med. Phys. 12, 188 (1985); Ahnesjö, Med. Phys. 16, 577
// (1989). With the Jacobian of densityScaling.ts and slab geometry, the lateral integral over a
// source plane at depth z′ becomes the water kernel integrated over the field scaled by the mean
// density ρ̄ between z′ and z, at the radiological offset ζ = d′(z) − d′(z′):
//   D(x, z) = (ρ_e/ρ)(z) · ∫ T_e(z′) · K(ζ; ρ̄·[x − X, x + X] × ρ̄·[−Y, Y]) dd′(z′)
// K is read from the quadrant table C(ζ, U, V) (energy below ζ over the quadrant [0,U]×[0,V]):
// each source cell [a, b] contributes T_e(centre)·[C(ζ(a)) − C(ζ(b))] over the scaled rectangle,
// which integrates the kernel's 1/r² singularity exactly. TERMA is taken on the central axis and
// uniform across the geometric field at each depth (sharp field edges, no penumbra model); the
// polyenergetic kernel is not hardened with depth (TERMA is).
import { quadrantSlabAtPositions, type QuadrantTable } from '../kernels/quadrant';
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

export interface SuperpositionOptions {
  /** Largest source-cell thickness (cm); cells never straddle an interface. Default 0.2. */
  cellStepCm?: number;
  /** Kernel part to superpose (typeBDose.ts): total (default), primary or scatter. */
  kernelComponent?: KernelComponent;
  /** Only the TERMA released in this layer (index from the surface): dose by layer of origin. */
  sourceLayerIndex?: number;
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
  layerIndex: Int32Array;
}

export function sourceCells(phantom: SlabPhantom, stepCm: number): SourceCells {
  const tops: number[] = [];
  const bottoms: number[] = [];
  const dens: number[] = [];
  const layerOf: number[] = [];
  phantom.layers.forEach((layer, j) => {
    const n = Math.max(1, Math.ceil(layer.thicknessCm / stepCm - 1e-9));
    for (let i = 0; i < n; i++) {
      tops.push(layer.topCm + (layer.thicknessCm * i) / n);
      bottoms.push(layer.topCm + (layer.thicknessCm * (i + 1)) / n);
      dens.push(layer.relativeElectronDensity);
      layerOf.push(j);
    }
  });
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
    layerIndex: Int32Array.from(layerOf),
  };
}

/**
 * Dose per unit energy fluence at 100 cm (cm²/g) on the grid depthsCm × lateralCm (x across
 * the field's X side, y = 0), index iz·nx + ix. Depths inside the phantom; lateral positions are
 * geometric distances from the central axis at that depth.
 */
export function superpositionDose(
  kernel: QuadrantTable,
  spectrum: Spectrum,
  phantom: SlabPhantom,
  beam: SlabBeam,
  depthsCm: ArrayLike<number>,
  lateralCm: ArrayLike<number>,
  options: SuperpositionOptions = {},
): Float64Array {
  const cells = sourceCells(phantom, options.cellStepCm ?? 0.2);
  const onlyLayer = options.sourceLayerIndex;
  const terma = termaAlongRay(phantom, spectrum, cells.centreCm, { ssdCm: beam.ssdCm });
  const halfX = new Float64Array(cells.count);
  const halfY = new Float64Array(cells.count);
  for (let c = 0; c < cells.count; c++) {
    const [hx, hy] = halfFieldAtDepthCm(beam, cells.centreCm[c] as number);
    halfX[c] = hx;
    halfY[c] = hy;
  }
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
  for (let iz = 0; iz < nz; iz++) {
    const z = depthsCm[iz] as number;
    const dz = radiologicalDepthCm(phantom, z);
    const layer = phantom.layers[layerIndexAtDepth(phantom, z)]!;
    const toMedium = layer.relativeElectronDensity / layer.densityGPerCm3;
    for (let b = 0; b <= cells.count; b++)
      zetaPosition[b] = kernel.zeta.position(dz - (boundaries[b] as number));
    for (let c = 0; c < cells.count; c++) {
      if (onlyLayer !== undefined && cells.layerIndex[c] !== onlyLayer) continue;
      const zetaHi = dz - (boundaries[c] as number);
      const zetaLo = dz - (boundaries[c + 1] as number);
      if (zetaLo >= extent || zetaHi <= -extent) continue;
      const pHi = zetaPosition[c] as number;
      const pLo = zetaPosition[c + 1] as number;
      const rhoBar = meanDensityBetween(
        dz,
        cells.radCentreCm[c] as number,
        z,
        cells.centreCm[c] as number,
        cells.density[c] as number,
      );
      const X = rhoBar * (halfX[c] as number);
      const pV = lateral.position(rhoBar * (halfY[c] as number));
      const weight = 2 * (terma[c] as number) * toMedium;
      if (direct) {
        for (let ix = 0; ix < nx; ix++) {
          const u = rhoBar * (lateralCm[ix] as number);
          const right = u + X;
          const left = u - X;
          const sRight =
            Math.sign(right) *
            quadrantSlabAtPositions(kernel, pHi, pLo, lateral.position(Math.abs(right)), pV);
          const sLeft =
            left === -right
              ? -sRight
              : Math.sign(left) *
                quadrantSlabAtPositions(kernel, pHi, pLo, lateral.position(Math.abs(left)), pV);
          out[iz * nx + ix] = (out[iz * nx + ix] as number) + weight * (sRight - sLeft);
        }
        continue;
      }
      // Only the lateral nodes up to the widest offset this row needs.
      const kMax = Math.min(
        g.length - 1,
        Math.ceil(lateral.position(rhoBar * maxAbsLateral + X)) + 1,
      );
      for (let k = 0; k <= kMax; k++) g[k] = quadrantSlabAtPositions(kernel, pHi, pLo, k, pV);
      for (let ix = 0; ix < nx; ix++) {
        const u = rhoBar * (lateralCm[ix] as number);
        const sRight = signedNodeInterpolation(kernel, g, u + X);
        const sLeft = signedNodeInterpolation(kernel, g, u - X);
        out[iz * nx + ix] = (out[iz * nx + ix] as number) + weight * (sRight - sLeft);
      }
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
