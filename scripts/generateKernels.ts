// Generates the kernel data the type-B engines read (npm run generate:kernels):
//  1. monoenergetic water point kernels by Monte Carlo (src/engine/montecarlo/pointKernel.ts):
//     first interaction forced at the centre of a 60 cm water sphere, 48 polar bins of 3.75°,
//     the classic radial edges 0.05 … 60 cm (Mackie et al., PMB 33, 1 (1988), bin layout),
//     primary and scatter separate            → src/engine/data/generated/pointKernelsMono.bin
//  2. polyenergetic point kernels per beam, weights w_E ∝ Φ_E·E·(μ/ρ)(E), with the kernel released
//     behind 20 cm of water and the mixing fraction f(t) of their hardening with depth
//     (src/engine/kernels/kernelHardening.ts)
//                                             → src/engine/data/generated/beamKernels.bin
//  3. pencil-beam kernels per beam (depth × radius, radial cumulative) from (2)
//                                             → src/engine/data/generated/pencilKernels.bin
// Options: --histories N (per energy, default 100000), --seed S, --from-mono (skip step 1 and
// rebuild 2–3 from the stored monoenergetic kernels). Files are typed-array files
// (src/io/typedArrayFile.ts): bin values rounded to 5 significant digits, stored as Float32.
import { mkdirSync } from 'node:fs';
import { readTypedArrayFileSync, writeTypedArrayFileSync } from '../src/io/generatedDataNode';
import { simulatePointKernel } from '../src/engine/montecarlo/pointKernel';
import { BEAM_ENERGIES } from '../src/engine/beam/energies';
import { beamSpectrum } from '../src/engine/kernels/spectrum';
import { polyenergeticKernel, kernelWeights } from '../src/engine/kernels/polyenergeticKernel';
import {
  HARDENING_FILTRATIONS_CM,
  HARDENING_REFERENCE_CM,
  hardenedKernel,
  hardeningMixFractions,
} from '../src/engine/kernels/kernelHardening';
import { cylinderCumulative } from '../src/engine/kernels/cylinderCumulative';
import { buildPencilKernel } from '../src/engine/superposition/pencilKernel';
import {
  KERNEL_FORMAT_DATE,
  KERNEL_FORMAT_VERSION,
  monoKernelsOfFile,
  PENCIL_DEPTHS_CM,
  PENCIL_RADII_CM,
  type BeamKernelFile,
  type MonoKernelFile,
  type PencilKernelFile,
} from '../src/engine/kernels/kernelFiles';

const OUT_DIR = 'src/engine/data/generated';
const ENERGIES_MEV = [0.1, 0.2, 0.35, 0.5, 0.75, 1, 1.25, 1.5, 2, 3, 4, 5, 6, 8, 10, 12.5, 15, 20];
const RADIAL_EDGES_CM = [
  0.05, 0.1, 0.15, 0.2, 0.3, 0.4, 0.5, 0.6, 0.8, 1, 1.5, 2, 3, 4, 5, 6, 8, 10, 15, 20, 30, 40, 50,
  60,
];
const POLAR_BINS = 48;

function arg(name: string): string | undefined {
  const i = process.argv.indexOf(name);
  return i >= 0 ? process.argv[i + 1] : undefined;
}

const round = (a: ArrayLike<number>, digits = 5): Float32Array =>
  Float32Array.from(a, (x) => (x === 0 ? 0 : Number(x.toPrecision(digits))));

function simulateMono(histories: number, seed: number): MonoKernelFile {
  const kernels: MonoKernelFile['kernels'] = [];
  ENERGIES_MEV.forEach((energyMeV, i) => {
    const t0 = performance.now();
    const r = simulatePointKernel({
      energyMeV,
      histories,
      seed: seed + i,
      radialEdgesCm: RADIAL_EDGES_CM,
      polarBins: POLAR_BINS,
    });
    kernels.push({
      energyMeV,
      seed: seed + i,
      primary: round(r.primary),
      scatter: round(r.scatter),
      escapedFraction: Number(r.escapedFraction.toPrecision(6)),
    });
    const dt = ((performance.now() - t0) / 1000).toFixed(1);
    console.log(`  ${energyMeV} MeV: ${histories} histories, ${dt} s`);
  });
  return {
    format: 'lamina.pointKernels.mono',
    formatVersion: KERNEL_FORMAT_VERSION,
    formatDate: KERNEL_FORMAT_DATE,
    generator: 'scripts/generateKernels.ts',
    monteCarlo:
      'src/engine/montecarlo/pointKernel.ts simulatePointKernel (forced first interaction at the centre of a 60 cm water sphere; default transport settings)',
    seed,
    historiesPerEnergy: histories,
    note: 'Photon kernels (contaminant electrons are a separate model). Energy fraction of the incident photon per bin; index polar·nRadial + radial; polar bins equal in angle over 0–180° from the photon direction.',
    radialEdgesCm: RADIAL_EDGES_CM,
    polarBins: POLAR_BINS,
    kernels,
  };
}

