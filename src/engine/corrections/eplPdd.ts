// Equivalent path length with PDD data (TG-65 "EPL"; our derivation of the inverse-square term):
// CF = [PDD(d′, s, f)/PDD(d, s, f)]·((f + d′)/(f + d))². The PDD at d′ carries the inverse square
// to depth d′ while the point sits at d, hence the square bracket.
import { pddOf } from '../beam/waterDataFunctions';
import { radiologicalDepthCm } from '../phantom/slabPhantom';
import { checkedCf, collectingRecorder, type TypeAMethod } from './correctionTypes';
import type { CorrectionExplanation } from './correctionExplanation';

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
    const pddEff = pddOf(wd, dEff, surfaceSideCm, f, recorder);
    const pddD = pddOf(wd, pointDepthCm, surfaceSideCm, f, recorder);
    const inverseSquare = eplInverseSquareFactor(f, pointDepthCm, dEff);
    const pddRatio = pddEff / pddD;
    const explain = (): CorrectionExplanation => ({
      quantities: [
        { symbol: 'd', label: 'depth of the point', value: pointDepthCm, unit: 'cm' },
        { symbol: 'd′', label: 'radiological depth', value: dEff, unit: 'cm' },
        { symbol: 'f', label: 'SSD', value: f, unit: 'cm' },
        { symbol: 's', label: 'field side at the surface', value: surfaceSideCm, unit: 'cm' },
        {
          symbol: 'PDD(d′, s, f)',
          label: 'PDD at the radiological depth',
          value: pddEff,
          unit: '%',
        },
        { symbol: 'PDD(d, s, f)', label: 'PDD at the depth', value: pddD, unit: '%' },
      ],
      factors: [
        { symbol: 'PDD(d′, s, f)/PDD(d, s, f)', label: 'ratio of PDD', value: pddRatio },
        { symbol: '((f+d′)/(f+d))²', label: 'inverse-square term', value: inverseSquare },
      ],
    });
    const out = flags();
    if (Math.min(dEff, pointDepthCm) < wd.dMaxCm)
      out.push('build-up: PDD read at a depth below d_max');
    return checkedCf(pddRatio * inverseSquare, out, options.explain ? explain() : undefined);
  },
};
