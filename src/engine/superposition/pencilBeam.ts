// Pencil-beam convolution with depth-only (1-D) density scaling: the water pencil kernel is read
// at the radiological depth d′ of the point and integrated over the geometric field at that depth,
// laterally unscaled (the lateral spread of energy is always water's) — the 1-D scaled class of
// TG-65 (from memory):
//   D(x, z) = (ρ_e/ρ)(z) · (100/(SSD + z))² · ∫∫_field(z) p(d′(z); x − x′, y′) dx′ dy′
// The rectangle integral is a signed sum of quadrant integrals of the radial cumulative P(d′, S).
import { quadrantFromRadial } from '../kernels/quadrant';
import { FIELD_DEFINITION_DISTANCE_CM } from '../beam/geometry';
import { layerIndexAtDepth, radiologicalDepthCm, type SlabPhantom } from '../phantom/slabPhantom';
import { pencilRadialAt, type PencilKernelTable } from './pencilKernel';
import { halfFieldAtDepthCm, type SlabBeam } from './slabSuperposition';

/**
 * Pencil-beam dose per unit energy fluence at 100 cm on depthsCm × lateralCm (index iz·nx + ix),
 * same units and geometry conventions as superpositionDose.
 */
export function pencilBeamDose(
  kernel: PencilKernelTable,
  phantom: SlabPhantom,
  beam: SlabBeam,
  depthsCm: ArrayLike<number>,
  lateralCm: ArrayLike<number>,
): Float64Array {
  const nz = depthsCm.length;
  const nx = lateralCm.length;
  const out = new Float64Array(nz * nx);
  for (let iz = 0; iz < nz; iz++) {
    const z = depthsCm[iz] as number;
    const dRad = radiologicalDepthCm(phantom, z);
    const layer = phantom.layers[layerIndexAtDepth(phantom, z)]!;
    const toMedium = layer.relativeElectronDensity / layer.densityGPerCm3;
    const fluence = Number.isFinite(beam.ssdCm)
      ? (FIELD_DEFINITION_DISTANCE_CM / (beam.ssdCm + z)) ** 2
      : 1;
    const [hx, hy] = halfFieldAtDepthCm(beam, z);
    const radial = (s: number) => pencilRadialAt(kernel, dRad, s);
    const quadrant = (u: number) => Math.sign(u) * quadrantFromRadial(radial, Math.abs(u), hy);
    for (let ix = 0; ix < nx; ix++) {
      const x = lateralCm[ix] as number;
      out[iz * nx + ix] = 2 * toMedium * fluence * (quadrant(x + hx) - quadrant(x - hx));
    }
  }
  return out;
}