function main(): void {
  mkdirSync(OUT_DIR, { recursive: true });
  const monoPath = `${OUT_DIR}/pointKernelsMono.bin`;
  let mono: MonoKernelFile;
  if (process.argv.includes('--from-mono')) {
    mono = readTypedArrayFileSync(monoPath) as MonoKernelFile;
    console.log(`monoenergetic kernels read from ${monoPath}`);
  } else {
    const histories = Number(arg('--histories') ?? 100000);
    const seed = Number(arg('--seed') ?? 20261201);
    console.log(`monoenergetic kernels: ${ENERGIES_MEV.length} energies × ${histories} histories`);
    mono = simulateMono(histories, seed);
    writeTypedArrayFileSync(monoPath, mono);
  }
  const kernels = monoKernelsOfFile(mono);
  const provenance = {
    formatVersion: KERNEL_FORMAT_VERSION,
    formatDate: KERNEL_FORMAT_DATE,
    generator: 'scripts/generateKernels.ts',
    seed: mono.seed,
    historiesPerEnergy: mono.historiesPerEnergy,
    monoEnergiesMeV: ENERGIES_MEV,
  };
  const beams: BeamKernelFile['beams'] = {};
  const pencils: PencilKernelFile['beams'] = {};
  for (const energy of BEAM_ENERGIES) {
    const spectrum = beamSpectrum(energy);
    const poly = polyenergeticKernel(kernels, spectrum, energy);
    const hard = hardenedKernel(kernels, spectrum, energy);
    const mixFractions = hardeningMixFractions(kernels, spectrum);
    beams[energy] = {
      weights: round(kernelWeights(kernels, spectrum), 6),
      primary: round(poly.primary),
      scatter: round(poly.scatter),
      escapedFraction: Number(poly.escapedFraction.toPrecision(6)),
      spectrumSource: spectrum.source,
      hardened: {
        filtrationCm: HARDENING_REFERENCE_CM,
        primary: round(hard.primary),
        scatter: round(hard.scatter),
        escapedFraction: Number(hard.escapedFraction.toPrecision(6)),
      },
      hardening: {
        filtrationsCm: [...HARDENING_FILTRATIONS_CM],
        mixFractions: mixFractions.map((f) => Number(f.toPrecision(5))),
      },
    };
    const t0 = performance.now();
    const pencil = buildPencilKernel(
      { base: cylinderCumulative(poly, 'total'), hardened: cylinderCumulative(hard, 'total') },
      { filtrationsCm: HARDENING_FILTRATIONS_CM, mixFractions },
      spectrum,
      PENCIL_DEPTHS_CM,
      PENCIL_RADII_CM,
    );
    pencils[energy] = { values: round(pencil.values) };
    console.log(
      `  ${energy}: polyenergetic and pencil kernels (${((performance.now() - t0) / 1000).toFixed(1)} s)`,
    );
  }
  const beamFile: BeamKernelFile = {
    format: 'lamina.pointKernels.beams',
    ...provenance,
    note: 'Polyenergetic water point kernels, w_E ∝ Φ_E·E·(μ/ρ)(E), from the monoenergetic Monte Carlo kernels in pointKernelsMono.bin; per beam also the kernel released behind 20 cm of water (hardened) and f(t) of K(t) ≈ K(0) + f(t)·[K(20) − K(0)]. Photon kernels: contaminant electrons are a separate model (src/engine/beam/contaminantElectrons.ts).',
    radialEdgesCm: mono.radialEdgesCm,
    polarBins: mono.polarBins,
    beams,
  };
  const pencilFile: PencilKernelFile = {
    format: 'lamina.pencilKernels',
    ...provenance,
    note: 'P(d, S) = dose within radius S at depth d from a pencil of unit energy fluence in water (radial cumulative), built from beamKernels.bin with water TERMA per energy bin, kernels hardened with depth and tilted along the rays (the shear of slabSuperposition.ts). Photon kernels: contaminant electrons are a separate model.',
    depthsCm: PENCIL_DEPTHS_CM,
    radiiCm: PENCIL_RADII_CM,
    beams: pencils,
  };
  writeTypedArrayFileSync(`${OUT_DIR}/beamKernels.bin`, beamFile);
  writeTypedArrayFileSync(`${OUT_DIR}/pencilKernels.bin`, pencilFile);
  console.log(`written to ${OUT_DIR}`);
}

main();
