// Density-extreme layers. LOW-DENSITY: an air-like cavity (ρ_e < 0.05) — strong build-down inside
// and re-build-up beyond it, which one-dimensional methods miss (they overestimate the dose just
// beyond). HIGH-Z: a dense layer (ρ_e > 1.3, bone-like) — composition matters, dose to medium and
// dose to water differ (by > 10 % in cortical bone; Siebers et al., PMB 45:983, 2000), and
// one-dimensional methods ignore backscatter upstream and build-down downstream.
import { depthAfterWaterEquivalentCm } from './depthBands';
import { qualityText, warningOverBand, type RuleContext } from './ruleContext';
import { fmt, methodScope, ONE_D_METHOD_IDS, type Warning, type WarningSeverity } from './warning';

export const CAVITY_MAX_RHO = 0.05;
/** A cavity at least this thick (cm) is severe; thinner ones are a caution. */
export const CAVITY_SEVERE_THICKNESS_CM = 1;
export const HIGH_DENSITY_MIN_RHO = 1.3;

export function lowDensityWarnings(ctx: RuleContext): Warning[] {
  const dMax = ctx.quality.dMaxCm;
  const out: Warning[] = [];
  ctx.phantom.layers.forEach((layer, i) => {
    const rho = layer.relativeElectronDensity;
    if (rho >= CAVITY_MAX_RHO) return;
    const toCm = depthAfterWaterEquivalentCm(ctx.phantom, layer.bottomCm, dMax);
    const severity: WarningSeverity =
      layer.thicknessCm >= CAVITY_SEVERE_THICKNESS_CM ? 'severe' : 'caution';
    const w = warningOverBand(
      ctx,
      { fromCm: layer.topCm, toCm },
      {
        id: `LOW-DENSITY@layer${i + 1}`,
        code: 'LOW-DENSITY',
        severity,
        methods: methodScope([...ONE_D_METHOD_IDS, 'pencil-beam'], ['superposition']),
        numbers:
          `layer ${i + 1}: ρ_e ${rho.toFixed(4)} < ${CAVITY_MAX_RHO}, ${fmt(layer.thicknessCm)} cm thick ` +
          `(severe ≥ ${CAVITY_SEVERE_THICKNESS_CM} cm), plus d_max ${fmt(dMax)} cm water-equivalent beyond it; ${qualityText(ctx)}`,
        values: { relativeElectronDensity: rho, thicknessCm: layer.thicknessCm, dMaxCm: dMax },
        explanation:
          'Across an air cavity the electron fluence collapses and must build up again beyond it, so the dose just downstream is lower than one-dimensional methods predict.',
        advice:
          'Prefer the Monte Carlo result in and just beyond the cavity; treat one-dimensional results there as upper bounds.',
      },
    );
    if (w) out.push(w);
  });
  return out;
}

export function highDensityWarnings(ctx: RuleContext): Warning[] {
  const out: Warning[] = [];
  ctx.phantom.layers.forEach((layer, i) => {
    const rho = layer.relativeElectronDensity;
    if (rho <= HIGH_DENSITY_MIN_RHO) return;
    const w = warningOverBand(
      ctx,
      { fromCm: layer.topCm, toCm: layer.bottomCm },
      {
        id: `HIGH-Z@layer${i + 1}`,
        code: 'HIGH-Z',
        severity: 'caution',
        methods: methodScope([...ONE_D_METHOD_IDS, 'pencil-beam'], ['superposition']),
        numbers: `layer ${i + 1}: ρ_e ${rho.toFixed(3)} > ${HIGH_DENSITY_MIN_RHO} (${layer.materialId}, ${layer.densityGPerCm3.toFixed(3)} g/cm³); ${qualityText(ctx)}`,
        values: { relativeElectronDensity: rho, densityGPerCm3: layer.densityGPerCm3 },
        explanation:
          'In dense, bone-like material the atomic composition matters: dose to medium and dose to water differ (by more than 10 % in cortical bone), and one-dimensional methods ignore backscatter just upstream and build-down just downstream.',
        advice:
          'State whether dose to medium or to water is compared (Monte Carlo scores dose to medium); density-only methods are approximate inside and next to this layer.',
      },
    );
    if (w) out.push(w);
  });
  return out;
}
