import { describe, expect, it } from 'vitest';
import { Transport, type McScorer } from '../../src/engine/montecarlo/transport';
import { slabGeometry } from '../../src/engine/montecarlo/geometry';
import { Rng } from '../../src/engine/montecarlo/rng';
import { makeSlabPhantom, type LayerSpec } from '../../src/engine/phantom/slabPhantom';
import { runBatch } from '../../src/engine/montecarlo/runBatch';
import { DEFAULT_BINNING } from '../../src/engine/montecarlo/scenario';

/** Fraction of monoenergetic photons, normally incident, leaving the bottom without interacting. */
function uncollidedTransmission(
  layers: LayerSpec[],
  energyMeV: number,
  n: number,
  seed: number,
): number {
  let through = 0;
  const scorer: McScorer = {
    deposit() {},
    escape(kind, _e, _z, w, uncollided) {
      if (kind === 0 && uncollided && w > 0) through++;
    },
  };
  const t = new Transport(slabGeometry(makeSlabPhantom(layers)), scorer);
  const rng = new Rng(seed, 0);
  for (let h = 0; h < n; h++) {
    rng.seedHistory(seed, h);
    t.runPhoton(energyMeV, 0, 0, 0, 0, 0, 1, 0, rng);
  }
  return through / n;
}

describe('Monte Carlo photon transport in slabs', () => {
  it('narrow-beam primary transmission through 20 cm of water at 2 MeV equals exp(−μx) within 3σ', () => {
    // NIST SRD 126: water μ/ρ(2 MeV) = 0.04942 cm²/g → T = exp(−0.9884) = 0.3722.
    // The engine omits coherent scattering (1.4e-5 cm²/g, XCOM), which shifts T by +0.03 % only.
    const n = 20000;
    const expected = Math.exp(-0.04942 * 20);
    const sigma = Math.sqrt((expected * (1 - expected)) / n);
    const measured = uncollidedTransmission([{ materialId: 'water', thicknessCm: 20 }], 2, n, 17);
    expect(Math.abs(measured - expected)).toBeLessThanOrEqual(3 * sigma);
  });

  it('transmission through water then lung (0.26 g/cm³) carries the optical depth across the interface', () => {
    // NIST SRD 126 at 1.25 MeV: water 0.06323, lung (ICRU-44) 0.06271 cm²/g.
    const n = 20000;
    const layers: LayerSpec[] = [
      { materialId: 'water', thicknessCm: 5 },
      { materialId: 'lung', thicknessCm: 10, densityGPerCm3: 0.26 },
      { materialId: 'water', thicknessCm: 5 },
    ];
    const expected = Math.exp(-0.06323 * 10 - 0.06271 * 0.26 * 10);
    const sigma = Math.sqrt((expected * (1 - expected)) / n);
    const measured = uncollidedTransmission(layers, 1.25, n, 23);
    // 3σ; coherent scattering (omitted by the engine) shifts T by < 0.05 % here.
    expect(Math.abs(measured - expected)).toBeLessThanOrEqual(3 * sigma);
  });

  it('a photon leaving through the surface escapes and is not transported back', () => {
    const scorer: McScorer = { deposit: () => {} };
    const t = new Transport(
      slabGeometry(makeSlabPhantom([{ materialId: 'water', thicknessCm: 10 }])),
      scorer,
    );
    t.runPhoton(1, 0, 0, 0, 0, 0, -1, 0, new Rng(1, 0));
    expect(t.tally.escapedMeV).toBe(1);
    expect(t.tally.depositedMeV + t.tally.belowCutoffMeV).toBe(0);
  });

  it('runBatch(...) balances energy: deposited + escaped + below cutoff = incident to 1e-9 (18 MV, mixed slabs)', () => {
    // 18 MV exercises pair production, positron annihilation and escaping positrons.
    const tally = runBatch({
      scenario: {
        energy: '18MV',
        ssdCm: 100,
        fieldXCm: 10,
        fieldYCm: 10,
        layers: [
          { materialId: 'softTissue', thicknessCm: 2 },
          { materialId: 'lung', thicknessCm: 5, densityGPerCm3: 0.26 },
          { materialId: 'corticalBone', thicknessCm: 1 },
          { materialId: 'air', thicknessCm: 1 },
          { materialId: 'water', thicknessCm: 4 },
        ],
      },
      binning: DEFAULT_BINNING,
      seed: 5,
      batchIndex: 0,
      historiesPerBatch: 4000,
    });
    const e = tally.energy;
    expect(e.incidentMeV).toBeGreaterThan(0);
    expect(e.escapedMeV).toBeGreaterThan(0);
    expect(
      Math.abs(e.depositedMeV + e.escapedMeV + e.belowCutoffMeV - e.incidentMeV) / e.incidentMeV,
    ).toBeLessThan(1e-9);
  });

  it('electrons in a thin layer stop at each boundary: no deposit in a 1 cm air gap exceeds what its mass allows', () => {
    // Air at 0.001205 g/cm³: a 1 cm gap holds 1.2e-3 g/cm²; an electron crossing it loses at most
    // S_tot·ρ·ℓ per cm of path (≈ 2 MeV cm²/g × 1.2e-3 g/cm² × path). If steps ignored the boundary,
    // water-sized steps would be scored inside the gap and the gap dose would be far larger.
    let gapMeV = 0;
    let totalMeV = 0;
    const scorer: McScorer = {
      deposit(_x, _y, z, _r, e) {
        totalMeV += e;
        if (z > 3 && z < 4) gapMeV += e;
      },
    };
    const layers: LayerSpec[] = [
      { materialId: 'water', thicknessCm: 3 },
      { materialId: 'air', thicknessCm: 1 },
      { materialId: 'water', thicknessCm: 3 },
    ];
    const t = new Transport(slabGeometry(makeSlabPhantom(layers)), scorer);
    const rng = new Rng(3, 0);
    for (let h = 0; h < 3000; h++) {
      rng.seedHistory(3, h);
      t.runPhoton(6, 0, 0, 0, 0, 0, 1, 0, rng);
    }
    expect(totalMeV).toBeGreaterThan(0);
    expect(gapMeV / totalMeV).toBeLessThan(0.005);
  });
});
