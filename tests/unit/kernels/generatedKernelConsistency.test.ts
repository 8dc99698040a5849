// The generated kernel files agree with each other: the stored beam kernels are the stored
// monoenergetic kernels weighted by the spectra, and the stored pencil kernels follow from the
// beam kernels. Guards against one file being regenerated without the others.
import { describe, expect, it } from 'vitest';
import { readTypedArrayFileSync } from '../../../src/io/generatedDataNode';
import type { MonoKernelFile } from '../../../src/engine/kernels/kernelFiles';
import { PENCIL_RADII_CM } from '../../../src/engine/kernels/kernelFiles';
import {
  polyenergeticKernel,
  type MonoKernel,
} from '../../../src/engine/kernels/polyenergeticKernel';
import { beamSpectrum } from '../../../src/engine/kernels/spectrum';
import { cylinderCumulative } from '../../../src/engine/kernels/cylinderCumulative';
import {
  beamHardenedKernel,
  beamHardeningMix,
  beamPencilKernel,
  beamPointKernel,
} from '../../../src/engine/superposition/beamModel';
import { hardenedKernel, hardeningMixFractions } from '../../../src/engine/kernels/kernelHardening';
import { buildPencilKernel, pencilRadialAt } from '../../../src/engine/superposition/pencilKernel';
import { expectRelClose } from '../../helpers/expectClose';

const MONO = readTypedArrayFileSync(
  'src/engine/data/generated/pointKernelsMono.bin',
) as MonoKernelFile;
const mono: MonoKernel[] = MONO.kernels.map((k) => ({
  label: `${k.energyMeV} MeV`,
  energyMeV: k.energyMeV,
  radialEdgesCm: Float64Array.from(MONO.radialEdgesCm),
  polarBins: MONO.polarBins,
  primary: Float64Array.from(k.primary),
  scatter: Float64Array.from(k.scatter),
  escapedFraction: k.escapedFraction,
}));

describe('generated kernel files', () => {
  it.each(['Co-60', '10MV'] as const)(
    'the %s beam kernel is the spectrum-weighted sum of the monoenergetic kernels',
    (energy) => {
      const rebuilt = polyenergeticKernel(mono, beamSpectrum(energy), energy);
      const stored = beamPointKernel(energy);
      let checked = 0;
      for (let i = 0; i < stored.primary.length; i++) {
        const s = (stored.primary[i] as number) + (stored.scatter[i] as number);
        if (s < 1e-4) continue;
        // Stored with 5 significant digits: 1e-4 relative.
        expectRelClose(s, (rebuilt.primary[i] as number) + (rebuilt.scatter[i] as number), 1e-4);
        checked++;
      }
      expect(checked).toBeGreaterThan(200);
    },
  );

  it('the 6 MV hardened kernel and mixing fractions follow from the monoenergetic kernels', () => {
    const spectrum = beamSpectrum('6MV');
    const rebuilt = hardenedKernel(mono, spectrum, '6MV');
    const stored = beamHardenedKernel('6MV');
    for (let i = 0; i < stored.primary.length; i++) {
      const s = (stored.primary[i] as number) + (stored.scatter[i] as number);
      // Stored with 5 significant digits: 1e-4 relative.
      if (s >= 1e-4)
        expectRelClose(s, (rebuilt.primary[i] as number) + (rebuilt.scatter[i] as number), 1e-4);
    }
    const f = hardeningMixFractions(mono, spectrum);
    // f(0) = 0 by construction; the others stored with 5 significant digits.
    expect(beamHardeningMix('6MV').mixFractions[0]).toBe(0);
    beamHardeningMix('6MV').mixFractions.forEach((x, i) => {
      if (i > 0) expectRelClose(x, f[i] as number, 1e-4);
    });
  });

  it('the 6 MV pencil kernel follows from the 6 MV beam kernels', () => {
    const q = {
      base: cylinderCumulative(beamPointKernel('6MV'), 'total'),
      hardened: cylinderCumulative(beamHardenedKernel('6MV'), 'total'),
    };
    const depths = [1.5, 10];
    const rebuilt = buildPencilKernel(
      q,
      beamHardeningMix('6MV'),
      beamSpectrum('6MV'),
      depths,
      PENCIL_RADII_CM,
    );
    const stored = beamPencilKernel('6MV');
    for (const d of depths)
      for (const s of [0.5, 3, 10, 40]) {
        // The stored table was built the same way (5 digits) and is read back by bilinear
        // interpolation between radii: 0.5 %.
        expectRelClose(pencilRadialAt(stored, d, s), pencilRadialAt(rebuilt, d, s), 0.005);
      }
  });
});
