// Equivalent tissue–air ratio (Sontag & Cunningham 1978; formula from Khan and TG-65, from memory):
// CF = TAR(d′, ρ̃·s_d)/TAR(d, s_d), evaluated with TMR tables as
// [TMR(d′, s̃)/TMR(d, s_d)]·[PSF(s̃)/PSF(s_d)] — the PSF ratio is part of the method.
// ρ̃ is user-entered or a weighted mean of the layers' relative electron densities.
import { effectiveAttenuationPerCm } from '../beam/waterDataFunctions';
import { radiologicalDepthCm } from '../phantom/slabPhantom';
import { checkedCf, collectingRecorder, type TypeAMethod } from './correctionTypes';
import { exponentialKernelWeights, weightedDensity } from './etarScatterWeights';

/** Default scatter length λ = 1/μ_eff; 25 cm when the table gives no positive slope. */
function scatterLengthCm(wd: Parameters<typeof effectiveAttenuationPerCm>[0]): number {
  const mu = effectiveAttenuationPerCm(wd);
  return mu > 0 && Number.isFinite(mu) ? 1 / mu : 25;
}

export const etarMethod: TypeAMethod = {
  id: 'etar',
  label: 'Equivalent TAR',
  variant: (o) => {
    const rho =
      o.etarRhoTilde !== undefined
        ? `ρ̃ = ${o.etarRhoTilde} (entered)`
        : o.etarWeights
          ? `ρ̃ from layer weights: ${o.etarWeightsSource ?? 'supplied scatter weights'}`
          : `ρ̃ from an exponential scatter kernel over the field (λ = ${o.etarScatterLengthCm !== undefined ? `${o.etarScatterLengthCm} cm` : '1/μ_eff'})`;
    return `TAR form (TMR × PSF ratio), s̃ = ρ̃·s_d, ${rho}`;
  },
  usesPsf: () => true,
  correct(phantom, pointDepthCm, sideAtDepthCm, wd, options) {
    const { recorder, flags } = collectingRecorder();
    let rhoTilde = options.etarRhoTilde;
    if (rhoTilde === undefined) {
      const weightsOf =
        options.etarWeights ??
        exponentialKernelWeights(options.etarScatterLengthCm ?? scatterLengthCm(wd));
      rhoTilde = weightedDensity(phantom, weightsOf(phantom, pointDepthCm, sideAtDepthCm));
    }
    const dEff = radiologicalDepthCm(phantom, pointDepthCm);
    const sTilde = rhoTilde * sideAtDepthCm;
    const cf =
      (wd.tmr(dEff, sTilde, recorder) / wd.tmr(pointDepthCm, sideAtDepthCm, recorder)) *
      (wd.psf(sTilde, recorder) / wd.psf(sideAtDepthCm, recorder));
    const out = flags();
    out.push(`ρ̃ = ${rhoTilde.toFixed(3)}`);
    if (Math.min(dEff, pointDepthCm) < wd.dMaxCm)
      out.push('build-up: TMR read at a depth below d_max');
    return checkedCf(cf, out);
  },
};
