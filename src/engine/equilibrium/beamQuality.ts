// The two beam-quality numbers the warnings need: depth of dose maximum d_max and TPR20,10.
// They come from the water data in use; without water data, typical values per nominal energy
// are used (10 × 10 cm², SSD 100 cm; Co-60 at SSD 80 cm) — from memory, sanity values only, not
// beam data, and every warning built on them says so.
import type { BeamEnergy } from '../beam/energies';
import type { WaterData } from '../beam/waterData';

export interface BeamQuality {
  dMaxCm: number;
  tpr2010: number;
  /** Where the numbers come from, printed in the warnings. */
  source: string;
}

/** Typical d_max (cm) and TPR20,10 per nominal energy (from memory; midpoints of usual ranges). */
export const TYPICAL_BEAM_QUALITY: Record<BeamEnergy, { dMaxCm: number; tpr2010: number }> = {
  'Co-60': { dMaxCm: 0.5, tpr2010: 0.57 },
  '4MV': { dMaxCm: 1.1, tpr2010: 0.62 },
  '6MV': { dMaxCm: 1.5, tpr2010: 0.67 },
  '10MV': { dMaxCm: 2.3, tpr2010: 0.73 },
  '15MV': { dMaxCm: 2.9, tpr2010: 0.76 },
  '18MV': { dMaxCm: 3.2, tpr2010: 0.78 },
};

export function typicalBeamQuality(energy: BeamEnergy): BeamQuality {
  const q = TYPICAL_BEAM_QUALITY[energy];
  return { ...q, source: `typical ${energy} values, from memory; no water data` };
}

/**
 * Beam quality of a water data set: its d_max and TPR20,10 = TMR(20, 10)/TMR(10, 10)
 * (TPR with d_ref = 10 cm at a constant source–detector distance, field 10 × 10 cm² at the detector).
 */
export function beamQualityOfWaterData(waterData: WaterData): BeamQuality {
  const tpr2010 = waterData.tmr(20, 10) / waterData.tmr(10, 10);
  return { dMaxCm: waterData.dMaxCm, tpr2010, source: `water data: ${waterData.source}` };
}
