// Slab phantom: laterally infinite layers stacked along the central axis, surface at z = 0,
// beam travelling towards +z. A depth on an interface belongs to the upstream layer.
import {
  getMaterial,
  relativeElectronDensity,
  type MaterialId,
} from '../materials/materialLibrary';
import { INTERFACE_EPSILON_CM } from '../units';

/** A layer as the user describes it. */
export interface LayerSpec {
  materialId: MaterialId;
  thicknessCm: number;
  /** Mass density override (g/cm³); the material's default when absent. */
  densityGPerCm3?: number | undefined;
}

/** A layer with everything the engine needs resolved. */
export interface SlabLayer {
  materialId: MaterialId;
  thicknessCm: number;
  densityGPerCm3: number;
  /** Electron density relative to water. */
  relativeElectronDensity: number;
  topCm: number;
  bottomCm: number;
}

export interface SlabPhantom {
  layers: readonly SlabLayer[];
  /** Interface depths including 0 and the bottom: length = layers + 1. */
  boundariesCm: Float64Array;
  /** Radiological depth at each boundary: length = layers + 1. */
  radiologicalBoundariesCm: Float64Array;
  totalThicknessCm: number;
}

export function makeSlabPhantom(specs: readonly LayerSpec[]): SlabPhantom {
  if (specs.length === 0) throw new RangeError('layers: a phantom needs at least one layer');
  const layers: SlabLayer[] = [];
  const boundaries = new Float64Array(specs.length + 1);
  const radiological = new Float64Array(specs.length + 1);
  let top = 0;
  let radTop = 0;
  specs.forEach((spec, i) => {
    const density = spec.densityGPerCm3 ?? getMaterial(spec.materialId).defaultDensityGPerCm3;
    if (!(spec.thicknessCm > 0) || !Number.isFinite(spec.thicknessCm))
      throw new RangeError(`layers[${i}].thicknessCm: must be a finite number > 0`);
    if (!(density > 0) || !Number.isFinite(density))
      throw new RangeError(`layers[${i}].densityGPerCm3: must be a finite number > 0`);
    const rhoE = relativeElectronDensity(spec.materialId, density);
    const bottom = top + spec.thicknessCm;
    layers.push({
      materialId: spec.materialId,
      thicknessCm: spec.thicknessCm,
      densityGPerCm3: density,
      relativeElectronDensity: rhoE,
      topCm: top,
      bottomCm: bottom,
    });
    radTop += rhoE * spec.thicknessCm;
    boundaries[i + 1] = bottom;
    radiological[i + 1] = radTop;
    top = bottom;
  });
  return {
    layers,
    boundariesCm: boundaries,
    radiologicalBoundariesCm: radiological,
    totalThicknessCm: top,
  };
}

/** A phantom of water only, `thicknessCm` deep. */
export function waterPhantom(thicknessCm: number): SlabPhantom {
  return makeSlabPhantom([{ materialId: 'water', thicknessCm }]);
}

export function isInsidePhantom(phantom: SlabPhantom, depthCm: number): boolean {
  return depthCm >= 0 && depthCm <= phantom.totalThicknessCm + INTERFACE_EPSILON_CM;
}

/**
 * Index of the layer holding a depth. A depth on an interface (within 1e-9 cm) belongs to the
 * upstream layer; depth 0 belongs to the first layer. Throws outside the phantom.
 */
export function layerIndexAtDepth(phantom: SlabPhantom, depthCm: number): number {
  if (!isInsidePhantom(phantom, depthCm))
    throw new RangeError(
      `depth ${depthCm} cm lies outside the phantom (0–${phantom.totalThicknessCm} cm)`,
    );
  const b = phantom.boundariesCm;
  const n = phantom.layers.length;
  for (let i = 0; i < n; i++) {
    if (depthCm <= (b[i + 1] as number) + INTERFACE_EPSILON_CM) return i;
  }
  return n - 1;
}

/** Radiological (water-equivalent) depth d′ = Σ ρ_e,m ℓ_m from the surface to a depth (cm). */
export function radiologicalDepthCm(phantom: SlabPhantom, depthCm: number): number {
  const i = layerIndexAtDepth(phantom, depthCm);
  const layer = phantom.layers[i] as SlabLayer;
  const within = Math.min(Math.max(depthCm - layer.topCm, 0), layer.thicknessCm);
  return (phantom.radiologicalBoundariesCm[i] as number) + layer.relativeElectronDensity * within;
}

/** Mass thickness ∫ρ dz from the surface to a depth (g/cm²). */
export function cumulativeMassThicknessGPerCm2(phantom: SlabPhantom, depthCm: number): number {
  const i = layerIndexAtDepth(phantom, depthCm);
  let sum = 0;
  for (let m = 0; m < i; m++) {
    const l = phantom.layers[m] as SlabLayer;
    sum += l.densityGPerCm3 * l.thicknessCm;
  }
  const layer = phantom.layers[i] as SlabLayer;
  return (
    sum + layer.densityGPerCm3 * Math.min(Math.max(depthCm - layer.topCm, 0), layer.thicknessCm)
  );
}

/**
 * Density-weighted (radiological) length of the straight line between two points, given their
 * depths and their lateral separation (cm). In slabs the density depends on z only, so
 * ℓ = (|r − r′|/|z − z′|)·|d′(z) − d′(z′)| exactly; for z = z′ it is ρ_e(z)·|r − r′|.
 */
export function radiologicalDistanceCm(
  phantom: SlabPhantom,
  depthACm: number,
  depthBCm: number,
  lateralSeparationCm: number,
): number {
  const dz = Math.abs(depthBCm - depthACm);
  const geometric = Math.hypot(dz, lateralSeparationCm);
  if (dz < 1e-12) {
    const layer = phantom.layers[layerIndexAtDepth(phantom, depthACm)] as SlabLayer;
    return layer.relativeElectronDensity * geometric;
  }
  const radial = Math.abs(
    radiologicalDepthCm(phantom, depthBCm) - radiologicalDepthCm(phantom, depthACm),
  );
  return (geometric / dz) * radial;
}

/**
 * Radiological depth on a grid of depths, written into `out` (same length as `depthsCm`).
 * Depths must lie inside the phantom.
 */
export function radiologicalDepthCurve(
  phantom: SlabPhantom,
  depthsCm: ArrayLike<number>,
  out: Float64Array = new Float64Array(depthsCm.length),
): Float64Array {
  for (let k = 0; k < depthsCm.length; k++)
    out[k] = radiologicalDepthCm(phantom, depthsCm[k] as number);
  return out;
}
