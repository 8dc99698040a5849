// Monitor units for a prescribed dose and dose for given monitor units, from a method's dose
// per MU at the point (AAPM TG-71, Gibbons et al. 2014: MU = D / (dose per MU)). The dose per
// MU itself, with its factor chain, comes from the dose methods; this file only divides.

/** MU needed to deliver `doseCGy` at a point where one MU gives `dosePerMuCGy`. Null if undefined. */
export function muForDose(doseCGy: number, dosePerMuCGy: number | null | undefined): number | null {
  if (dosePerMuCGy === null || dosePerMuCGy === undefined) return null;
  if (!Number.isFinite(dosePerMuCGy) || dosePerMuCGy <= 0 || !Number.isFinite(doseCGy)) return null;
  return doseCGy / dosePerMuCGy;
}

/** Dose (cGy) delivered at a point by `mu` monitor units at `dosePerMuCGy`. Null if undefined. */
export function doseForMu(mu: number, dosePerMuCGy: number | null | undefined): number | null {
  if (dosePerMuCGy === null || dosePerMuCGy === undefined) return null;
  if (!Number.isFinite(dosePerMuCGy) || !Number.isFinite(mu)) return null;
  return mu * dosePerMuCGy;
}
