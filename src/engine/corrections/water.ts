// No correction: the dose as if the whole phantom were water (CF = 1), the baseline of every check.
import type { TypeAMethod } from './correctionTypes';

export const waterMethod: TypeAMethod = {
  id: 'water',
  label: 'Water (no heterogeneity correction)',
  variant: () => 'CF = 1',
  correct: () => ({ cf: 1, flags: [] }),
};
