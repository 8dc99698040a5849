// Modified Batho: the generalized power law with TMR, every distance shifted by the build-up depth
// z_bu = d_max (El-Khatib & Battista 1984 for TMR; Thomas 1991 for the shift; TG-65 presentation;
// from memory): CF = Π TMR(X_m + z_bu, s_d)^(ρ_m − ρ_{m−1}). Continuous across interfaces and
// never reads the build-up part of the table.
import { bathoExplanation, bathoPowerLawProduct, type BathoTerms } from './batho';
import { checkedCf, collectingRecorder, type TypeAMethod } from './correctionTypes';

export const bathoModifiedMethod: TypeAMethod = {
  id: 'batho-modified',
  label: 'Modified Batho (build-up shift)',
  variant: () => 'TMR, shift z_bu = d_max (10 × 10), μ₀ ≡ water, exponents by ρ_e',
  correct(phantom, pointDepthCm, sideAtDepthCm, wd, options) {
    const { recorder, flags } = collectingRecorder();
    const terms: BathoTerms | undefined = options.explain ? { layers: [], factors: [] } : undefined;
    const { product } = bathoPowerLawProduct(
      phantom,
      pointDepthCm,
      wd.dMaxCm,
      (x) => wd.tmr(x, sideAtDepthCm, recorder),
      terms,
    );
    if (!terms) return checkedCf(product, flags());
    const explanation = bathoExplanation(pointDepthCm, sideAtDepthCm, wd.dMaxCm, 'TMR', terms);
    return checkedCf(product, flags(), explanation);
  },
};
