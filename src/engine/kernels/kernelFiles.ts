// Shapes of the generated kernel files in src/engine/data/generated/ (written by
// scripts/generateKernels.ts as typed-array files, src/io/typedArrayFile.ts) and the grids they
// share. Bin values are stored as Float32 (the generator rounds them to 5 significant digits
// first, so Float32 keeps them to 6e-8); grids stay exact decimal numbers.
import type { BeamEnergy } from '../beam/energies';
import type { MonoKernel } from './polyenergeticKernel';

export const KERNEL_FORMAT_VERSION = 1;
export const KERNEL_FORMAT_DATE = '2026-12-01';

interface Provenance {
  formatVersion: number;
  formatDate: string;
  generator: string;
  seed: number;
  historiesPerEnergy: number;
  note: string;
}

export interface MonoKernelFile extends Provenance {
  format: 'lamina.pointKernels.mono';
  monteCarlo: string;
  radialEdgesCm: number[];
  polarBins: number;
  kernels: {
    energyMeV: number;
    seed: number;
    primary: Float32Array;
    scatter: Float32Array;
    escapedFraction: number;
  }[];
}

export interface BeamKernelFile extends Provenance {
  format: 'lamina.pointKernels.beams';
  monoEnergiesMeV: number[];
  radialEdgesCm: number[];
  polarBins: number;
  beams: Partial<
    Record<
      BeamEnergy,
      {
        weights: Float32Array;
        primary: Float32Array;
        scatter: Float32Array;
        escapedFraction: number;
        spectrumSource: string;
        /** The kernel released behind `filtrationCm` of water (kernelHardening.ts). */
        hardened: {
          filtrationCm: number;
          primary: Float32Array;
          scatter: Float32Array;
          escapedFraction: number;
        };
        /** f(t) of K(t) ≈ K(0) + f(t)·[K(t_ref) − K(0)]. */
        hardening: { filtrationsCm: number[]; mixFractions: number[] };
      }
    >
  >;
}

export interface PencilKernelFile extends Provenance {
  format: 'lamina.pencilKernels';
  monoEnergiesMeV: number[];
  depthsCm: number[];
  radiiCm: number[];
  beams: Partial<Record<BeamEnergy, { values: Float32Array }>>;
}

/** The monoenergetic kernels of a stored file as kernel tables (ascending energy). */
export function monoKernelsOfFile(file: MonoKernelFile): MonoKernel[] {
  return file.kernels.map((k) => ({
    label: `${k.energyMeV} MeV`,
    energyMeV: k.energyMeV,
    radialEdgesCm: Float64Array.from(file.radialEdgesCm),
    polarBins: file.polarBins,
    primary: Float64Array.from(k.primary),
    scatter: Float64Array.from(k.scatter),
    escapedFraction: k.escapedFraction,
  }));
}

function range(from: number, to: number, step: number): number[] {
  const out: number[] = [];
  const n = Math.round((to - from) / step);
  for (let i = 0; i <= n; i++) out.push(Number((from + i * step).toFixed(6)));
  return out;
}

/** Pencil-kernel depths: 0.1 cm steps to 6 cm, 0.25 cm to 30 cm, 0.5 cm to 60 cm. */
export const PENCIL_DEPTHS_CM: number[] = [
  ...range(0, 6, 0.1),
  ...range(6.25, 30, 0.25),
  ...range(30.5, 60, 0.5),
];

/** Pencil-kernel radii: 0, then a sinh-spaced grid to 60 cm (fine near the axis). */
export const PENCIL_RADII_CM: number[] = Array.from({ length: 41 }, (_, k) =>
  Number(((60 * Math.sinh((5 * k) / 40)) / Math.sinh(5)).toFixed(5)),
);
