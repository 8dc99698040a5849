// Kernel engines in lung against the Monte Carlo (fixed seeds, stated k·σ): a small high-energy
// field through water into lung, where lateral electronic disequilibrium lowers the dose, and the
// same field in a uniform lung-density medium, where density scaling of the kernel is exact
// (O'Connor). Compared as absolute dose per photon fluence (both engines agree within 2 % in
// water: typeBWater.test.ts), so no calibration run is needed.
import { beforeAll, describe, expect, it } from 'vitest';
import { runBatch } from '../../src/engine/montecarlo/runBatch';
import { BatchAccumulator } from '../../src/engine/montecarlo/batchStatistics';
import { depthDoseFromStatistics, GRAY_PER_MEV_PER_G } from '../../src/engine/montecarlo/depthDose';
import {
  DEFAULT_BINNING,
  scoringGrid,
  type McScenario,
} from '../../src/engine/montecarlo/scenario';
import { makeSpectrumSampler } from '../../src/engine/montecarlo/spectrumSampler';
import { makeSlabPhantom } from '../../src/engine/phantom/slabPhantom';
import { typeBRawDose } from '../../src/engine/superposition/typeBDose';
import type { BeamEnergy } from '../../src/engine/beam/energies';
import type { LayerSpec } from '../../src/engine/phantom/slabPhantom';

const LUNG_BELOW_WATER: LayerSpec[] = [
  { materialId: 'water', thicknessCm: 5 },
  { materialId: 'lung', thicknessCm: 10, densityGPerCm3: 0.25 },
  { materialId: 'water', thicknessCm: 15 },
];
const UNIFORM_LUNG: LayerSpec[] = [{ materialId: 'lung', thicknessCm: 50, densityGPerCm3: 0.25 }];

/** Monte Carlo dose per photon fluence averaged over 1 cm around each depth, with its 1σ. */
function monteCarlo(energy: BeamEnergy, side: number, layers: LayerSpec[], depthsCm: number[]) {
  const scenario: McScenario = { energy, ssdCm: 100, fieldXCm: side, fieldYCm: side, layers };
  const acc = new BatchAccumulator(10);
  for (let b = 0; b < 10; b++)
    acc.add(
      runBatch({
        scenario,
        binning: DEFAULT_BINNING,
        seed: 417,
        batchIndex: b,
        historiesPerBatch: 15000,
      }),
    );
  const d = depthDoseFromStatistics(
    scenario,
    scoringGrid(scenario, DEFAULT_BINNING),
    acc.caxStatistics(),
  );
  return depthsCm.map((z) => {
    let s = 0;
    let v = 0;
    let n = 0;
    d.dosePerFluenceGyCm2.forEach((x, i) => {
      const c = 0.5 * ((d.edgesCm[i] as number) + (d.edgesCm[i + 1] as number));
      if (Math.abs(c - z) < 0.5) {
        s += x;
        v += (d.sigmaGyCm2[i] as number) ** 2;
        n++;
      }
    });
    // Bins from one run are correlated through shared histories; treating them as independent
    // understates σ a little, which the tolerances below allow for.
    return { mean: s / n, sigma: Math.sqrt(v) / n };
  });
}

/** A type-B engine's dose per photon fluence (Gy·cm²), averaged like the Monte Carlo bins. */
function engine(
  kind: 'superposition' | 'pencil-beam',
  energy: BeamEnergy,
  side: number,
  layers: LayerSpec[],
  depthsCm: number[],
) {
  const offsets = [-0.375, -0.125, 0.125, 0.375];
  const all = depthsCm.flatMap((z) => offsets.map((o) => z + o));
  const raw = typeBRawDose(
    kind,
    energy,
    makeSlabPhantom(layers),
    { ssdCm: 100, fieldXCm: side, fieldYCm: side },
    all,
    [0],
  );
  const meanMeV = makeSpectrumSampler(energy).meanEnergyMeV;
  return depthsCm.map((_, k) => {
    let s = 0;
    for (let j = 0; j < 4; j++) s += raw[4 * k + j] as number;
    return (s / 4) * meanMeV * GRAY_PER_MEV_PER_G;
  });
}

