// Direct simulation of the divergent beam, for checking the reciprocity scoring: rays from the
// point source spread uniformly over the field at 100 cm (sampleDivergentRay), and the energy is
// scored in a small central column whose square cross-section grows with depth like the field.
// About (field area / column area) times less efficient than the reciprocity scoring, so it is a
// check, not the method.
import { FIELD_DEFINITION_DISTANCE_CM } from '../beam/geometry';
import { makeSlabPhantom, cumulativeMassThicknessGPerCm2 } from '../phantom/slabPhantom';
import { slabGeometry } from './geometry';
import { Transport, type McScorer } from './transport';
import { makeSpectrumSampler } from './spectrumSampler';
import { sampleDivergentRay, type SourceRay } from './beamSource';
import { Rng } from './rng';
import { GRAY_PER_MEV_PER_G } from './depthDose';
import type { McScenario } from './scenario';

export interface DirectColumnOptions {
  histories: number;
  seed: number;
  /** Depth-bin width (cm). */
  depthBinCm: number;
  /** Side of the central column at 100 cm from the source (cm). */
  columnSide100Cm: number;
}

/**
 * Dose per fluence Φ₁₀₀ (Gy·cm²) in each depth bin of the central column, from `histories`
 * source photons spread over the field (fluence at 100 cm = histories / field area).
 */
export function directColumnDose(s: McScenario, o: DirectColumnOptions): number[] {
  const phantom = makeSlabPhantom(s.layers);
  const n = Math.max(1, Math.round(phantom.totalThicknessCm / o.depthBinCm));
  const dz = phantom.totalThicknessCm / n;
  const energy = new Float64Array(n);
  const half100 = o.columnSide100Cm / 2;
  const scorer: McScorer = {
    deposit(x, y, z, _r, e) {
      const h = (half100 * (s.ssdCm + z)) / FIELD_DEFINITION_DISTANCE_CM;
      if (Math.abs(x) >= h || Math.abs(y) >= h) return;
      const iz = Math.min(n - 1, Math.max(0, Math.floor(z / dz)));
      energy[iz] = (energy[iz] as number) + e;
    },
  };
  const transport = new Transport(slabGeometry(phantom), scorer);
  const spectrum = makeSpectrumSampler(s.energy);
  const rng = new Rng(o.seed, 0);
  const ray: SourceRay = { x: 0, y: 0, u: 0, v: 0, w: 1 };
  for (let h = 0; h < o.histories; h++) {
    rng.seedHistory(o.seed, h);
    sampleDivergentRay(s.ssdCm, s.fieldXCm, s.fieldYCm, rng, ray);
    transport.runPhoton(spectrum.sample(rng), ray.x, ray.y, 0, ray.u, ray.v, ray.w, 0, rng);
  }
  const fluence100 = o.histories / (s.fieldXCm * s.fieldYCm);
  const out: number[] = [];
  for (let i = 0; i < n; i++) {
    const zc = (i + 0.5) * dz;
    const side = (o.columnSide100Cm * (s.ssdCm + zc)) / FIELD_DEFINITION_DISTANCE_CM;
    const mass =
      (cumulativeMassThicknessGPerCm2(phantom, Math.min(phantom.totalThicknessCm, (i + 1) * dz)) -
        cumulativeMassThicknessGPerCm2(phantom, i * dz)) *
      side *
      side;
    out.push(((energy[i] as number) * GRAY_PER_MEV_PER_G) / mass / fluence100);
  }
  return out;
}
