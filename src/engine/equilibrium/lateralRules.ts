// Lateral electronic disequilibrium (LED). Secondary electrons travel sideways about r_LCPE/ρ_e;
// when the distance from the axis to the nearest field edge is shorter, electrons leaving the beam
// are not replaced and the axis dose in and just beyond low density falls. Rule: half the smaller
// field side at depth < r_LCPE/ρ_low, with ρ_low the lowest ρ_e among the point's layer and the
// layers within r_LCPE (water-equivalent) upstream; r_LCPE from Li et al., Med Phys 22:1167 (1995).
// HIGH-ENERGY-SMALL-FIELD-LUNG: TPR20,10 ≥ 0.75, equivalent square ≤ 8 cm and lung in the beam,
// where published comparisons report errors of ~10–20 % for one-dimensional methods (from memory).
import { equivalentSquareCm } from '../beam/geometry';
import { layerIndexAtDepth, radiologicalDepthCm } from '../phantom/slabPhantom';
import { bandsWhere, depthAfterWaterEquivalentCm } from './depthBands';
import { lateralEquilibriumRangeGPerCm2 } from './lateralRange';
import {
  fieldHalfWidthAtDepthCm,
  qualityText,
  warningOverBand,
  type RuleContext,
} from './ruleContext';
import { fmt, methodScope, ONE_D_METHOD_IDS, type Warning, type WarningSeverity } from './warning';

/** Layers below this ρ_e count as low density for LED (denser ones barely stretch the range). */
export const LED_LOW_DENSITY_RHO = 0.9;
/** Severity on the ratio half-width / (r_LCPE/ρ_low): severe below 0.5, caution below 0.8. */
export const LED_SEVERE_RATIO = 0.5;
export const LED_CAUTION_RATIO = 0.8;

/** Lowest ρ_e among the layer at `depthCm` and the layers within `rangeGPerCm2` upstream of it. */
export function lowestDensityUpstream(
  ctx: RuleContext,
  depthCm: number,
  rangeGPerCm2: number,
): { rho: number; layerIndex: number } {
  const { phantom } = ctx;
  const i = layerIndexAtDepth(phantom, depthCm);
  const reachRad = radiologicalDepthCm(phantom, depthCm) - rangeGPerCm2;
  let rho = phantom.layers[i]?.relativeElectronDensity ?? 1;
  let layerIndex = i;
  for (let j = i - 1; j >= 0; j--) {
    if ((phantom.radiologicalBoundariesCm[j + 1] as number) <= reachRad) break;
    const r = phantom.layers[j]?.relativeElectronDensity ?? 1;
    if (r < rho) {
      rho = r;
      layerIndex = j;
    }
  }
  return { rho, layerIndex };
}

export function ledWarnings(ctx: RuleContext): Warning[] {
  const rGPerCm2 = lateralEquilibriumRangeGPerCm2(ctx.quality.tpr2010);
  if (!(rGPerCm2 > 0)) return [];
  const ratioAt = (depthCm: number) => {
    const low = lowestDensityUpstream(ctx, depthCm, rGPerCm2);
    const halfWidth = fieldHalfWidthAtDepthCm(ctx, depthCm);
    return { ...low, halfWidth, ratio: (halfWidth * low.rho) / rGPerCm2 };
  };
  const holds = (depthCm: number) => {
    const r = ratioAt(depthCm);
    return r.rho < LED_LOW_DENSITY_RHO && r.ratio < 1;
  };
  const out: Warning[] = [];
  for (const band of bandsWhere(ctx.phantom, holds, 0.05)) {
    // Worst point of the band (sampled; the ratio is piecewise smooth between layer changes).
    const n = 200;
    let worst = ratioAt(band.fromCm + 1e-7);
    for (let k = 1; k <= n; k++) {
      const z = band.fromCm + ((band.toCm - band.fromCm) * k) / n;
      const r = ratioAt(Math.min(z, band.toCm));
      if (r.rho < LED_LOW_DENSITY_RHO && r.ratio < worst.ratio) worst = r;
    }
    const severity: WarningSeverity =
      worst.ratio < LED_SEVERE_RATIO
        ? 'severe'
        : worst.ratio < LED_CAUTION_RATIO
          ? 'caution'
          : 'note';
    const rangeCm = rGPerCm2 / worst.rho;
    const w = warningOverBand(ctx, band, {
      id: `LED@layer${worst.layerIndex + 1}`,
      code: 'LED',
      severity,
      methods: methodScope([...ONE_D_METHOD_IDS, 'pencil-beam'], ['superposition']),
      numbers:
        `field half-width ${fmt(worst.halfWidth)} cm < lateral range ${fmt(rangeCm)} cm in ρ_e ${worst.rho.toFixed(3)} ` +
        `(r_LCPE ${fmt(rGPerCm2)} g/cm²); ratio ${fmt(worst.ratio)} (severe < ${LED_SEVERE_RATIO}, caution < ${LED_CAUTION_RATIO}, ` +
        `marginal note < 1); ${qualityText(ctx)}`,
      values: {
        halfWidthCm: worst.halfWidth,
        lateralRangeCm: rangeCm,
        lateralRangeGPerCm2: rGPerCm2,
        relativeElectronDensity: worst.rho,
        ratio: worst.ratio,
      },
      explanation:
        'Electrons scattered out of the narrow beam in low density are not replaced from outside it, so the real dose on the axis is lower than one-dimensional methods and pencil-beam scaling predict.',
      advice:
        'Prefer the Monte Carlo result here (the superposition follows only part of this effect when the low-density layer lies under water); consider a larger field or a lower energy.',
    });
    if (w) out.push(w);
  }
  return out;
}

