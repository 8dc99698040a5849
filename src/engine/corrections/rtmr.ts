// Ratio of TMR at the effective (radiological) depth: CF = TMR(d′, s_d)/TMR(d, s_d)
// (Khan, TAR method; TG-65 "RTAR"; from memory). Uses only the total radiological depth.
import { radiologicalDepthCm } from '../phantom/slabPhantom';
import { checkedCf, collectingRecorder, type TypeAMethod } from './correctionTypes';
import type { CorrectionExplanation } from './correctionExplanation';

export const rtmrMethod: TypeAMethod = {
  id: 'rtmr',
  label: 'Ratio of TMR (effective depth)',
  variant: () => 'TMR(d′, s_d)/TMR(d, s_d), d′ by relative electron density',
  correct(phantom, pointDepthCm, sideAtDepthCm, wd, options) {
    const { recorder, flags } = collectingRecorder();
    const dEff = radiologicalDepthCm(phantom, pointDepthCm);
    const tmrEff = wd.tmr(dEff, sideAtDepthCm, recorder);
    const tmrD = wd.tmr(pointDepthCm, sideAtDepthCm, recorder);
    const ratio = tmrEff / tmrD;
    const explain = (): CorrectionExplanation => ({
      quantities: [
        { symbol: 'd', label: 'depth of the point', value: pointDepthCm, unit: 'cm' },
        { symbol: 'd′', label: 'radiological depth', value: dEff, unit: 'cm' },
        { symbol: 's_d', label: 'field side at the depth', value: sideAtDepthCm, unit: 'cm' },
        { symbol: 'TMR(d′, s_d)', label: 'TMR at the radiological depth', value: tmrEff, unit: '' },
        { symbol: 'TMR(d, s_d)', label: 'TMR at the depth', value: tmrD, unit: '' },
      ],
      factors: [{ symbol: 'TMR(d′, s_d)/TMR(d, s_d)', label: 'ratio of TMR', value: ratio }],
    });
    const cf = ratio;
    const f = flags();
    if (Math.min(dEff, pointDepthCm) < wd.dMaxCm)
      f.push('build-up: TMR read at a depth below d_max');
    return checkedCf(cf, f, options.explain ? explain() : undefined);
  },
};
