// Transport geometries: laterally infinite slabs (the phantom) and a water sphere (point-kernel
// generation). Regions are numbered from 0; −1 means outside (vacuum: the particle escapes).
import type { MaterialId } from '../materials/materialLibrary';
import type { SlabPhantom } from '../phantom/slabPhantom';

export interface McRegion {
  materialId: MaterialId;
  densityGPerCm3: number;
}

export interface McGeometry {
  regions: readonly McRegion[];
  /** Distance (cm) along (u, v, w) from (x, y, z) to the surface of `region`; Infinity if none. */
  distanceToBoundary(
    region: number,
    x: number,
    y: number,
    z: number,
    u: number,
    v: number,
    w: number,
  ): number;
  /** Region entered when leaving `region` at a boundary while moving with direction cosine w (and position). */
  regionAfterCrossing(
    region: number,
    x: number,
    y: number,
    z: number,
    u: number,
    v: number,
    w: number,
  ): number;
  /** Exact boundary coordinate to snap z to after a crossing (slabs), or NaN for no snapping. */
  snapZ(region: number, w: number): number;
}

/** Laterally infinite slabs between the phantom's boundaries; z = depth (cm), beam along +z. */
export function slabGeometry(phantom: SlabPhantom): McGeometry {
  const b = phantom.boundariesCm;
  const n = phantom.layers.length;
  const regions = phantom.layers.map((l) => ({
    materialId: l.materialId,
    densityGPerCm3: l.densityGPerCm3,
  }));
  return {
    regions,
    distanceToBoundary(region, _x, _y, z, _u, _v, w) {
      if (w > 0) return ((b[region + 1] as number) - z) / w;
      if (w < 0) return ((b[region] as number) - z) / w;
      return Infinity;
    },
    regionAfterCrossing(region, _x, _y, _z, _u, _v, w) {
      const next = w > 0 ? region + 1 : region - 1;
      return next >= n ? -1 : next;
    },
    snapZ(region, w) {
      return w > 0 ? (b[region + 1] as number) : (b[region] as number);
    },
  };
}

/** A sphere of one medium centred on the origin; outside is vacuum. */
export function sphereGeometry(radiusCm: number, medium: McRegion): McGeometry {
  const r2 = radiusCm * radiusCm;
  return {
    regions: [medium],
    distanceToBoundary(_region, x, y, z, u, v, w) {
      const bDot = x * u + y * v + z * w;
      const c = x * x + y * y + z * z - r2;
      const disc = bDot * bDot - c;
      return Math.max(0, -bDot + Math.sqrt(Math.max(0, disc)));
    },
    regionAfterCrossing() {
      return -1;
    },
    snapZ() {
      return NaN;
    },
  };
}
