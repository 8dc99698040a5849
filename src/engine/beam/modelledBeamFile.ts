// Shape of the generated modelled-beam file (src/engine/data/generated/modelledBeams.bin, written
// by scripts/generateBeamData.ts as a typed-array file, src/io/typedArrayFile.ts): PDD and TMR
// rows as Float32 (rounded to 5 significant digits first), grids and factors as exact numbers.
import type { BeamEnergy } from './energies';
import type { ModelledBeamTables } from './modelledBeamData';

export interface StoredModelledBeam extends Omit<ModelledBeamTables, 'energy' | 'pdd' | 'tmr'> {
  /** PDD (%) per field, over depthsCm. */
  pdd: Float32Array[];
  /** TMR per field (side at the depth of the point), over depthsCm. */
  tmr: Float32Array[];
}

export interface ModelledBeamFile {
  format: 'lamina.modelledBeams';
  formatVersion: number;
  formatDate: string;
  generator: string;
  kernels: string;
  note: string;
  headScatterModel: string;
  referenceDosePerMuCGy: number;
  beams: Partial<Record<BeamEnergy, StoredModelledBeam>>;
}
