// No correction: the dose as if the whole phantom were water (CF = 1), the baseline of every check.
import type { TypeAMethod } from './correctionTypes';
import { productOfFactors } from './correctionExplanation';

export const waterMethod: TypeAMethod = {
  id: 'water',
  label: 'Water (no heterogeneity correction)',
  variant: () => 'CF = 1',
  // No factors: the empty product, 1.
  correct: () => ({
    cf: productOfFactors([]),
    flags: [],
    explanation: { quantities: [], factors: [] },
  }),
};