describe('type-B engines in lung below water against the Monte Carlo (15 MV, 4 × 4, SSD 100)', () => {
  // 5 cm water | 10 cm lung (ICRU-44, 0.25 g/cm³) | 15 cm water; 150 000 histories, seed 417.
  const depths = [6.5, 8, 10, 12.5, 14, 16, 22];
  let mc: { mean: number; sigma: number }[] = [];
  let sup: number[] = [];
  let pb: number[] = [];
  beforeAll(() => {
    mc = monteCarlo('15MV', 4, LUNG_BELOW_WATER, depths);
    sup = engine('superposition', '15MV', 4, LUNG_BELOW_WATER, depths);
    pb = engine('pencil-beam', '15MV', 4, LUNG_BELOW_WATER, depths);
  }, 60_000);
  const ratio = (a: number[], i: number) => (a[i] as number) / mc[i]!.mean;
  const rel = (i: number) => mc[i]!.sigma / mc[i]!.mean;

  it('superposition overestimates the build-down (1.5–5 cm into lung) by less than 8 %', () => {
    // What remains after tilting and hardening the kernels: +3.5–5.6 % here at 2 × 10⁶
    // histories (18 MV 5 × 5: +3.8–4.6 %). Rectilinear density scaling carries the electrons
    // set in motion in the water above along straight lines at the mean density, so the lung
    // keeps water's electron fluence too long. Miften et al. (J Appl Clin Med Phys 2, 21 (2001))
    // found model-based superposition within 3 % of Monte Carlo at 15 MV, 5 × 5 in lung: the
    // build-down of this small field is outside that. 3σ on top of the bounds.
    for (const i of [0, 1, 2]) {
      expect(ratio(sup, i)).toBeGreaterThan(1 - 3 * rel(i));
      expect(ratio(sup, i)).toBeLessThan(1.08 + 3 * rel(i));
    }
  });

  it('deep in the lung and 7 cm beyond it the superposition agrees within 3 %, the pencil beam does not', () => {
    // Deep lung (7.5–9 cm in): electrons from the water no longer reach; seen +0.0–1.8 %.
    // Beyond (22 cm): back in equilibrium. Pencil beam (1-D density scaling): +20–30 % in the
    // lung, the overestimate published for 1-D methods with small high-energy fields in lung
    // (10–20 % and more; Mackie et al. 1985, Klein et al. 1997, from memory).
    for (const i of [3, 4, 6]) expect(Math.abs(ratio(sup, i) - 1)).toBeLessThan(0.03 + 3 * rel(i));
    for (const i of [2, 3, 4]) expect(ratio(pb, i)).toBeGreaterThan(1.15);
  });

  it('the superposition underestimates the re-build-up 1 cm beyond the lung by less than 7 %', () => {
    // Seen −3.4 % (16 cm); the same straight-line scaling delays the return to water's level.
    expect(ratio(sup, 5)).toBeLessThan(1 + 3 * rel(5));
    expect(ratio(sup, 5)).toBeGreaterThan(0.93 - 3 * rel(5));
  });
});

describe('superposition in a uniform lung-density medium against the Monte Carlo (18 MV, 5 × 5)', () => {
  it('agrees within 2 % from 2 to 32 cm (density scaling is exact in a uniform medium)', () => {
    // O'Connor's theorem: the density-scaled water kernel is exact in a uniform medium of water's
    // composition; lung differs from water by < 1 % per electron (NIST). Seen −1.5 to −0.3 %
    // at 2 × 10⁶ histories. 150 000 histories, seed 417; 3σ on top of 2 %.
    const depths = [4, 8, 16, 32];
    const mc = monteCarlo('18MV', 5, UNIFORM_LUNG, depths);
    const sup = engine('superposition', '18MV', 5, UNIFORM_LUNG, depths);
    depths.forEach((_, i) => {
      const r = (sup[i] as number) / mc[i]!.mean;
      expect(Math.abs(r - 1)).toBeLessThan(0.02 + (3 * mc[i]!.sigma) / mc[i]!.mean);
    });
  });
});
