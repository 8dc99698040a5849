// The dose convention of a calculation (dose to water or dose to medium, for every method),
// decided once for the page, the worker API and the CLI: the request's own option (the page's
// "Dose reported as", --dose-to), else the file's setting (a case's `check.doseTo`, a plan's
// `doseTo`), else dose to water. The conversions themselves live in src/engine/dose.
import { DEFAULT_DOSE_QUANTITY, type DoseQuantity } from '../engine/dose/doseQuantity';

export function resolveDoseTo(
  requested: DoseQuantity | undefined,
  fromFile: DoseQuantity | undefined,
): DoseQuantity {
  return requested ?? fromFile ?? DEFAULT_DOSE_QUANTITY;
}
