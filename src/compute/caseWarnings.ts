// Equilibrium and validity warnings for a case: the case's beam and points, the beam quality of
// the water data in use (typical values for the energy without it), and the extrapolation flags
// the methods put on their points.
import { ssdCmOf } from '../engine/beam/geometry';
import type { WaterData } from '../engine/beam/waterData';
import {
  beamQualityOfWaterData,
  beyondWaterDataOfMethods,
  equilibriumWarnings,
  extrapolationEventsOfMethods,
  type ExtrapolationEvent,
  type Warning,
} from '../engine/equilibrium';
import type { MethodResult } from '../engine/methodResult';
import type { SlabPhantom } from '../engine/phantom/slabPhantom';
import type { LaminaCase } from '../io/caseSchema';

export function caseWarnings(
  c: LaminaCase,
  phantom: SlabPhantom,
  methods: readonly MethodResult[],
  waterData?: WaterData,
  extraExtrapolations: readonly ExtrapolationEvent[] = [],
): Warning[] {
  const quality = waterData ? beamQualityOfWaterData(waterData) : undefined;
  return equilibriumWarnings({
    phantom,
    beam: {
      energy: c.beam.energy,
      ssdCm: ssdCmOf(c.beam.setup),
      fieldXCm: c.beam.fieldXCm,
      fieldYCm: c.beam.fieldYCm,
    },
    dMaxCm: quality?.dMaxCm,
    tpr2010: quality?.tpr2010,
    qualitySource: quality?.source,
    points: c.points.map((p) => ({ id: p.id, depthCm: p.depthCm })),
    extrapolations: [...extrapolationEventsOfMethods(methods), ...extraExtrapolations],
    beyondWaterData: beyondWaterDataOfMethods(methods, waterData),
  });
}