/** Thresholds of HIGH-ENERGY-SMALL-FIELD-LUNG. */
export const HESFL_MIN_TPR = 0.75;
export const HESFL_MAX_EQUIVALENT_SQUARE_CM = 8;
/** Lung-like layers: 0.05 ≤ ρ_e < 0.6 (below 0.05 is an air cavity, LOW-DENSITY). */
export const LUNG_RHO_RANGE: readonly [number, number] = [0.05, 0.6];

export function highEnergySmallFieldLungWarnings(ctx: RuleContext): Warning[] {
  const tpr = ctx.quality.tpr2010;
  const eqSq = equivalentSquareCm(ctx.fieldXCm, ctx.fieldYCm);
  if (tpr < HESFL_MIN_TPR || eqSq > HESFL_MAX_EQUIVALENT_SQUARE_CM) return [];
  const beyondCm = Math.max(ctx.quality.dMaxCm, lateralEquilibriumRangeGPerCm2(tpr));
  const out: Warning[] = [];
  ctx.phantom.layers.forEach((layer, i) => {
    const rho = layer.relativeElectronDensity;
    if (rho < LUNG_RHO_RANGE[0] || rho >= LUNG_RHO_RANGE[1]) return;
    const toCm = depthAfterWaterEquivalentCm(ctx.phantom, layer.bottomCm, beyondCm);
    const w = warningOverBand(
      ctx,
      { fromCm: layer.topCm, toCm },
      {
        id: `HIGH-ENERGY-SMALL-FIELD-LUNG@layer${i + 1}`,
        code: 'HIGH-ENERGY-SMALL-FIELD-LUNG',
        severity: 'severe',
        methods: methodScope([...ONE_D_METHOD_IDS, 'pencil-beam'], ['superposition']),
        numbers:
          `TPR20,10 ${tpr.toFixed(3)} ≥ ${HESFL_MIN_TPR}, equivalent square ${fmt(eqSq)} cm ≤ ${HESFL_MAX_EQUIVALENT_SQUARE_CM} cm at 100 cm, ` +
          `lung-like layer ${i + 1} (ρ_e ${rho.toFixed(3)}) plus ${fmt(beyondCm)} cm water-equivalent beyond it; ${qualityText(ctx)}`,
        values: { tpr2010: tpr, equivalentSquareCm: eqSq, relativeElectronDensity: rho },
        explanation:
          'High-energy small fields through lung are where one-dimensional corrections are known to overestimate the dose in and just beyond the lung, typically by about 10 % and up to about 20 % in published comparisons.',
        advice:
          'Show and use the Monte Carlo reference here; a lower energy or a larger field reduces the effect.',
      },
    );
    if (w) out.push(w);
  });
  return out;
}
