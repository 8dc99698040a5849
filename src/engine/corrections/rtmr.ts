// Ratio of TMR at the effective (radiological) depth: CF = TMR(d′, s_d)/TMR(d, s_d)
// (Khan, TAR method; TG-65 "RTAR"; from memory). Uses only the total radiological depth.
import { radiologicalDepthCm } from '../phantom/slabPhantom';
import { checkedCf, collectingRecorder, type TypeAMethod } from './correctionTypes';

export const rtmrMethod: TypeAMethod = {
  id: 'rtmr',
  label: 'Ratio of TMR (effective depth)',
  variant: () => 'TMR(d′, s_d)/TMR(d, s_d), d′ by relative electron density',
  correct(phantom, pointDepthCm, sideAtDepthCm, wd) {
    const { recorder, flags } = collectingRecorder();
    const dEff = radiologicalDepthCm(phantom, pointDepthCm);
    const cf =
      wd.tmr(dEff, sideAtDepthCm, recorder) / wd.tmr(pointDepthCm, sideAtDepthCm, recorder);
    const f = flags();
    if (Math.min(dEff, pointDepthCm) < wd.dMaxCm)
      f.push('build-up: TMR read at a depth below d_max');
    return checkedCf(cf, f);
  },
};
