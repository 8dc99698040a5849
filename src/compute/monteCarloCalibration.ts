// Dose per MU of the page's Monte Carlo run: the MC models the phantom only, so its dose per
// fluence is tied to MU by its own water calibration run scaled by the reference dose rate and
// the collimator-scatter factor S_c of the water data the page uses for the other methods
// (the modelled beam, or the measured table carried in the case), so all curves share one scale.
// Runs in the compute worker (where the water data is); the page asks it through computeApi.
import { equivalentSquareCm } from '../engine/beam/geometry';
import { modelledWaterData } from '../engine/beam/modelledBeam';
import { waterDataForCase } from './typeAForCase';
import type { LaminaCase } from '../io/caseSchema';

export interface McCalibration {
  referenceDosePerMuCGy: number;
  collimatorScatterFactor: number;
  /**
   * Nominal d_max (cm) around which the calibration run's maximum is fitted: the modelled beam's,
   * which comes from the same kernels and spectrum as the Monte Carlo.
   */
  referenceDMaxCm: number;
  /** Where the two numbers come from, for the panel. */
  source: string;
}

/** `waterSource` is the page's choice ('modelled' or 'table'); a missing table falls back to the model. */
export function monteCarloCalibration(c: LaminaCase, waterSource?: string): McCalibration {
  const modelled = modelledWaterData(c.beam.energy);
  const data = waterSource === 'modelled' ? modelled : (waterDataForCase(c) ?? modelled);
  return {
    referenceDosePerMuCGy: data.referenceDosePerMuCGy,
    collimatorScatterFactor: data.sc(equivalentSquareCm(c.beam.fieldXCm, c.beam.fieldYCm)),
    referenceDMaxCm: modelled.dMaxCm,
    source: data.source,
  };
}
