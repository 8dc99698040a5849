// Which dose a result reports: dose to water (a small water volume at the point) or dose to the
// medium the point lies in. Chosen once for a calculation and applied by every method.

export const DOSE_QUANTITIES = ['water', 'medium'] as const;
export type DoseQuantity = (typeof DOSE_QUANTITIES)[number];

/** The convention when none is chosen: dose to water, the quantity of the water data. */
export const DEFAULT_DOSE_QUANTITY: DoseQuantity = 'water';

export function doseQuantityLabel(q: DoseQuantity): string {
  return q === 'water' ? 'dose to water' : 'dose to medium';
}
