// Equivalent tissue–air ratio (Sontag & Cunningham 1978; formula from Khan and TG-65, from memory):
// CF = TAR(d′, ρ̃·s_d)/TAR(d, s_d), evaluated with TMR tables as
// [TMR(d′, s̃)/TMR(d, s_d)]·[PSF(s̃)/PSF(s_d)] — the PSF ratio is part of the method.
// ρ̃ is user-entered or a weighted mean of the layers' relative electron densities.
import { effectiveAttenuationPerCm } from '../beam/waterDataFunctions';
import { radiologicalDepthCm } from '../phantom/slabPhantom';
import { checkedCf, collectingRecorder, type TypeAMethod } from './correctionTypes';
import { equalAreaRadiusCm, exponentialKernelWeights, weightedDensity } from './etarScatterWeights';
import type { CorrectionExplanation } from './correctionExplanation';

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
    let weights: Float64Array | null = null;
    if (rhoTilde === undefined) {
      const weightsOf =
        options.etarWeights ??
        exponentialKernelWeights(options.etarScatterLengthCm ?? scatterLengthCm(wd));
      weights = weightsOf(phantom, pointDepthCm, sideAtDepthCm);
      rhoTilde = weightedDensity(phantom, weights);
    }
    const dEff = radiologicalDepthCm(phantom, pointDepthCm);
    const sTilde = rhoTilde * sideAtDepthCm;
    const tmrEff = wd.tmr(dEff, sTilde, recorder);
    const tmrD = wd.tmr(pointDepthCm, sideAtDepthCm, recorder);
    const psfEff = wd.psf(sTilde, recorder);
    const psfS = wd.psf(sideAtDepthCm, recorder);
    const tmrRatio = tmrEff / tmrD;
    const psfRatio = psfEff / psfS;
    const explain = (): CorrectionExplanation => {
      const explanation: CorrectionExplanation = {
        quantities: [
          { symbol: 'd', label: 'depth of the point', value: pointDepthCm, unit: 'cm' },
          { symbol: 'd′', label: 'effective (radiological) depth', value: dEff, unit: 'cm' },
          {
            symbol: 'ρ̃',
            label: weights
              ? 'weighted relative electron density (scatter weights of the layers)'
              : 'effective density (entered)',
            value: rhoTilde,
            unit: '',
          },
          { symbol: 's_d', label: 'field side at the depth', value: sideAtDepthCm, unit: 'cm' },
          { symbol: 's̃ = ρ̃·s_d', label: 'effective field side', value: sTilde, unit: 'cm' },
          {
            symbol: 'r̃ = ρ̃·r',
            label: 'effective field radius (disc of equal area)',
            value: equalAreaRadiusCm(sTilde),
            unit: 'cm',
          },
          {
            symbol: 'TAR(d′, s̃)',
            label: 'TAR = TMR·PSF at d′, s̃',
            value: tmrEff * psfEff,
            unit: '',
          },
          { symbol: 'TAR(d, s_d)', label: 'TAR = TMR·PSF at d, s_d', value: tmrD * psfS, unit: '' },
        ],
        factors: [
          { symbol: 'TMR(d′, s̃)/TMR(d, s_d)', label: 'ratio of TMR', value: tmrRatio },
          { symbol: 'PSF(s̃)/PSF(s_d)', label: 'ratio of PSF', value: psfRatio },
        ],
      };
      if (weights)
        phantom.layers.forEach((l, j) =>
          explanation.quantities.push({
            symbol: `W_${j + 1}`,
            label: `scatter weight of layer ${j + 1} (ρ_e ${l.relativeElectronDensity.toFixed(3)})`,
            value: weights[j] as number,
            unit: '',
          }),
        );
      return explanation;
    };
    const cf = tmrRatio * psfRatio;
    const out = flags();
    out.push(`ρ̃ = ${rhoTilde.toFixed(3)}`);
    if (Math.min(dEff, pointDepthCm) < wd.dMaxCm)
      out.push('build-up: TMR read at a depth below d_max');
    return checkedCf(cf, out, options.explain ? explain() : undefined);
  },
};
