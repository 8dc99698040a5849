// A plan beam's Nominal Beam Energy (300A,0114, in MV for photons: PS3.3 C.8.8.14.5) to one of
// Lamina's modelled beams, or a message saying none fits. Lamina's beams are flattened: a beam
// whose Primary Fluence Mode (3002,0050) is NON_STANDARD (e.g. "FFF", "SRS") has no model here.
import { BEAM_ENERGIES, BEAM_ENERGY_LABELS, type BeamEnergy } from '../engine/beam/energies';

/** Nominal energy (MV) of each Lamina beam; Co-60 by its mean photon energy, 1.25 MeV. */
const NOMINAL_MV: Record<BeamEnergy, number> = {
  'Co-60': 1.25,
  '4MV': 4,
  '6MV': 6,
  '10MV': 10,
  '15MV': 15,
  '18MV': 18,
};
const TOLERANCE_MV = 0.1;

export type EnergyResult = { ok: true; energy: BeamEnergy } | { ok: false; message: string };

export function availableEnergiesText(): string {
  return BEAM_ENERGIES.map((e) => BEAM_ENERGY_LABELS[e]).join(', ');
}

export function beamEnergyFor(
  nominalMV: number | null,
  fluenceModeId: string | null,
): EnergyResult {
  if (nominalMV === null || !Number.isFinite(nominalMV))
    return { ok: false, message: 'no Nominal Beam Energy (300A,0114) in the first control point' };
  if (fluenceModeId !== null)
    return {
      ok: false,
      message: `${nominalMV} MV ${fluenceModeId} (non-standard fluence mode, Fluence Mode ID (3002,0052)): Lamina models flattened beams only (${availableEnergiesText()})`,
    };
  const fit = BEAM_ENERGIES.find((e) => Math.abs(NOMINAL_MV[e] - nominalMV) <= TOLERANCE_MV);
  if (!fit)
    return {
      ok: false,
      message: `no Lamina beam fits a nominal energy of ${nominalMV} MV (available: ${availableEnergiesText()})`,
    };
  return { ok: true, energy: fit };
}
