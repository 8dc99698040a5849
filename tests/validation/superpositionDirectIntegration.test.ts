// The slab superposition (quadrant tables over density-scaled fields) against a direct numerical
// integration of the density-scaled kernel, D(r) = ∫ T(r′)·ρ(r′)·ℓ²·h_w(ℓ, θ)/|r − r′|² dV′,
// in spherical coordinates about the dose point (dV′ = R² dR dΩ), for an 18 MV 5 × 5 field
// through a lung-density slab: checks the slab algebra (ρ̄ scaling of the field, ζ-integration
// of the source cells, divergence) independently of how it is coded. Here every kernel is
// rotated exactly onto the ray through its source point (θ measured from that ray) and hardened
// by the radiological depth t of the source, h = h(0) + f(t)·[h(t_ref) − h(0)]; the engine
// shears instead of rotating (first order in the ray angle) and reads tables.
import { describe, it } from 'vitest';
import { layerIndexAtDepth, makeSlabPhantom } from '../../src/engine/phantom/slabPhantom';
import { superpositionDose } from '../../src/engine/superposition/slabSuperposition';
import {
  beamHardenedKernel,
  beamHardeningMix,
  beamPointKernel,
  typeBModel,
} from '../../src/engine/superposition/beamModel';
import { hardeningMixAt } from '../../src/engine/kernels/kernelHardening';
import { radiologicalDepthCm } from '../../src/engine/phantom/slabPhantom';
import { termaAlongRay } from '../../src/engine/kernels/terma';
import { polarBinSolidAngleSr } from '../../src/engine/kernels/pointKernelTable';
import { densityScaledKernel } from '../../src/engine/superposition/densityScaling';
import { expectRelClose } from '../helpers/expectClose';

const phantom = makeSlabPhantom([
  { materialId: 'water', thicknessCm: 5 },
  { materialId: 'water', thicknessCm: 10, densityGPerCm3: 0.25 },
  { materialId: 'water', thicknessCm: 15 },
]);
const FIELD_CM = 5;
const SSD_CM = 100;
const kernel = beamPointKernel('18MV');
const hardened = beamHardenedKernel('18MV');
const mix = beamHardeningMix('18MV');
const nR = kernel.radialEdgesCm.length;

/** Water kernel h_w(ℓ, θ) per g hardened by f: bin energy over bin volume (uniform in a bin). */
function waterKernel(ellCm: number, thetaRad: number, f: number): number {
  const j = Math.min(kernel.polarBins - 1, Math.floor((thetaRad / Math.PI) * kernel.polarBins));
  let i = 0;
  while (i < nR - 1 && (kernel.radialEdgesCm[i] as number) < ellCm) i++;
  const r0 = i === 0 ? 0 : (kernel.radialEdgesCm[i - 1] as number);
  const r1 = kernel.radialEdgesCm[i] as number;
  const k = j * nR + i;
  const base = (kernel.primary[k] as number) + (kernel.scatter[k] as number);
  const hard = (hardened.primary[k] as number) + (hardened.scatter[k] as number);
  const energy = base + f * (hard - base);
  return energy / (polarBinSolidAngleSr(j, kernel.polarBins) * (r1 - r0) * ellCm * ellCm);
}

const termaGrid = Array.from({ length: 3001 }, (_, i) => i * 0.01);
const terma = termaAlongRay(phantom, typeBModel('18MV').spectrum, termaGrid, { ssdCm: SSD_CM });
const termaAt = (z: number) => {
  const p = z / 0.01;
  const i = Math.min(Math.floor(p), termaGrid.length - 2);
  return (terma[i] as number) + (p - i) * ((terma[i + 1] as number) - (terma[i] as number));
};

function directDose(zCm: number): number {
  let dose = 0;
  const sub = 4;
  const nPhi = 32;
  for (let j = 0; j < kernel.polarBins; j++) {
    for (let m = 0; m < sub; m++) {
      const ta = ((j + m / sub) * Math.PI) / kernel.polarBins;
      const tb = ((j + (m + 1) / sub) * Math.PI) / kernel.polarBins;
      const theta = 0.5 * (ta + tb);
      const dOmega = (2 * Math.PI * (Math.cos(ta) - Math.cos(tb))) / nPhi;
      for (let q = 0; q < nPhi; q++) {
        const phi = ((q + 0.5) * 2 * Math.PI) / nPhi;
        // Direction from the dose point to the source: the energy travels at θ to the beam.
        const ux = -Math.sin(theta) * Math.cos(phi);
        const uy = -Math.sin(theta) * Math.sin(phi);
        const uz = -Math.cos(theta);
        let R = 0;
        let ell = 0;
        let dR = 0.005;
        for (;;) {
          const Rm = R + 0.5 * dR;
          const z = zCm + uz * Rm;
          if (z < 0 || z > phantom.totalThicknessCm) break;
          const half = (0.5 * FIELD_CM * (SSD_CM + z)) / 100;
          if (Math.abs(ux * Rm) > half || Math.abs(uy * Rm) > half) break;
          const rho = phantom.layers[layerIndexAtDepth(phantom, z)]!.relativeElectronDensity;
          const ellMid = ell + 0.5 * rho * dR;
          if (ellMid >= 60) break;
          // The kernel of this source points along its ray (from the source at (0, 0, −SSD)):
          // its polar angle is the angle between the ray and the flow towards the dose point.
          const xs = ux * Rm;
          const ys = uy * Rm;
          const rayNorm = Math.hypot(xs, ys, SSD_CM + z);
          const cosTilted = -(ux * xs + uy * ys + uz * (SSD_CM + z)) / rayNorm;
          const thetaTilted = Math.acos(Math.min(1, Math.max(-1, cosTilted)));
          const f = hardeningMixAt(mix, radiologicalDepthCm(phantom, z));
          const factor = densityScaledKernel(
            (l, t) => waterKernel(l, t, f),
            rho,
            ellMid,
            Rm,
            thetaTilted,
          );
          dose += termaAt(z) * factor * Rm * Rm * dR * dOmega;
          ell += rho * dR;
          R += dR;
          dR = Math.min(dR * 1.03, 0.2);
        }
      }
    }
  }
  return dose;
}

describe('superpositionDose against direct integration of the density-scaled kernel', () => {
  it.each([3, 10, 20])(
    '18 MV 5 × 5 through 10 cm of ρ 0.25: agrees at %i cm within 1.5 %',
    (zCm) => {
      const model = typeBModel('18MV');
      const slab = superpositionDose(
        model.superpositionKernel('total'),
        model.spectrum,
        phantom,
        { ssdCm: SSD_CM, fieldXCm: FIELD_CM, fieldYCm: FIELD_CM },
        [zCm],
        [0],
      )[0] as number;
      // 1.5 %: the direct sum uses piecewise-constant kernel bins, 0.47° × 11° direction cells
      // and midpoint steps; the slab engine interpolates its tables and shears its kernels
      // instead of rotating them (−1.0 % at 3, 10 and 20 cm here; 0.5–0.7 % without tilt and
      // hardening; the engine without tilt and hardening differs by −2.2 % / −4.2 % at 3 / 10 cm).
      expectRelClose(slab, directDose(zCm), 0.015);
    },
  );
});
