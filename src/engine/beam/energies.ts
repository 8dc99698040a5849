// Nominal beam energies the workbench models. Spectra: Mohan, Chui & Lidofsky 1985 (4–15 MV),
// a derived 18 MV stand-in (approximate), and an in-beam Co-60 spectrum (Rogers et al.).
export const BEAM_ENERGIES = ['Co-60', '4MV', '6MV', '10MV', '15MV', '18MV'] as const;
export type BeamEnergy = (typeof BEAM_ENERGIES)[number];

export const BEAM_ENERGY_LABELS: Record<BeamEnergy, string> = {
  'Co-60': 'Co-60',
  '4MV': '4 MV',
  '6MV': '6 MV',
  '10MV': '10 MV',
  '15MV': '15 MV',
  '18MV': '18 MV (approximate spectrum)',
};

export function isBeamEnergy(value: unknown): value is BeamEnergy {
  return typeof value === 'string' && (BEAM_ENERGIES as readonly string[]).includes(value);
}
