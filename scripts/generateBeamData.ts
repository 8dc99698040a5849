// Generates the modelled water data of every beam energy from the superposition engine in water
// (npm run generate:beamdata) → src/engine/data/generated/modelledBeams.bin (a typed-array file,
// src/io/typedArrayFile.ts: PDD and TMR rounded to 5 significant digits, stored as Float32).
// Reads the kernels written by scripts/generateKernels.ts; deterministic (no random numbers).
import { loadGeneratedDataFromDisk, writeTypedArrayFileSync } from '../src/io/generatedDataNode';
import { BEAM_ENERGIES } from '../src/engine/beam/energies';
import { headScatterDescription } from '../src/engine/beam/headScatter';
import { computeModelledBeamTables } from '../src/engine/beam/modelledBeamData';
import { KERNEL_FORMAT_DATE, KERNEL_FORMAT_VERSION } from '../src/engine/kernels/kernelFiles';
import { kernelProvenance } from '../src/engine/superposition/beamModel';
import type { ModelledBeamFile } from '../src/engine/beam/modelledBeamFile';

loadGeneratedDataFromDisk();

const r = (x: number, digits = 5) => Number(x.toPrecision(digits));
const beams: ModelledBeamFile['beams'] = {};
for (const energy of BEAM_ENERGIES) {
  const t0 = performance.now();
  const t = computeModelledBeamTables(energy);
  beams[energy] = {
    dMaxCm: r(t.dMaxCm, 4),
    fieldsCm: t.fieldsCm,
    depthsCm: t.depthsCm,
    pdd: t.pdd.map((row) => Float32Array.from(row, (x) => r(x))),
    tmr: t.tmr.map((row) => Float32Array.from(row, (x) => r(x))),
    psf: t.psf.map((x) => r(x)),
    sp: t.sp.map((x) => r(x)),
    sc: t.sc.map((x) => r(x)),
    pdd10: r(t.pdd10, 4),
    pdd2010: r(t.pdd2010, 4),
    tpr2010: r(t.tpr2010, 4),
  };
  console.log(
    `${energy}: d_max ${t.dMaxCm.toFixed(2)} cm, PDD(10) ${t.pdd10.toFixed(1)} %, TPR20,10 ${t.tpr2010.toFixed(3)} (${((performance.now() - t0) / 1000).toFixed(1)} s)`,
  );
}
const file: ModelledBeamFile = {
  format: 'lamina.modelledBeams',
  formatVersion: KERNEL_FORMAT_VERSION,
  formatDate: KERNEL_FORMAT_DATE,
  generator: 'scripts/generateBeamData.ts',
  kernels: kernelProvenance(),
  note: 'Superposition in water, photons from the kernels plus the contaminant-electron model (src/engine/data/contaminantElectrons.json). PDD: SSD 100 cm, field at the surface. TMR: point at 100 cm from the source, field at the point. PSF = D(d_max, s)/D_air with D_air the photon dose at the same point in a water mini-phantom of radius r_LCPE (Li et al. 1995); S_p = PSF/PSF(10); S_c: modelled head-scatter curve per energy.',
  headScatterModel: headScatterDescription(),
  referenceDosePerMuCGy: 1,
  beams,
};
writeTypedArrayFileSync('src/engine/data/generated/modelledBeams.bin', file);
console.log('written to src/engine/data/generated/modelledBeams.bin');
