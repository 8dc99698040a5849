// Equivalent path length with PDD data (TG-65 "EPL"; our derivation of the inverse-square term):
// CF = [PDD(d′, s, f)/PDD(d, s, f)]·((f + d′)/(f + d))². The PDD at d′ carries the inverse square
// to depth d′ while the point sits at d, hence the square bracket.
import { pddOf } from '../beam/waterDataFunctions';
import { radiologicalDepthCm } from '../phantom/slabPhantom';
import { checkedCf, collectingRecorder, type TypeAMethod } from './correctionTypes';

/** The inverse-square factor ((f + d′)/(f + d))² of EPL with PDD data. */
export function eplInverseSquareFactor(
  ssdCm: number,
  depthCm: number,
  radiologicalDepthCm: number,
): number {
  const r = (ssdCm + radiologicalDepthCm) / (ssdCm + depthCm);
  return r * r;
}

export const eplPddMethod: TypeAMethod = {
  id: 'epl-pdd',
  label: 'Equivalent path length with PDD',
  variant: (o) =>
    `PDD(d′, s, f)/PDD(d, s, f) × ((f+d′)/(f+d))², PDD rebuilt from TMR at f = ${o.ssdCm ?? '?'} cm`,
  correct(phantom, pointDepthCm, sideAtDepthCm, wd, options) {
    const f = options.ssdCm;
    if (f === undefined) return { cf: null, flags: ['undefined: EPL with PDD needs the SSD'] };
    const { recorder, flags } = collectingRecorder();
    const dEff = radiologicalDepthCm(phantom, pointDepthCm);
    const surfaceSideCm = (sideAtDepthCm * f) / (f + pointDepthCm);
    const ratio =
      pddOf(wd, dEff, surfaceSideCm, f, recorder) /
      pddOf(wd, pointDepthCm, surfaceSideCm, f, recorder);
    const out = flags();
    if (Math.min(dEff, pointDepthCm) < wd.dMaxCm)
      out.push('build-up: PDD read at a depth below d_max');
    return checkedCf(ratio * eplInverseSquareFactor(f, pointDepthCm, dEff), out);
  },
};
