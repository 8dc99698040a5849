// Lateral charged-particle-equilibrium range from the beam quality.
// Li, Soubra, Szanto & Gerig, Med Phys 22:1167 (1995): r_LCPE = 5.973·TPR20,10 − 2.688 (g/cm²),
// the minimum radius of a water phantom around a point for lateral electronic equilibrium.
// In a medium of relative electron density ρ_e the same mass thickness spans r_LCPE/ρ_e cm
// (density scaling of the electron tracks).

/** Li et al. (1995) lateral CPE radius in g/cm² (water-equivalent cm) for a TPR20,10. */
export function lateralEquilibriumRangeGPerCm2(tpr2010: number): number {
  return 5.973 * tpr2010 - 2.688;
}

/** The same range in cm of a medium of relative electron density `relativeElectronDensity`. */
export function lateralEquilibriumRangeCm(
  tpr2010: number,
  relativeElectronDensity: number,
): number {
  if (!(relativeElectronDensity > 0)) throw new RangeError('relativeElectronDensity: must be > 0');
  return lateralEquilibriumRangeGPerCm2(tpr2010) / relativeElectronDensity;
}
