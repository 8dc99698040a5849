// Turning method results into plotted values under the chosen normalisation: dose per MU as
// computed, percent of the water curve's maximum, or relative to water at the same depth.
import type { MethodResult } from '../engine/methodResult';

export type NormalisationMode = 'dosePerMu' | 'percentWaterDmax' | 'relativeToWater';

export const NORMALISATION_LABELS: Record<NormalisationMode, string> = {
  dosePerMu: 'Dose per MU (cGy/MU)',
  percentWaterDmax: 'Dose (% of water maximum)',
  relativeToWater: 'Dose relative to water at the same depth (ratio)',
};

export interface NormalisedSeries {
  id: string;
  values: (number | null)[];
  sigma?: number[] | undefined;
}

export type NormaliseResult =
  { ok: true; axisLabel: string; series: NormalisedSeries[] } | { ok: false; reason: string };

const isNum = (v: number | null | undefined): v is number =>
  typeof v === 'number' && Number.isFinite(v);

export function normaliseMethods(
  methods: readonly MethodResult[],
  mode: NormalisationMode,
): NormaliseResult {
  const label = NORMALISATION_LABELS[mode];
  if (mode === 'dosePerMu')
    return {
      ok: true,
      axisLabel: label,
      series: methods.map((m) => ({
        id: m.id,
        values: m.curve.dosePerMuCGy.map((v) => (isNum(v) ? v : null)),
        sigma: m.curve.sigmaDosePerMuCGy,
      })),
    };
  const water = methods.find((m) => m.id === 'water');
  if (!water)
    return {
      ok: false,
      reason:
        'This normalisation needs the water (homogeneous) curve, which is not among the results.',
    };
  const waterDose = water.curve.dosePerMuCGy;
  if (mode === 'percentWaterDmax') {
    const max = Math.max(...waterDose.filter(isNum));
    if (!(max > 0))
      return { ok: false, reason: 'The water curve has no positive dose to normalise to.' };
    return {
      ok: true,
      axisLabel: label,
      series: methods.map((m) => ({
        id: m.id,
        values: m.curve.dosePerMuCGy.map((v) => (isNum(v) ? (100 * v) / max : null)),
        sigma: m.curve.sigmaDosePerMuCGy?.map((s) => (100 * s) / max),
      })),
    };
  }
  const ratio = (v: number | null, i: number): number | null => {
    const w = waterDose[i];
    return isNum(v) && isNum(w) && w > 0 ? v / w : null;
  };
  return {
    ok: true,
    axisLabel: label,
    series: methods.map((m) => ({
      id: m.id,
      values: m.curve.dosePerMuCGy.map(ratio),
      sigma: m.curve.sigmaDosePerMuCGy?.map((s, i) => ratio(s, i) ?? 0),
    })),
  };
}
