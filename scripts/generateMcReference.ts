// Monte Carlo water depth doses used as the reference of the type-B validation tests
// (npx tsx scripts/generateMcReference.ts [--histories N] [--seed S]). Runs the project's Monte
// Carlo engine (src/engine/montecarlo/runMonteCarlo.ts: central pencil, reciprocity scoring over
// the field aperture, batch statistics) for water 30 cm, SSD 100 cm, 10 × 10 cm² at 6 and 18 MV
// and writes per-bin dose per fluence with its one-standard-deviation uncertainty to
// tests/fixtures/mcWaterDepthDose.json, with the seed and histories recorded.
import { writeFileSync } from 'node:fs';
import { runMonteCarlo } from '../src/engine/montecarlo/runMonteCarlo';
import type { BeamEnergy } from '../src/engine/beam/energies';

function arg(name: string): string | undefined {
  const i = process.argv.indexOf(name);
  return i >= 0 ? process.argv[i + 1] : undefined;
}

const histories = Number(arg('--histories') ?? 400000);
const seed = Number(arg('--seed') ?? 20261202);
const energies: BeamEnergy[] = ['6MV', '18MV'];
const curves: Record<string, { edgesCm: number[]; dose: number[]; sigma: number[] }> = {};
for (const energy of energies) {
  const t0 = performance.now();
  const r = runMonteCarlo(
    {
      beam: { energy, setup: { kind: 'SSD', ssdCm: 100 }, fieldXCm: 10, fieldYCm: 10 },
      layers: [{ materialId: 'water', thicknessCm: 30 }],
      points: [],
    },
    { histories, seed, depthBinCm: 0.25 },
    [0],
  );
  const d = r.depthDose.case;
  curves[energy] = {
    edgesCm: d.edgesCm.map((x) => Number(x.toFixed(4))),
    dose: d.dosePerFluenceGyCm2.map((x) => Number(x.toPrecision(6))),
    sigma: d.sigmaGyCm2.map((x) => Number(x.toPrecision(4))),
  };
  console.log(
    `${energy}: ${histories} histories in ${((performance.now() - t0) / 1000).toFixed(0)} s`,
  );
}
writeFileSync(
  'tests/fixtures/mcWaterDepthDose.json',
  JSON.stringify(
    {
      generator: 'scripts/generateMcReference.ts',
      engine: 'src/engine/montecarlo/runMonteCarlo.ts (reciprocity scoring, dose to medium)',
      geometry: 'water 30 cm, SSD 100 cm, 10 × 10 cm² at 100 cm, central axis, 0.25 cm depth bins',
      seed,
      histories,
      unit: 'Gy·cm² per photon (dose per fluence at 100 cm), one standard deviation from batches',
      curves,
    },
    null,
    1,
  ),
);
