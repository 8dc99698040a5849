// One-parameter tuning of a derived (not published) beam spectrum: a smooth exponential tilt of
// the stored bin weights, w_i ← w_i·exp(−β·E_i), renormalised to the stored total. β > 0 softens
// the beam (shifts weight to low energies, lowering the mean energy), β < 0 hardens it; β = 0
// leaves the stored weights unchanged. A reference energy E_ref in exp(−β(E_i − E_ref)) would
// only scale every weight by the same factor, which the renormalisation removes, so none is used.
// The tilt is a smooth stand-in for a different target/filter combination, not a model of one;
// β is fitted to a computed depth-dose index (its value and provenance are stored with the
// spectrum in src/engine/data/spectra.json).

export interface SpectrumTuning {
  /** Tilt parameter β (1/MeV). */
  betaPerMeV: number;
  /** What β was fitted to (quantity, condition, value, and where the value comes from). */
  target: string;
  /** How β was found (script, engine, search). */
  method: string;
  /** The fitted result as computed (target quantity and independent checks). */
  result: string;
}

/**
 * Bin weights tilted by exp(−β·E_i) and renormalised so that Σ tilted = Σ stored.
 * energyMeV: bin-centre energies; weight: stored bin weights (≥ 0). β = 0 returns a copy.
 */
export function tiltedWeights(
  energyMeV: ArrayLike<number>,
  weight: ArrayLike<number>,
  betaPerMeV: number,
): Float64Array {
  if (energyMeV.length !== weight.length)
    throw new RangeError('tiltedWeights: energies and weights differ in length');
  if (!Number.isFinite(betaPerMeV)) throw new RangeError('tiltedWeights: β must be finite');
  const out = Float64Array.from(weight);
  if (betaPerMeV === 0) return out;
  // Exponents relative to the lowest bin energy: a common factor the renormalisation removes.
  let eMin = Infinity;
  for (let i = 0; i < energyMeV.length; i++) eMin = Math.min(eMin, energyMeV[i] as number);
  let storedSum = 0;
  let tiltedSum = 0;
  for (let i = 0; i < out.length; i++) {
    storedSum += out[i] as number;
    out[i] = (out[i] as number) * Math.exp(-betaPerMeV * ((energyMeV[i] as number) - eMin));
    tiltedSum += out[i] as number;
  }
  if (!(tiltedSum > 0)) throw new RangeError('tiltedWeights: no bin keeps a positive weight');
  const scale = storedSum / tiltedSum;
  for (let i = 0; i < out.length; i++) out[i] = (out[i] as number) * scale;
  return out;
}
